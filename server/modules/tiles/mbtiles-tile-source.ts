import Database from 'better-sqlite3';
import type { TileAddress } from './tile-coordinates';
import {
  etagOf,
  isGzipped,
  type EncodedTile,
  type TileSetInfo,
  type TileSource,
} from './tile-source';

/**
 * Tiles from an MBTiles 1.3 archive (an SQLite file with `metadata` and `tiles`), opened
 * read-only. MBTiles rows use the TMS scheme, whose y counts up from the south, so a request's
 * XYZ y becomes 2^z − 1 − y. Tile data is passed on as stored (gzipped or not).
 */
export class MbtilesTileSource implements TileSource {
  private readonly db: Database.Database;
  private readonly select: Database.Statement<[number, number, number], { tile_data: Buffer }>;
  private readonly metadata: Record<string, string>;

  constructor(readonly path: string) {
    try {
      this.db = new Database(path, { readonly: true, fileMustExist: true });
      const rows = this.db.prepare('SELECT name, value FROM metadata').all() as Array<{
        name: string;
        value: string;
      }>;
      this.metadata = Object.fromEntries(rows.map((r) => [r.name, r.value]));
      this.select = this.db.prepare(
        'SELECT tile_data FROM tiles WHERE zoom_level = ? AND tile_column = ? AND tile_row = ?',
      );
    } catch (cause) {
      throw new Error(
        `MBTILES_PATH=${path} is not a readable MBTiles archive: ${(cause as Error).message}`,
        { cause },
      );
    }
    const format = this.metadata.format ?? 'pbf';
    if (format !== 'pbf') {
      this.db.close();
      throw new Error(
        `MBTILES_PATH=${path} holds "${format}" tiles; the Atlas draws vector tiles (format "pbf").`,
      );
    }
  }

  info(): TileSetInfo {
    const layers = (() => {
      try {
        const json = JSON.parse(this.metadata.json ?? '{}') as {
          vector_layers?: Array<{ id: string; minzoom?: number; maxzoom?: number }>;
        };
        return (json.vector_layers ?? []).map(({ id, minzoom, maxzoom }) => ({
          id,
          minzoom,
          maxzoom,
        }));
      } catch {
        return [];
      }
    })();
    return {
      source: 'mbtiles',
      name: this.metadata.name ?? 'Map archive',
      minzoom: Number(this.metadata.minzoom ?? 0),
      maxzoom: Number(this.metadata.maxzoom ?? 14),
      attribution: this.metadata.attribution ?? '© OpenStreetMap contributors',
      vector_layers: layers,
    };
  }

  tile({ z, x, y }: TileAddress): EncodedTile | null {
    const row = this.select.get(z, x, 2 ** z - 1 - y);
    if (!row || row.tile_data.length === 0) return null;
    const bytes = Buffer.from(row.tile_data);
    return { bytes, gzipped: isGzipped(bytes), etag: etagOf(bytes) };
  }

  close(): void {
    this.db.close();
  }
}
