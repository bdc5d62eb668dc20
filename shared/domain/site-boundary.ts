/**
 * Validation and geodesic area of a site boundary (GeoJSON Polygon, RFC 7946: rings of
 * [lon, lat] positions, closed, at least four positions; the first ring is the outline, others holes).
 */
import { area, kinks, polygon } from '@turf/turf';
import type { Polygon } from 'geojson';
import { squareMetresToHa } from './units';

/** The problems that make `boundary` unusable; empty when it is a valid Polygon. */
export function boundaryProblems(boundary: unknown): string[] {
  if (boundary === null || typeof boundary !== 'object')
    return ['boundary must be a GeoJSON Polygon object'];
  const shape = boundary as { type?: unknown; coordinates?: unknown };
  if (shape.type !== 'Polygon')
    return [`boundary.type must be "Polygon", got ${JSON.stringify(shape.type)}`];
  if (!Array.isArray(shape.coordinates) || shape.coordinates.length === 0) {
    return ['boundary.coordinates must be a non-empty array of rings'];
  }
  const problems: string[] = [];
  shape.coordinates.forEach((ring: unknown, r: number) => {
    if (!Array.isArray(ring)) {
      problems.push(`boundary ring ${r} must be an array of positions`);
      return;
    }
    if (ring.length < 4)
      problems.push(`boundary ring ${r} needs at least 4 positions, got ${ring.length}`);
    ring.forEach((position: unknown, i: number) => {
      if (
        !Array.isArray(position) ||
        position.length < 2 ||
        !position.every((v) => typeof v === 'number' && Number.isFinite(v))
      ) {
        problems.push(`boundary ring ${r} position ${i} must be [longitude, latitude] numbers`);
        return;
      }
      const [lon, lat] = position as number[];
      if (lon < -180 || lon > 180)
        problems.push(`boundary ring ${r} position ${i}: longitude ${lon} outside −180..180`);
      if (lat < -90 || lat > 90)
        problems.push(`boundary ring ${r} position ${i}: latitude ${lat} outside −90..90`);
    });
    if (problems.length === 0 && ring.length >= 4) {
      const first = ring[0] as number[];
      const last = ring[ring.length - 1] as number[];
      if (first[0] !== last[0] || first[1] !== last[1]) {
        problems.push(
          `boundary ring ${r} is not closed: first position ${JSON.stringify(first)} ≠ last ${JSON.stringify(last)}`,
        );
      }
    }
  });
  if (problems.length > 0) return problems;
  const feature = polygon(shape.coordinates as number[][][]);
  const crossings = kinks(feature).features;
  if (crossings.length > 0) {
    const [lon, lat] = crossings[0].geometry.coordinates;
    problems.push(
      `boundary crosses itself (${crossings.length} crossing(s), first near ${lat.toFixed(6)}, ${lon.toFixed(6)})`,
    );
  } else if (area(feature) <= 0) {
    problems.push('boundary encloses no area');
  }
  return problems;
}

/** Throws a RangeError listing the problems when `boundary` is not a valid Polygon. */
export function assertValidBoundary(boundary: unknown): asserts boundary is Polygon {
  const problems = boundaryProblems(boundary);
  if (problems.length > 0) throw new RangeError(`invalid boundary: ${problems.join('; ')}`);
}

/** Area enclosed by a boundary (holes removed), hectares; turf's spherical area, WGS84 radius. */
export function boundaryAreaHa(boundary: Polygon): number {
  assertValidBoundary(boundary);
  return squareMetresToHa(area(polygon(boundary.coordinates)));
}
