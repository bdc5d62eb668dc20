import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import express from 'express';
import supertest from 'supertest';
import Database from 'better-sqlite3';
import { gzipSync } from 'node:zlib';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { VectorTile } from '@mapbox/vector-tile';
import { PbfReader } from 'pbf';
import geojsonvt from 'geojson-vt';
import { fromGeojsonVt } from 'vt-pbf';
import { errorHandler } from '../../../../server/errors/error-handler';
import { tilesRouter, type TilesOptions } from '../../../../server/modules/tiles/tiles.router';

function appWith(options: TilesOptions = {}) {
  return express()
    .use('/tiles', tilesRouter(options))
    .use(errorHandler(() => undefined));
}

/** Layers of a tile, each as the list of its features' names (or kinds). */
function decode(body: Buffer): Record<string, string[]> {
  const tile = new VectorTile(new PbfReader(body));
  return Object.fromEntries(
    Object.entries(tile.layers).map(([name, layer]) => {
      const names: string[] = [];
      for (let i = 0; i < layer.length; i++) {
        const props = layer.feature(i).properties;
        names.push(String(props.name ?? props.kind ?? ''));
      }
      return [name, names];
    }),
  );
}

const binary = (res: supertest.Response, done: (e: Error | null, b: Buffer) => void) => {
  const chunks: Buffer[] = [];
  res.on('data', (c: Buffer) => chunks.push(c));
  res.on('end', () => done(null, Buffer.concat(chunks)));
};

describe('GET /tiles/base/{z}/{x}/{y}.pbf (built-in boundaries)', () => {
  const app = appWith();

  it('when a z4 tile over Texas is asked for then it holds land, countries and a state named Texas', async () => {
    const res = await supertest(app)
      .get('/tiles/base/4/3/6.pbf')
      .buffer(true)
      .parse(binary)
      .expect(200);
    expect(res.headers['content-type']).toMatch(/^application\/x-protobuf/);
    expect(res.headers['cache-control']).toContain('max-age=86400');
    expect(res.headers.etag).toMatch(/^"[\w-]+"$/);
    const layers = decode(res.body);
    expect(Object.keys(layers)).toEqual(
      expect.arrayContaining(['land', 'countries', 'states', 'borders', 'labels']),
    );
    expect(layers.states).toContain('Texas');
    expect(layers.countries).toEqual(
      expect.arrayContaining(['United States of America', 'Mexico']),
    );
    expect(layers.borders).toEqual(expect.arrayContaining(['country', 'state']));
    expect(layers.counties).toBeUndefined(); // counties start at z5
  });

  it('when the whole world (z0) is asked for then countries are there but no states yet', async () => {
    const res = await supertest(app)
      .get('/tiles/base/0/0/0.pbf')
      .buffer(true)
      .parse(binary)
      .expect(200);
    const layers = decode(res.body);
    expect(layers.countries.length).toBeGreaterThan(150);
    expect(layers.countries).toEqual(expect.arrayContaining(['France', 'Brazil', 'Australia']));
    expect(layers.states).toBeUndefined();
  });

  it('when a z8 tile over the Central Valley is asked for then it has Fresno county and its borders', async () => {
    // 36.75° N, 119.8° W (Fresno) lies in z8 tile x 42, y 99.
    const res = await supertest(app)
      .get('/tiles/base/8/42/99.pbf')
      .buffer(true)
      .parse(binary)
      .expect(200);
    const layers = decode(res.body);
    expect(layers.states).toContain('California');
    expect(layers.counties).toContain('Fresno');
    expect(layers.borders).toContain('county');
  });

  it('when a tile lies in the open Pacific then the answer is 204 with no body', async () => {
    const res = await supertest(app).get('/tiles/base/6/5/30.pbf').expect(204);
    expect(res.headers['cache-control']).toContain('max-age=86400');
    expect(res.body).toEqual({});
  });

  it('when the client sends back the ETag then the answer is 304 without a body', async () => {
    const first = await supertest(app).get('/tiles/base/5/7/12.pbf').expect(200);
    const etag = first.headers.etag;
    const again = await supertest(app).get('/tiles/base/5/7/12.pbf').set('If-None-Match', etag);
    expect(again.status).toBe(304);
    expect(again.headers.etag).toBe(etag);
    const changed = await supertest(app)
      .get('/tiles/base/5/7/12.pbf')
      .set('If-None-Match', '"other"');
    expect(changed.status).toBe(200);
  });

  it.each([
    ['/tiles/base/15/0/0.pbf', 'z'],
    ['/tiles/base/3/8/0.pbf', 'x'],
    ['/tiles/base/3/0/8.pbf', 'y'],
    ['/tiles/base/a/0/0.pbf', 'z'],
    ['/tiles/base/2/1.5/0.pbf', 'x'],
    ['/tiles/base/2/0/-1.pbf', 'y'],
  ])('when the address is %s then 400 names %s in the error envelope', async (url, field) => {
    const res = await supertest(app).get(url).expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.details.map((d: { field: string }) => d.field)).toContain(field);
  });

  it('when another tile set is asked for then 404 in the error envelope', async () => {
    const res = await supertest(app).get('/tiles/satellite/1/0/0.pbf').expect(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('when the tile set is described then it lists the boundary layers', async () => {
    const res = await supertest(app).get('/tiles/base.json').expect(200);
    expect(res.body.source).toBe('boundaries');
    expect(res.body.tiles).toEqual(['/tiles/base/{z}/{x}/{y}.pbf']);
    expect(res.body.vector_layers.map((l: { id: string }) => l.id)).toEqual(
      expect.arrayContaining(['land', 'countries', 'states', 'counties', 'borders', 'labels']),
    );
  });
});

describe('GET /tiles/base/{z}/{x}/{y}.pbf (MBTiles archive configured)', () => {
  let folder: string;
  let archive: string;
  const roadTile = (name: string) => {
    const index = new geojsonvt(
      {
        type: 'Feature',
        geometry: {
          type: 'LineString',
          coordinates: [
            [-120.1, 36.6],
            [-119.9, 36.7],
          ],
        },
        properties: { name },
      },
      { maxZoom: 14 },
    );
    // 36.65° N, 120° W at z10: x 170, y 399 in XYZ.
    return Buffer.from(fromGeojsonVt({ transportation: index.getTile(10, 170, 399)! }));
  };

  beforeAll(() => {
    folder = mkdtempSync(path.join(tmpdir(), 'duskhaul-mbtiles-'));
    archive = path.join(folder, 'region.mbtiles');
    const db = new Database(archive);
    db.exec(`CREATE TABLE metadata (name text, value text);
             CREATE TABLE tiles (zoom_level integer, tile_column integer, tile_row integer, tile_data blob);
             CREATE UNIQUE INDEX tile_index ON tiles (zoom_level, tile_column, tile_row);`);
    const meta = db.prepare('INSERT INTO metadata (name, value) VALUES (?, ?)');
    meta.run('name', 'Test valley');
    meta.run('format', 'pbf');
    meta.run('minzoom', '0');
    meta.run('maxzoom', '14');
    meta.run('json', JSON.stringify({ vector_layers: [{ id: 'transportation' }] }));
    const put = db.prepare('INSERT INTO tiles VALUES (?, ?, ?, ?)');
    // TMS row of XYZ y 399 at z10 is 2^10 − 1 − 399 = 624.
    put.run(10, 170, 624, gzipSync(roadTile('Valley Road')));
    // A plain (not gzipped) tile in TMS row 399, which is XYZ y 624.
    put.run(10, 170, 399, roadTile('Plain Row'));
    db.close();
  });
  afterAll(() => rmSync(folder, { recursive: true, force: true }));

  it('when the tile is in the archive then it is served gzipped from the flipped TMS row', async () => {
    const app = appWith({ mbtilesPath: archive });
    const res = await supertest(app)
      .get('/tiles/base/10/170/399.pbf')
      .set('Accept-Encoding', 'gzip')
      .buffer(true)
      .parse(binary)
      .expect(200);
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(decode(res.body)).toEqual({ transportation: ['Valley Road'] });
  });

  it('when the client takes no gzip then the archive tile is unzipped first', async () => {
    const app = appWith({ mbtilesPath: archive });
    const res = await supertest(app)
      .get('/tiles/base/10/170/399.pbf')
      .set('Accept-Encoding', 'identity')
      .buffer(true)
      .parse(binary)
      .expect(200);
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(decode(res.body)).toEqual({ transportation: ['Valley Road'] });
  });

  it('when a stored tile is not gzipped then it is sent as stored, from the mirrored row', async () => {
    const app = appWith({ mbtilesPath: archive });
    const res = await supertest(app)
      .get('/tiles/base/10/170/624.pbf')
      .set('Accept-Encoding', 'gzip')
      .buffer(true)
      .parse(binary)
      .expect(200);
    expect(res.headers['content-encoding']).toBeUndefined();
    expect(decode(res.body)).toEqual({ transportation: ['Plain Row'] });
  });

  it('when the archive has no such tile then 204, not the built-in boundaries', async () => {
    const app = appWith({ mbtilesPath: archive });
    await supertest(app).get('/tiles/base/4/3/6.pbf').expect(204);
  });

  it('when the archive is configured then the tile set says so', async () => {
    const res = await supertest(appWith({ mbtilesPath: archive }))
      .get('/tiles/base.json')
      .expect(200);
    expect(res.body).toMatchObject({ source: 'mbtiles', name: 'Test valley' });
    expect(res.body.vector_layers).toEqual([{ id: 'transportation' }]);
  });

  it('when the configured file is not an archive then the factory fails with its path', () => {
    expect(() => tilesRouter({ mbtilesPath: path.join(folder, 'missing.mbtiles') })).toThrow(
      /missing\.mbtiles/,
    );
  });
});
