/**
 * Tile benchmark (a plain script): node --import tsx bench/tiles.bench.ts
 *
 * Times the built-in basemap's tiles over the contiguous United States at z5 and z8: building
 * every layer's geojson-vt index (once per process), then each tile the first time it is asked
 * for (cold: slicing below the pre-built zooms and encoding) and again (warm: the tile cache).
 */
import { BoundaryTileSource } from '../server/modules/tiles/boundary-tile-source';
import type { TileAddress } from '../server/modules/tiles/tile-coordinates';

/** XYZ tiles covering 24–50° N, 125–66° W at zoom z, every `step`-th one. */
function contiguousUs(z: number, step = 1): TileAddress[] {
  const n = 2 ** z;
  const x = (lon: number) => Math.floor(((lon + 180) / 360) * n);
  const y = (lat: number) => {
    const r = (lat * Math.PI) / 180;
    return Math.floor(((1 - Math.log(Math.tan(r) + 1 / Math.cos(r)) / Math.PI) / 2) * n);
  };
  const tiles: TileAddress[] = [];
  for (let tx = x(-125); tx <= x(-66); tx += step)
    for (let ty = y(50); ty <= y(24); ty += step) tiles.push({ z, x: tx, y: ty });
  return tiles;
}

function perTile(label: string, source: BoundaryTileSource, tiles: TileAddress[]) {
  let bytes = 0;
  let empty = 0;
  const start = performance.now();
  for (const tile of tiles) {
    const encoded = source.tile(tile);
    if (encoded) bytes += encoded.bytes.length;
    else empty += 1;
  }
  const ms = performance.now() - start;
  console.log(
    `${label.padEnd(34)} ${String(tiles.length).padStart(5)} tiles ${(ms / tiles.length).toFixed(3).padStart(9)} ms/tile  ` +
      `${(bytes / Math.max(1, tiles.length - empty) / 1024).toFixed(1).padStart(6)} KiB avg  ${empty} empty`,
  );
  return ms / tiles.length;
}

const source = new BoundaryTileSource();
const started = performance.now();
source.warm();
console.log(
  `${'build every layer index (once)'.padEnd(34)} ${(performance.now() - started).toFixed(0).padStart(5)} ms`,
);

const z5 = contiguousUs(5);
const z8 = contiguousUs(8, 2);
perTile('z5 cold (slice + encode)', source, z5);
perTile('z5 warm (cached)', source, z5);
perTile('z8 cold (slice + encode)', source, z8);
perTile('z8 warm (cached)', source, z8);
