import { Router, type Request, type Response } from 'express';
import { gunzipSync } from 'node:zlib';
import { AppError } from '../../errors/app-error';
import { BoundaryTileSource } from './boundary-tile-source';
import { MbtilesTileSource } from './mbtiles-tile-source';
import { parseTileAddress } from './tile-coordinates';
import type { EncodedTile, TileSource } from './tile-source';

export interface TilesOptions {
  /** An MBTiles archive of vector tiles to serve instead of the built-in boundaries. */
  mbtilesPath?: string;
  /** A ready source (tests, benchmarks); wins over `mbtilesPath`. */
  source?: TileSource;
}

/** A day in seconds: tiles change only when the operator swaps the archive and restarts. */
const cacheControl = 'public, max-age=86400, stale-while-revalidate=604800';

/** The tile source the options describe: the archive when configured, else the boundaries. */
export function createTileSource(options: TilesOptions = {}): TileSource {
  if (options.source) return options.source;
  if (options.mbtilesPath) return new MbtilesTileSource(options.mbtilesPath);
  const boundaries = new BoundaryTileSource();
  return boundaries;
}

/**
 * /tiles: the basemap, public (tiles carry no tenant data), cacheable by any HTTP cache.
 * `GET /tiles/base/{z}/{x}/{y}.pbf` answers a Mapbox Vector Tile (200), 204 when the tile set has
 * nothing there, 304 when If-None-Match holds its ETag, 400 for an impossible address.
 * `GET /tiles/base.json` describes the tile set (TileJSON-like) so the client picks its styles.
 */
export function tilesRouter(options: TilesOptions = {}) {
  const source = createTileSource(options);
  const router = Router();

  router.get('/base.json', (_req, res) => {
    res.set('Cache-Control', 'public, max-age=300');
    res.json({
      tilejson: '3.0.0',
      scheme: 'xyz',
      tiles: ['/tiles/base/{z}/{x}/{y}.pbf'],
      ...source.info(),
    });
  });

  router.get('/base/:z/:x/:y.pbf', (req, res) => {
    const address = parseTileAddress(req.params as { z: string; x: string; y: string });
    const tile = source.tile(address);
    res.set('Cache-Control', cacheControl);
    res.set('Vary', 'Accept-Encoding');
    if (!tile) {
      res.status(204).end();
      return;
    }
    send(req, res, tile);
  });

  router.use((req) => {
    throw new AppError(404, 'not_found', `No tiles at ${req.baseUrl}${req.path}.`);
  });
  return router;
}

function send(req: Request, res: Response, tile: EncodedTile) {
  res.set('ETag', tile.etag);
  if (matches(req.get('If-None-Match'), tile.etag)) {
    res.status(304).end();
    return;
  }
  res.type('application/x-protobuf');
  if (tile.gzipped && req.acceptsEncodings('gzip')) {
    res.set('Content-Encoding', 'gzip');
    res.send(tile.bytes);
  } else {
    res.send(tile.gzipped ? gunzipSync(tile.bytes) : tile.bytes);
  }
}

/** If-None-Match: `*` or a list of (possibly weak) ETags. */
function matches(header: string | undefined, etag: string): boolean {
  if (!header) return false;
  if (header.trim() === '*') return true;
  return header.split(',').some((candidate) => candidate.trim().replace(/^W\//, '') === etag);
}
