/**
 * The default basemap's content: open boundary data shipped in npm packages, turned from
 * TopoJSON into GeoJSON layers. World land and countries come from Natural Earth 1:50m
 * (world-atlas); US states and counties from the Census Bureau's cartographic boundaries 1:10m
 * (us-atlas).
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { feature, mesh } from 'topojson-client';
import { area, pointOnFeature, polygon as turfPolygon } from '@turf/turf';
import type { Feature, FeatureCollection, Geometry, MultiPolygon, Point, Polygon } from 'geojson';
import type { GeometryCollection, Topology } from 'topojson-specification';

/** One source layer of the basemap and the zooms where it appears. */
export interface BoundaryLayer {
  /** Layer name inside the vector tile. */
  layer: string;
  /** First zoom at which the layer's features are in tiles. */
  minZoom: number;
  /** Builds the features (called once, lazily). */
  build: () => FeatureCollection;
}

const require = createRequire(import.meta.url);

function topology(file: string): Topology {
  return JSON.parse(readFileSync(require.resolve(file), 'utf8')) as Topology;
}

const once = <T>(make: () => T) => {
  let value: T | undefined;
  return () => (value ??= make());
};

const world = once(() => topology('world-atlas/countries-50m.json'));
const land = once(() => topology('world-atlas/land-50m.json'));
const states = once(() => topology('us-atlas/states-10m.json'));
const counties = once(() => topology('us-atlas/counties-10m.json'));

type Named = { name?: string };

function collection(topo: Topology, object: string): FeatureCollection<Geometry, Named> {
  return feature(topo, topo.objects[object] as GeometryCollection<Named>) as FeatureCollection<
    Geometry,
    Named
  >;
}

/** Features with their id copied into the properties (vector tiles keep only numeric ids). */
function withCodes(
  features: FeatureCollection<Geometry, Named>,
  codeName: string,
): FeatureCollection {
  return {
    type: 'FeatureCollection',
    features: features.features
      .filter((f) => f.geometry)
      .map((f) => ({
        type: 'Feature',
        geometry: f.geometry,
        properties: { name: f.properties?.name ?? '', [codeName]: String(f.id ?? '') },
      })),
  };
}

/** Border lines drawn once each (shared arcs are not doubled), tagged with their kind. */
function borders(
  topo: Topology,
  object: string,
  kind: string,
  keep: (a: Feature, b: Feature) => boolean,
) {
  const lines = mesh(topo, topo.objects[object] as GeometryCollection, (a, b) =>
    keep(a as unknown as Feature, b as unknown as Feature),
  );
  return { type: 'Feature', geometry: lines, properties: { kind } } as Feature;
}

/** A point well inside the largest part of each area, for its name. */
function labelPoints(features: FeatureCollection<Geometry, Named>, kind: string): Feature<Point>[] {
  return features.features.flatMap((f) => {
    const name = f.properties?.name;
    if (!name || !f.geometry) return [];
    const parts =
      f.geometry.type === 'Polygon'
        ? [f.geometry.coordinates]
        : f.geometry.type === 'MultiPolygon'
          ? (f.geometry as MultiPolygon).coordinates
          : [];
    if (parts.length === 0) return [];
    const largest = parts
      .map((rings) => turfPolygon(rings as Polygon['coordinates']))
      .reduce((best, part) => (area(part) > area(best) ? part : best));
    const point = pointOnFeature(largest);
    return [{ ...point, properties: { name, kind, areaKm2: Math.round(area(largest) / 1e6) } }];
  });
}

const differ = (a: Feature, b: Feature) => a !== b;
const sameState = (a: Feature, b: Feature) =>
  a !== b && String(a.id).slice(0, 2) === String(b.id).slice(0, 2);

/** The basemap's layers, coarsest first (the order they are drawn in). */
export const boundaryLayers: BoundaryLayer[] = [
  {
    layer: 'land',
    minZoom: 0,
    build: () => ({
      type: 'FeatureCollection',
      features: collection(land(), 'land').features.map((f) => ({ ...f, properties: {} })),
    }),
  },
  {
    layer: 'countries',
    minZoom: 0,
    build: () => withCodes(collection(world(), 'countries'), 'iso'),
  },
  { layer: 'states', minZoom: 2, build: () => withCodes(collection(states(), 'states'), 'fips') },
  {
    layer: 'counties',
    minZoom: 5,
    build: () => withCodes(collection(counties(), 'counties'), 'fips'),
  },
  {
    layer: 'borders',
    minZoom: 0,
    build: () => ({
      type: 'FeatureCollection',
      features: [borders(world(), 'countries', 'country', differ)],
    }),
  },
  {
    layer: 'borders',
    minZoom: 2,
    build: () => ({
      type: 'FeatureCollection',
      features: [borders(states(), 'states', 'state', differ)],
    }),
  },
  {
    layer: 'borders',
    minZoom: 6,
    build: () => ({
      type: 'FeatureCollection',
      features: [borders(counties(), 'counties', 'county', sameState)],
    }),
  },
  {
    layer: 'labels',
    minZoom: 2,
    build: () => ({
      type: 'FeatureCollection',
      features: labelPoints(collection(world(), 'countries'), 'country'),
    }),
  },
  {
    layer: 'labels',
    minZoom: 4,
    build: () => ({
      type: 'FeatureCollection',
      features: labelPoints(collection(states(), 'states'), 'state'),
    }),
  },
  {
    layer: 'labels',
    minZoom: 8,
    build: () => ({
      type: 'FeatureCollection',
      features: labelPoints(collection(counties(), 'counties'), 'county'),
    }),
  },
];
