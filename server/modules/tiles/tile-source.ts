import { createHash } from 'node:crypto';
import type { TileAddress } from './tile-coordinates';

/** One encoded vector tile ready to send. */
export interface EncodedTile {
  /** Mapbox Vector Tile bytes, gzipped when `gzipped`. */
  bytes: Buffer;
  gzipped: boolean;
  /** Strong ETag (quoted) derived from the bytes. */
  etag: string;
}

/** What a tile set holds, in the spirit of TileJSON 3.0. */
export interface TileSetInfo {
  /** `boundaries` for the built-in basemap, `mbtiles` for an operator's archive. */
  source: 'boundaries' | 'mbtiles';
  name: string;
  minzoom: number;
  maxzoom: number;
  attribution: string;
  /** Source layers in the tiles. */
  vector_layers: Array<{ id: string; minzoom?: number; maxzoom?: number }>;
}

/** Anything that answers vector tiles by XYZ address; null when nothing is there. */
export interface TileSource {
  info(): TileSetInfo;
  tile(address: TileAddress): EncodedTile | null;
}

/** A quoted strong ETag from the tile's bytes (SHA-1 is plenty for change detection). */
export function etagOf(bytes: Uint8Array): string {
  return `"${createHash('sha1').update(bytes).digest('base64url')}"`;
}

/** True when the bytes start with the gzip magic number 1f 8b. */
export function isGzipped(bytes: Uint8Array): boolean {
  return bytes.length >= 2 && bytes[0] === 0x1f && bytes[1] === 0x8b;
}
