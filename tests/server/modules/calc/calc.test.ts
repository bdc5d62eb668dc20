import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../../server/app';
import { signedInClient, startTestApp, type Client, type TestApp } from '../../../support/test-app';
import { createCrew, testPassword } from '../../../support/factories';

let t: TestApp;
let planner: Client;
let crewEmail: string;
let fakeRouter: Server;
let routedRequests: string[];

const moveWindow = {
  origin: { lat: 28.0, lon: -97.9 },
  destination: { lat: 36.6, lon: -120.3 },
  date: '2027-01-26',
  loadingMinutes: 120,
  averageSpeedKmh: 85,
  drivers: 2,
};

beforeAll(async () => {
  t = await startTestApp();
  const people = await createCrew(t.db);
  crewEmail = people.crew.email;
  planner = await signedInClient(t.app, people.planner.email, testPassword);
  // A local stand-in for an OSRM-compatible routing service.
  routedRequests = [];
  fakeRouter = createServer((req, res) => {
    routedRequests.push(req.url ?? '');
    res.setHeader('Content-Type', 'application/json');
    res.end(JSON.stringify({ code: 'Ok', routes: [{ distance: 2_461_000, duration: 90_000 }] }));
  }).listen(0, '127.0.0.1');
  await new Promise((resolve) => fakeRouter.once('listening', resolve));
});
afterAll(async () => {
  fakeRouter.close();
  await t.close();
});

describe('POST /api/calc/*', () => {
  it('hive-weight: when two deeps are sent then the answer has weightKg', async () => {
    const { body } = await planner
      .post('/api/calc/hive-weight', {
        boxes: [
          { size: 'deep', honeyFill: 1 },
          { size: 'deep', honeyFill: 0.5 },
        ],
        includeBees: true,
        includeFloorAndLid: true,
      })
      .expect(200);
    expect(body.weightKg).toBeGreaterThan(40);
    expect(body.weightKg).toBeLessThan(90);
  });

  it('load-plan: when a night is planned then each truck reports pallets, colonies, weightKg and weightUpperKg within payload', async () => {
    const { body } = await planner
      .post('/api/calc/load-plan', {
        colonies: 1600,
        coloniesPerPallet: 4,
        palletTareKg: 18,
        hiveWeightKg: { mean: 45, sd: 6, samples: 20 },
        trucks: [1, 2, 3, 4, 5].map((n) => ({
          id: `rig-${n}`,
          payloadKg: 21_500,
          palletSpots: 26,
          tiers: 2,
        })),
      })
      .expect(200);
    expect(Object.keys(body).sort()).toEqual(['totalWeightKg', 'trucks', 'unassignedColonies']);
    for (const truck of body.trucks) {
      expect(Object.keys(truck).sort()).toEqual([
        'colonies',
        'id',
        'pallets',
        'weightKg',
        'weightUpperKg',
      ]);
      expect(truck.weightUpperKg).toBeLessThanOrEqual(21_500);
    }
    const loaded = body.trucks.reduce((s: number, tr: { colonies: number }) => s + tr.colonies, 0);
    expect(loaded + body.unassignedColonies).toBe(1600);
  });

  it('move-window: when a team hauls Texas to the San Joaquin Valley then every contract field is there, in local zones', async () => {
    const { body } = await planner.post('/api/calc/move-window', moveWindow).expect(200);
    for (const field of [
      'origin',
      'destination',
      'loadingStart',
      'departure',
      'arrival',
      'distanceKm',
      'driveMinutes',
      'restMinutes',
      'arrivesBeforeDawn',
      'latestDepartureForDawn',
      'legs',
    ]) {
      expect(body).toHaveProperty(field);
    }
    expect(body.origin.timeZone).toBe('America/Chicago');
    expect(body.destination.timeZone).toBe('America/Los_Angeles');
    expect(body.departure).toMatch(/-06:00$/); // CST in January
    expect(body.arrival).toMatch(/-08:00$/); // PST
    expect(body.distanceSource).toBe('great-circle');
  });

  it('site-plan: when an almond block of 40 ha is planned then colonies follow 2 per acre', async () => {
    const { body } = await planner
      .post('/api/calc/site-plan', {
        crop: 'almond',
        areaHa: 40,
        coloniesPerPallet: 4,
        palletsPerDrop: 4,
      })
      .expect(200);
    // 40 ha = 98.84 acres (1 acre = 0.40468564224 ha) × 2 per acre (Almond Board of California) → 198.
    expect(body.colonies).toBe(198);
    expect(body.hivesPerAcre).toBe(2);
    expect(body.drops.type).toBe('FeatureCollection');
  });

  it('GET /api/crops: when asked then every crop key of the contract is listed with a source', async () => {
    const { body } = await planner.get('/api/crops').expect(200);
    const keys = body.items.map((c: { key: string }) => c.key);
    expect(keys).toEqual([
      'almond',
      'apple',
      'pear',
      'plum',
      'cherry',
      'blueberry',
      'cranberry',
      'cucumber',
      'melon',
      'watermelon',
      'squash',
      'canola',
      'alfalfa-seed',
      'sunflower',
      'avocado',
      'honey',
    ]);
    expect(body.items.every((c: { source: string }) => c.source.length > 0)).toBe(true);
  });

  const bad: Array<[string, string, object, string]> = [
    [
      'latitude out of range',
      'move-window',
      { ...moveWindow, origin: { lat: 95, lon: -97.9 } },
      'origin.lat',
    ],
    ['a date that does not exist', 'move-window', { ...moveWindow, date: '2027-02-30' }, 'date'],
    ['zero speed', 'move-window', { ...moveWindow, averageSpeedKmh: 0 }, 'averageSpeedKmh'],
    ['text for a number', 'move-window', { ...moveWindow, loadingMinutes: '90' }, 'loadingMinutes'],
    [
      'zero tiers',
      'load-plan',
      {
        colonies: 10,
        coloniesPerPallet: 4,
        palletTareKg: 18,
        hiveWeightKg: { mean: 45, sd: 6, samples: 20 },
        trucks: [{ id: 'a', payloadKg: 20000, palletSpots: 24, tiers: 0 }],
      },
      'trucks.0.tiers',
    ],
    [
      'a self-intersecting boundary',
      'site-plan',
      {
        crop: 'almond',
        coloniesPerPallet: 4,
        palletsPerDrop: 4,
        boundary: {
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
        },
      },
      'boundary',
    ],
    [
      'an unknown crop with no rate',
      'site-plan',
      { crop: 'kiwi', areaHa: 10, coloniesPerPallet: 4, palletsPerDrop: 4 },
      'crop',
    ],
    [
      'an unknown box size',
      'hive-weight',
      { boxes: [{ size: 'jumbo', honeyFill: 0.5 }] },
      'boxes.0.size',
    ],
  ];
  for (const [what, endpoint, body, field] of bad) {
    it(`${endpoint}: when given ${what} then 400 names ${field}`, async () => {
      const response = await planner.post(`/api/calc/${endpoint}`, body).expect(400);
      expect(response.body.error.details.map((d: { field: string }) => d.field)).toContain(field);
    });
  }

  it('when a routing service is configured then move-window uses its road distance', async () => {
    const url = `http://127.0.0.1:${(fakeRouter.address() as AddressInfo).port}`;
    const app = createApp({ db: t.db, env: { ...t.env, ROUTING_URL: url } });
    const crew = await signedInClient(app, crewEmail, testPassword);
    const { body } = await crew.post('/api/calc/move-window', moveWindow).expect(200);
    expect(body.distanceKm).toBeCloseTo(2461, 6);
    expect(body.distanceSource).toBe('routing-service');
    expect(routedRequests.at(-1)).toBe('/route/v1/driving/-97.9,28;-120.3,36.6?overview=false');
  });

  it('when the routing service is down then move-window falls back to the great circle', async () => {
    const app = createApp({ db: t.db, env: { ...t.env, ROUTING_URL: 'http://127.0.0.1:9' } });
    const crew = await signedInClient(app, crewEmail, testPassword);
    const { body } = await crew.post('/api/calc/move-window', moveWindow).expect(200);
    expect(body.distanceSource).toBe('great-circle');
  });
});
