import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInClient, type Client, type TestApp } from '../../../support/test-app';
import { createCrew, createOperation, createUser, testPassword } from '../../../support/factories';
import { startAtlasTestApp } from './atlas-test-app';

let t: TestApp;
let planner: Client;
let crew: Client;
let stranger: Client;
let operationId: string;

beforeAll(async () => {
  t = await startAtlasTestApp();
  const people = await createCrew(t.db);
  operationId = people.operationId;
  planner = await signedInClient(t.app, people.planner.email, testPassword);
  crew = await signedInClient(t.app, people.crew.email, testPassword);
  const other = await createUser(t.db, await createOperation(t.db, 'Other outfit'), 'owner');
  stranger = await signedInClient(t.app, other.email, testPassword);
});
afterAll(() => t.close());

async function newSite(crop = 'almond') {
  const [row] = await t.db.query(
    `INSERT INTO sites (operation_id, name, kind, crop, latitude, longitude) VALUES ($1, 'Upload block', $2, $3, 36.6, -120.3) RETURNING id`,
    [operationId, crop === 'honey' ? 'honey' : 'orchard', crop],
  );
  return row.id as string;
}

// About 800 m × 800 m ≈ 64.5 ha ≈ 159 acres near Fresno.
const square = [
  [-120.3, 36.6, 91],
  [-120.291, 36.6, 92],
  [-120.291, 36.6072, 93],
  [-120.3, 36.6072, 94],
  [-120.3, 36.6, 91],
];
const featureFile = JSON.stringify({
  type: 'FeatureCollection',
  features: [
    {
      type: 'Feature',
      properties: { name: 'pin' },
      geometry: { type: 'Point', coordinates: [-120.29, 36.6] },
    },
    {
      type: 'Feature',
      properties: { name: 'Block 7' },
      geometry: { type: 'Polygon', coordinates: [square] },
    },
  ],
});

describe('POST /api/sites/:id/boundary', () => {
  it('when a planner uploads a GeoJSON block then boundary, acreage and almond drops are saved', async () => {
    const id = await newSite();
    const res = await planner
      .post(`/api/sites/${id}/boundary`, { format: 'geojson', text: featureFile, version: 1 })
      .expect(200);
    expect(res.body.version).toBe(2);
    expect(res.body.boundary.coordinates[0][0]).toEqual([-120.3, 36.6]); // heights dropped
    expect(res.body.areaHa).toBeGreaterThan(62);
    expect(res.body.areaHa).toBeLessThan(67);
    // Almond: 2 colonies per acre (Almond Board of California), 4 per pallet, 4 pallets per drop.
    const acres = res.body.plan.areaAcres;
    expect(res.body.plan.colonies).toBe(Math.ceil(acres * 2));
    expect(res.body.plan.dropCount).toBe(Math.ceil(Math.ceil(res.body.plan.colonies / 4) / 4));
    expect(res.body.drops.features).toHaveLength(res.body.plan.dropCount);
    const [row] = await t.db.query(
      `SELECT area_ha, drops, version, latitude FROM sites WHERE id = $1`,
      [id],
    );
    expect(row.version).toBe(2);
    expect(row.drops.features).toHaveLength(res.body.plan.dropCount);
    expect(row.latitude).toBeGreaterThan(36.6);
  });

  it('when the pallets per drop change then the drops are fewer', async () => {
    const id = await newSite();
    const res = await planner
      .post(`/api/sites/${id}/boundary`, {
        format: 'geojson',
        text: JSON.stringify({ type: 'Polygon', coordinates: [square] }),
        version: 1,
        palletsPerDrop: 20,
      })
      .expect(200);
    expect(res.body.plan.dropCount).toBe(Math.ceil(res.body.plan.pallets / 20));
  });

  it('when the site is a honey location then the boundary and area are saved without drops', async () => {
    const id = await newSite('honey');
    const res = await planner
      .post(`/api/sites/${id}/boundary`, {
        format: 'geojson',
        text: JSON.stringify({ type: 'Polygon', coordinates: [square] }),
        version: 1,
      })
      .expect(200);
    expect(res.body).toMatchObject({ drops: null, plan: { colonies: null, dropCount: 0 } });
    expect(res.body.areaHa).toBeGreaterThan(60);
  });

  it.each([
    ['not JSON', 'PK\u0003\u0004 this is a zip', /not valid JSON/],
    ['no polygon', JSON.stringify({ type: 'Point', coordinates: [1, 2] }), /no polygon/],
    [
      'two polygons',
      JSON.stringify({ type: 'MultiPolygon', coordinates: [[square], [square]] }),
      /2 polygons/,
    ],
    [
      'an open ring',
      JSON.stringify({ type: 'Polygon', coordinates: [square.slice(0, 4)] }),
      /not closed/,
    ],
    [
      'a bow tie',
      JSON.stringify({
        type: 'Polygon',
        coordinates: [
          [
            [0, 0],
            [1, 1],
            [1, 0],
            [0, 1],
            [0, 0],
          ],
        ],
      }),
      /crosses itself/,
    ],
    ['an unknown type', JSON.stringify({ type: 'Blob' }), /not a GeoJSON type/],
  ])('when the file has %s then 400 says so and nothing changes', async (_label, text, message) => {
    const id = await newSite();
    const res = await planner
      .post(`/api/sites/${id}/boundary`, { format: 'geojson', text, version: 1 })
      .expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.message).toMatch(message);
    expect(res.body.error.details[0].field).toBe('text');
    const [row] = await t.db.query(`SELECT version, boundary FROM sites WHERE id = $1`, [id]);
    expect(row).toEqual({ version: 1, boundary: null });
  });

  it('when a file has too many vertices then 400 comes back within 2 seconds', async () => {
    const id = await newSite();
    const ring = Array.from({ length: 6000 }, (_, i) => {
      const a = (2 * Math.PI * i) / 6000;
      return [-120.3 + 0.01 * Math.cos(a), 36.6 + 0.01 * Math.sin(a)];
    });
    ring.push(ring[0]);
    const started = Date.now();
    const res = await planner
      .post(`/api/sites/${id}/boundary`, {
        format: 'geojson',
        text: JSON.stringify({ type: 'Polygon', coordinates: [ring] }),
        version: 1,
      })
      .expect(400);
    expect(Date.now() - started).toBeLessThan(2000);
    expect(res.body.error.message).toMatch(/6001 vertices/);
  });

  it('when a file holds thousands of features then 400 before reading them', async () => {
    const id = await newSite();
    const features = Array.from({ length: 3000 }, () => ({
      type: 'Feature',
      properties: {},
      geometry: { type: 'Point', coordinates: [0, 0] },
    }));
    const res = await planner
      .post(`/api/sites/${id}/boundary`, {
        format: 'geojson',
        text: JSON.stringify({ type: 'FeatureCollection', features }),
        version: 1,
      })
      .expect(400);
    expect(res.body.error.message).toMatch(/3000 features/);
  });

  it('when the body is over the 1 MB limit then 413', async () => {
    const id = await newSite();
    const res = await planner
      .post(`/api/sites/${id}/boundary`, {
        format: 'geojson',
        text: 'x'.repeat(1_100_000),
        version: 1,
      })
      .expect(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('when the text is long but under the body limit then 400 names the size', async () => {
    const id = await newSite();
    const res = await planner
      .post(`/api/sites/${id}/boundary`, {
        format: 'geojson',
        text: ' '.repeat(950_000),
        version: 1,
      })
      .expect(400);
    expect(res.body.error.details[0]).toMatchObject({ field: 'text' });
    expect(res.body.error.message).toMatch(/text/);
  });

  it('when the version is stale then 409 and the boundary stays as it was', async () => {
    const id = await newSite();
    await t.db.query(`UPDATE sites SET version = 3 WHERE id = $1`, [id]);
    const res = await planner
      .post(`/api/sites/${id}/boundary`, {
        format: 'geojson',
        text: JSON.stringify({ type: 'Polygon', coordinates: [square] }),
        version: 1,
      })
      .expect(409);
    expect(res.body.error).toMatchObject({
      code: 'version_conflict',
      details: { currentVersion: 3 },
    });
  });

  it('when crew upload, or another operation names the site, then 403 and 404', async () => {
    const id = await newSite();
    const body = {
      format: 'geojson',
      text: JSON.stringify({ type: 'Polygon', coordinates: [square] }),
      version: 1,
    };
    await crew.post(`/api/sites/${id}/boundary`, body).expect(403);
    await stranger.post(`/api/sites/${id}/boundary`, body).expect(404);
  });

  it('when the format is KML then 400 asks for GeoJSON (the browser converts KML)', async () => {
    const id = await newSite();
    const res = await planner
      .post(`/api/sites/${id}/boundary`, { format: 'kml', text: '<kml/>', version: 1 })
      .expect(400);
    expect(res.body.error.details[0].field).toBe('format');
  });
});

describe('PATCH /api/sites/:id/drops', () => {
  it('when a planner drags a drop inside the block then it is saved there; outside is refused', async () => {
    const id = await newSite();
    const uploaded = await planner
      .post(`/api/sites/${id}/boundary`, {
        format: 'geojson',
        text: JSON.stringify({ type: 'Polygon', coordinates: [square] }),
        version: 1,
      })
      .expect(200);
    const moved = await planner
      .patch(`/api/sites/${id}/drops`, {
        version: 2,
        drop: 1,
        latitude: 36.601,
        longitude: -120.299,
      })
      .expect(200);
    expect(moved.body.version).toBe(3);
    expect(moved.body.drops.features[0].geometry.coordinates).toEqual([-120.299, 36.601]);
    expect(moved.body.drops.features[0].properties).toEqual(
      uploaded.body.drops.features[0].properties,
    );
    const outside = await planner
      .patch(`/api/sites/${id}/drops`, { version: 3, drop: 1, latitude: 36.7, longitude: -120.299 })
      .expect(400);
    expect(outside.body.error.details.map((d: { field: string }) => d.field)).toContain('latitude');
    await planner
      .patch(`/api/sites/${id}/drops`, {
        version: 3,
        drop: 99,
        latitude: 36.601,
        longitude: -120.299,
      })
      .expect(400);
    await crew
      .patch(`/api/sites/${id}/drops`, {
        version: 3,
        drop: 1,
        latitude: 36.601,
        longitude: -120.299,
      })
      .expect(403);
  });
});
