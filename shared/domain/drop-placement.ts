/**
 * Drop points spread evenly inside a field boundary, concave blocks included.
 *
 * Algorithm: a square grid of candidate points strictly inside the polygon (turf
 * booleanPointInPolygon, boundary excluded) stands for the field; Lloyd's k-means (Lloyd 1982)
 * on those candidates gives a centroidal Voronoi tessellation — equal-ish areas per drop
 * (Du, Faber & Gunzburger, SIAM Review 41, 1999). Each drop is then snapped to the candidate of its
 * own cluster nearest the cluster's centroid, so every drop is strictly inside the boundary even
 * where a centroid of an L- or U-shaped cluster would fall outside. Seeds come from farthest-point
 * sampling, so the result is deterministic. Distances use a local equirectangular projection
 * (metres), accurate to well under 1 % across a farm.
 */
import { booleanPointInPolygon, point } from '@turf/turf';
import type { Polygon } from 'geojson';
import { assertInteger } from './guards';
import { assertValidBoundary } from './site-boundary';

const EARTH_RADIUS_M = 6_371_008.8;
const CANDIDATES_PER_DROP = 12;
const MIN_CANDIDATES = 400;
const MAX_CANDIDATES = 20_000;
const MAX_ITERATIONS = 15;

interface Projection {
  toXY(lon: number, lat: number): [number, number];
}

function projectionAround(boundary: Polygon): Projection {
  const ring = boundary.coordinates[0];
  const lat0 = ring.reduce((s, p) => s + p[1], 0) / ring.length;
  const lon0 = ring.reduce((s, p) => s + p[0], 0) / ring.length;
  const rad = Math.PI / 180;
  const kx = EARTH_RADIUS_M * rad * Math.cos(lat0 * rad);
  const ky = EARTH_RADIUS_M * rad;
  return { toXY: (lon, lat) => [(lon - lon0) * kx, (lat - lat0) * ky] };
}

function shoelaceAreaM2(ring: readonly [number, number][]): number {
  let sum = 0;
  for (let i = 0; i < ring.length - 1; i++)
    sum += ring[i][0] * ring[i + 1][1] - ring[i + 1][0] * ring[i][1];
  return Math.abs(sum) / 2;
}

interface Candidate {
  lon: number;
  lat: number;
  x: number;
  y: number;
}

function interiorCandidates(
  boundary: Polygon,
  projection: Projection,
  wanted: number,
): Candidate[] {
  const outer = boundary.coordinates[0];
  const xy = outer.map(([lon, lat]) => projection.toXY(lon, lat));
  let areaM2 = shoelaceAreaM2(xy);
  for (const hole of boundary.coordinates.slice(1)) {
    areaM2 -= shoelaceAreaM2(hole.map(([lon, lat]) => projection.toXY(lon, lat)));
  }
  const lons = outer.map((p) => p[0]);
  const lats = outer.map((p) => p[1]);
  const [minLon, maxLon, minLat, maxLat] = [
    Math.min(...lons),
    Math.max(...lons),
    Math.min(...lats),
    Math.max(...lats),
  ];
  const [x0, y0] = projection.toXY(minLon, minLat);
  const [x1, y1] = projection.toXY(maxLon, maxLat);
  let spacing = Math.sqrt(Math.max(areaM2, 1) / wanted);
  let candidates: Candidate[] = [];
  for (let attempt = 0; attempt < 6; attempt++) {
    candidates = [];
    const columns = Math.ceil((x1 - x0) / spacing);
    const rows = Math.ceil((y1 - y0) / spacing);
    for (let row = 0; row < rows; row++) {
      for (let column = 0; column < columns; column++) {
        const fx = (column + 0.5) / columns;
        const fy = (row + 0.5) / rows;
        const lon = minLon + fx * (maxLon - minLon);
        const lat = minLat + fy * (maxLat - minLat);
        if (booleanPointInPolygon(point([lon, lat]), boundary, { ignoreBoundary: true })) {
          const [x, y] = projection.toXY(lon, lat);
          candidates.push({ lon, lat, x, y });
        }
      }
    }
    if (candidates.length >= wanted * 0.5) return candidates;
    spacing /= 2;
  }
  return candidates;
}

function farthestPointSeeds(
  candidates: readonly Candidate[],
  count: number,
): { x: number; y: number }[] {
  const cx = candidates.reduce((s, c) => s + c.x, 0) / candidates.length;
  const cy = candidates.reduce((s, c) => s + c.y, 0) / candidates.length;
  const nearest = new Float64Array(candidates.length).fill(Infinity);
  let next = 0;
  let bestStart = Infinity;
  candidates.forEach((c, i) => {
    const d = (c.x - cx) ** 2 + (c.y - cy) ** 2;
    if (d < bestStart) {
      bestStart = d;
      next = i;
    }
  });
  const seeds: { x: number; y: number }[] = [];
  for (let k = 0; k < count; k++) {
    const seed = candidates[next];
    seeds.push({ x: seed.x, y: seed.y });
    let farthest = -1;
    candidates.forEach((c, i) => {
      const d = (c.x - seed.x) ** 2 + (c.y - seed.y) ** 2;
      if (d < nearest[i]) nearest[i] = d;
      if (nearest[i] > farthest) {
        farthest = nearest[i];
        next = i;
      }
    });
  }
  return seeds;
}

function assign(
  candidates: readonly Candidate[],
  centres: readonly { x: number; y: number }[],
  owner: Int32Array,
): void {
  candidates.forEach((c, i) => {
    let best = Infinity;
    for (let k = 0; k < centres.length; k++) {
      const d = (c.x - centres[k].x) ** 2 + (c.y - centres[k].y) ** 2;
      if (d < best) {
        best = d;
        owner[i] = k;
      }
    }
  });
}

/** `count` drop positions ([lon, lat]) spread evenly and strictly inside `boundary`. */
export function placeDropsInPolygon(boundary: Polygon, count: number): [number, number][] {
  assertValidBoundary(boundary);
  assertInteger('count', count, 0, 5_000);
  if (count === 0) return [];
  const projection = projectionAround(boundary);
  const wanted = Math.min(MAX_CANDIDATES, Math.max(MIN_CANDIDATES, count * CANDIDATES_PER_DROP));
  const candidates = interiorCandidates(boundary, projection, wanted);
  if (candidates.length < count) {
    throw new RangeError(`boundary is too small or too thin to hold ${count} separate drops`);
  }
  const centres = farthestPointSeeds(candidates, count);
  const owner = new Int32Array(candidates.length);
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration++) {
    assign(candidates, centres, owner);
    const sumX = new Float64Array(count);
    const sumY = new Float64Array(count);
    const members = new Int32Array(count);
    candidates.forEach((c, i) => {
      sumX[owner[i]] += c.x;
      sumY[owner[i]] += c.y;
      members[owner[i]]++;
    });
    let moved = 0;
    for (let k = 0; k < count; k++) {
      if (members[k] === 0) continue; // keeps its place; farthest-point seeds make this rare
      const x = sumX[k] / members[k];
      const y = sumY[k] / members[k];
      moved = Math.max(moved, Math.hypot(x - centres[k].x, y - centres[k].y));
      centres[k] = { x, y };
    }
    if (moved < 0.5) break;
  }
  assign(candidates, centres, owner);
  const snapped: (Candidate | null)[] = new Array(count).fill(null);
  const snapDistance = new Float64Array(count).fill(Infinity);
  candidates.forEach((c, i) => {
    const k = owner[i];
    const d = (c.x - centres[k].x) ** 2 + (c.y - centres[k].y) ** 2;
    if (d < snapDistance[k]) {
      snapDistance[k] = d;
      snapped[k] = c;
    }
  });
  // A centre that owns no candidate takes the unused candidate nearest to it.
  const used = new Set(snapped.filter((c): c is Candidate => c !== null));
  snapped.forEach((c, k) => {
    if (c !== null) return;
    let best: Candidate | null = null;
    let bestD = Infinity;
    for (const candidate of candidates) {
      if (used.has(candidate)) continue;
      const d = (candidate.x - centres[k].x) ** 2 + (candidate.y - centres[k].y) ** 2;
      if (d < bestD) {
        bestD = d;
        best = candidate;
      }
    }
    snapped[k] = best;
    if (best) used.add(best);
  });
  return snapped.map((c) => [c!.lon, c!.lat]);
}
