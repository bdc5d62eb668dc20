import geojsonvt from 'geojson-vt';
import type { LegacyFeature } from 'geojson-vt';
import { fromGeojsonVt } from 'vt-pbf';
import { boundaryLayers, type BoundaryLayer } from './boundary-layers';
import { maxTileZoom, type TileAddress } from './tile-coordinates';
import { etagOf, type EncodedTile, type TileSetInfo, type TileSource } from './tile-source';

/** Vector-tile extent (units per tile side), the MVT default. */
const extent = 4096;

/** How many encoded tiles stay in memory (a few MB at most). */
const cachedTiles = 2_000;

type Index = InstanceType<typeof geojsonvt>;

/**
 * The built-in basemap: each boundary layer is sliced by geojson-vt into its own index the first
 * time a tile needs it, then kept; tiles are encoded with vt-pbf and the latest are cached.
 */
export class BoundaryTileSource implements TileSource {
  private readonly indexes = new Map<BoundaryLayer, Index>();
  private readonly cache = new Map<string, EncodedTile | null>();

  constructor(private readonly layers: BoundaryLayer[] = boundaryLayers) {}

  info(): TileSetInfo {
    const ids = [...new Set(this.layers.map((l) => l.layer))];
    return {
      source: 'boundaries',
      name: 'Duskhaul boundaries',
      minzoom: 0,
      maxzoom: maxTileZoom,
      attribution: 'Natural Earth; US Census Bureau',
      vector_layers: ids.map((id) => ({
        id,
        minzoom: Math.min(...this.layers.filter((l) => l.layer === id).map((l) => l.minZoom)),
        maxzoom: maxTileZoom,
      })),
    };
  }

  /** Builds every layer's index now (e.g. in the background after start-up). */
  warm(): void {
    for (const layer of this.layers) this.indexOf(layer);
  }

  tile({ z, x, y }: TileAddress): EncodedTile | null {
    const key = `${z}/${x}/${y}`;
    if (this.cache.has(key)) {
      const hit = this.cache.get(key)!;
      // Refresh its place in the insertion order: the map doubles as an LRU list.
      this.cache.delete(key);
      this.cache.set(key, hit);
      return hit;
    }
    const encoded = this.encode(z, x, y);
    this.cache.set(key, encoded);
    if (this.cache.size > cachedTiles) this.cache.delete(this.cache.keys().next().value!);
    return encoded;
  }

  private encode(z: number, x: number, y: number): EncodedTile | null {
    const features = new Map<string, LegacyFeature[]>();
    for (const layer of this.layers) {
      if (z < layer.minZoom) continue;
      const tile = this.indexOf(layer).getTile(z, x, y);
      if (!tile || tile.features.length === 0) continue;
      features.set(layer.layer, [...(features.get(layer.layer) ?? []), ...tile.features]);
    }
    if (features.size === 0) return null;
    const layers = Object.fromEntries(
      [...features].map(([name, list]) => [name, { features: list }]),
    );
    const bytes = Buffer.from(fromGeojsonVt(layers, { version: 2, extent }));
    return { bytes, gzipped: false, etag: etagOf(bytes) };
  }

  private indexOf(layer: BoundaryLayer): Index {
    let index = this.indexes.get(layer);
    if (!index) {
      index = new geojsonvt(layer.build(), {
        maxZoom: maxTileZoom,
        indexMaxZoom: 4,
        tolerance: 3,
        extent,
        buffer: 64,
      });
      this.indexes.set(layer, index);
    }
    return index;
  }
}
