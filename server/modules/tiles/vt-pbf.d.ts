// vt-pbf ships no types; only the function Duskhaul uses is declared.
declare module 'vt-pbf' {
  import type { LegacyFeature } from 'geojson-vt';

  /** Encodes geojson-vt tiles, one per layer name, as a Mapbox Vector Tile (protobuf). */
  export function fromGeojsonVt(
    layers: Record<string, { features: LegacyFeature[] }>,
    options?: { version?: number; extent?: number },
  ): Uint8Array;
}
