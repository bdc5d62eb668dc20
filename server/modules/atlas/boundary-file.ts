import type { Geometry, Polygon } from 'geojson';
import { AppError } from '../../errors/app-error';
import { fieldIssues } from '../../errors/validate';
import { maxBoundaryVertices, polygon } from '../../../shared/schemas/geojson';

/** Most features a boundary file may hold before it is refused unread. */
export const maxBoundaryFeatures = 500;

const refuse = (message: string) =>
  AppError.validation([{ field: 'text', message }], `The boundary file cannot be used: ${message}`);

/**
 * The one polygon in a GeoJSON file: a Polygon, a Feature of one, a FeatureCollection holding
 * exactly one polygon feature, or a MultiPolygon of one part. Heights are dropped; the polygon
 * is then checked like a drawn one (closed rings, no crossings, vertex cap). Every refusal is a
 * 400 that says what is wrong with the file.
 */
export function polygonFromGeoJsonText(text: string): Polygon {
  let parsed: unknown;
  try {
    parsed = JSON.parse(text);
  } catch {
    throw refuse('it is not valid JSON (GeoJSON files are JSON).');
  }
  const polygons = polygonsIn(parsed);
  if (polygons.length === 0)
    throw refuse('it holds no polygon. Draw the block as a polygon (an area, not a line or pin).');
  if (polygons.length > 1)
    throw refuse(
      `it holds ${polygons.length} polygons; a site has one boundary. Save each block as its own file.`,
    );
  const flat = flatten(polygons[0]);
  const vertices = flat.coordinates.reduce((sum, ring) => sum + ring.length, 0);
  if (vertices > maxBoundaryVertices)
    throw refuse(`it has ${vertices} vertices; at most ${maxBoundaryVertices} are accepted.`);
  const checked = polygon.safeParse(flat);
  if (!checked.success) {
    const problems = fieldIssues(checked.error).map((i) => i.message);
    throw AppError.validation(
      problems.map((message) => ({ field: 'text', message })),
      `The boundary file cannot be used: ${problems[0]}`,
    );
  }
  return checked.data;
}

function polygonsIn(value: unknown): Polygon[] {
  if (!value || typeof value !== 'object') throw refuse('it is not a GeoJSON object.');
  const node = value as { type?: unknown; features?: unknown; geometry?: unknown };
  switch (node.type) {
    case 'FeatureCollection': {
      if (!Array.isArray(node.features)) throw refuse('its "features" is not a list.');
      if (node.features.length > maxBoundaryFeatures)
        throw refuse(
          `it holds ${node.features.length} features; at most ${maxBoundaryFeatures} are read.`,
        );
      return node.features.flatMap((f) => polygonsIn(f));
    }
    case 'Feature':
      return node.geometry ? geometryPolygons(node.geometry as Geometry) : [];
    default:
      return geometryPolygons(node as Geometry);
  }
}

function geometryPolygons(geometry: Geometry): Polygon[] {
  switch (geometry.type) {
    case 'Polygon':
      return [geometry];
    case 'MultiPolygon':
      return Array.isArray(geometry.coordinates)
        ? geometry.coordinates.map((coordinates) => ({ type: 'Polygon', coordinates }))
        : [];
    case 'GeometryCollection':
      return Array.isArray(geometry.geometries)
        ? geometry.geometries.flatMap(geometryPolygons)
        : [];
    case 'Point':
    case 'MultiPoint':
    case 'LineString':
    case 'MultiLineString':
      return [];
    default:
      throw refuse(`"${String((geometry as { type?: unknown }).type)}" is not a GeoJSON type.`);
  }
}

/** The polygon with positions cut to [longitude, latitude]. */
function flatten(shape: Polygon): Polygon {
  if (!Array.isArray(shape.coordinates)) throw refuse('the polygon has no coordinates.');
  return {
    type: 'Polygon',
    coordinates: shape.coordinates.map((ring) =>
      Array.isArray(ring)
        ? ring.map((position) => (Array.isArray(position) ? position.slice(0, 2) : position))
        : ring,
    ),
  };
}
