import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DataSource } from 'typeorm';
import {
  anonymousClient,
  signedInClient,
  startTestApp,
  type Client,
  type TestApp,
} from '../../support/test-app';
import {
  buyColonies,
  createCrew,
  createGrower,
  createHiveSetup,
  createLot,
  createOperation,
  createUser,
  createYard,
  testPassword,
} from '../../support/factories';

/**
 * Every API route × every kind of caller, with the status each must get (SECURITY.md). The test
 * fails when the app has a route this table does not list. Denied writes must change nothing.
 */
type Actor =
  'anonymous' | 'owner' | 'planner' | 'crew' | 'growerA' | 'growerB' | 'otherOwner' | 'deactivated';
type Row = [
  anonymous: number,
  owner: number,
  planner: number,
  crew: number,
  growerA: number,
  growerB: number,
  otherOwner: number,
  deactivated: number,
];
const actors: Actor[] = [
  'anonymous',
  'owner',
  'planner',
  'crew',
  'growerA',
  'growerB',
  'otherOwner',
  'deactivated',
];

//                                                anon owner plan crew  grA  grB  other deact
const matrix: Record<string, Row> = {
  'GET /api/health': [200, 200, 200, 200, 200, 200, 200, 200],
  'GET /api/session': [200, 200, 200, 200, 200, 200, 200, 200],
  'POST /api/session': [401, 401, 401, 401, 401, 401, 401, 401], // wrong password for everyone
  'PUT /api/session/preferences': [401, 200, 200, 200, 200, 200, 200, 401],
  'POST /api/session/password': [401, 400, 400, 400, 400, 400, 400, 401], // wrong current password
  'GET /api/yards': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/yards/:id': [401, 200, 200, 200, 403, 403, 404, 401],
  'POST /api/yards': [401, 201, 201, 403, 403, 403, 201, 401],
  'PATCH /api/yards/:id': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/yards/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'GET /api/sites': [401, 200, 200, 200, 200, 200, 200, 401],
  'GET /api/sites/:id': [401, 200, 200, 200, 200, 404, 404, 401],
  'POST /api/sites': [401, 201, 201, 403, 403, 403, 400, 401], // grower of another operation
  'PATCH /api/sites/:id': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/sites/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'GET /api/growers': [401, 200, 200, 200, 200, 200, 200, 401],
  'GET /api/growers/:id': [401, 200, 200, 200, 200, 404, 404, 401],
  'POST /api/growers': [401, 201, 201, 403, 403, 403, 201, 401],
  'PATCH /api/growers/:id': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/growers/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'GET /api/contracts': [401, 200, 200, 200, 200, 200, 200, 401],
  'GET /api/contracts/:id': [401, 200, 200, 200, 200, 404, 404, 401],
  'GET /api/contracts/:id/history': [401, 200, 200, 403, 200, 404, 404, 401],
  'POST /api/contracts': [401, 201, 201, 403, 403, 403, 400, 401],
  'PATCH /api/contracts/:id': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/contracts/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'GET /api/trucks': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/trucks/:id': [401, 200, 200, 200, 403, 403, 404, 401],
  'POST /api/trucks': [401, 201, 403, 403, 403, 403, 201, 401],
  'PATCH /api/trucks/:id': [401, 200, 403, 403, 403, 403, 404, 401],
  'POST /api/trucks/:id/archive': [401, 200, 403, 403, 403, 403, 404, 401],
  'GET /api/moves': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/moves/:id': [401, 200, 200, 200, 403, 403, 404, 401],
  'POST /api/moves': [401, 201, 201, 403, 403, 403, 400, 401],
  'PATCH /api/moves/:id': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/moves/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/moves/:id/status': [401, 200, 200, 403, 403, 403, 404, 401], // draft → planned: planners only
  'GET /api/hive-setups': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/hive-setups/:id': [401, 200, 200, 200, 403, 403, 404, 401],
  'POST /api/hive-setups': [401, 201, 201, 403, 403, 403, 201, 401],
  'PATCH /api/hive-setups/:id': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/hive-setups/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'GET /api/colony-lots': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/colony-lots/:id': [401, 200, 200, 200, 403, 403, 404, 401],
  'POST /api/colony-lots': [401, 201, 201, 403, 403, 403, 400, 401],
  'PATCH /api/colony-lots/:id': [401, 200, 200, 403, 403, 403, 404, 401],
  'POST /api/colony-lots/:id/archive': [401, 200, 200, 403, 403, 403, 404, 401],
  'GET /api/ledger': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/ledger/counts': [401, 200, 200, 200, 403, 403, 200, 401],
  'GET /api/ledger/:id': [401, 200, 200, 200, 403, 403, 404, 401],
  'POST /api/ledger': [401, 201, 201, 403, 403, 403, 400, 401],
  'GET /api/users': [401, 200, 403, 403, 403, 403, 200, 401],
  'GET /api/users/:id': [401, 200, 403, 403, 403, 403, 404, 401],
  'POST /api/users': [401, 201, 403, 403, 403, 403, 201, 401],
  'PATCH /api/users/:id': [401, 200, 403, 403, 403, 403, 404, 401],
  'POST /api/users/:id/archive': [401, 200, 403, 403, 403, 403, 404, 401],
  'GET /api/weight-samples': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/weight-samples': [401, 201, 201, 201, 403, 403, 400, 401],
  'GET /api/strength-samples': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/strength-samples': [401, 201, 201, 201, 403, 403, 400, 401],
  'GET /api/crops': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/calc/hive-weight': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/calc/load-plan': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/calc/move-window': [401, 200, 200, 200, 403, 403, 200, 401],
  'POST /api/calc/site-plan': [401, 200, 200, 200, 403, 403, 200, 401],
  // Last: signing out ends every client's session.
  'DELETE /api/session': [204, 204, 204, 204, 204, 204, 204, 204],
};

interface World {
  operationId: string;
  growerA: string;
  hiveSetup: string;
  lot: string;
  yard: string;
  destinationYard: string;
  truck: string;
}

/** A fresh record of the route's resource (so each allowed write has its own target). */
async function freshTarget(
  db: DataSource,
  w: World,
  resource: string,
  method = 'GET',
): Promise<string> {
  const one = async (sql: string, params: unknown[]) =>
    (await db.query(sql, params))[0].id as string;
  switch (resource) {
    case 'yards':
      return createYard(db, w.operationId);
    case 'sites':
      return one(
        `INSERT INTO sites (operation_id, grower_id, name, kind, crop, latitude, longitude) VALUES ($1, $2, 'Block', 'orchard', 'almond', 36.6, -120.3) RETURNING id`,
        [w.operationId, w.growerA],
      );
    case 'growers':
      // Reads need grower A (its own grower user may read it); writes get a grower of their own.
      return method === 'GET' ? w.growerA : createGrower(db, w.operationId, 'Written grower');
    case 'contracts':
      return one(
        `INSERT INTO contracts (operation_id, grower_id, crop, season, status, colonies_ordered, min_frames, fee_per_colony_cents, delivery_start_on, delivery_end_on)
         VALUES ($1, $2, 'almond', 2027, 'draft', 100, 6, 19000, '2027-02-05', '2027-02-10') RETURNING id`,
        [w.operationId, w.growerA],
      );
    case 'trucks':
      return one(
        `INSERT INTO trucks (operation_id, name, payload_kg, pallet_spots, tiers, tare_kg, legal_gross_kg) VALUES ($1, 'Rig', 21000, 24, 2, 15000, 36287) RETURNING id`,
        [w.operationId],
      );
    case 'moves': {
      const id = await one(
        `INSERT INTO moves (operation_id, name, night_of, status, destination_kind, destination_ids) VALUES ($1, 'Haul', '2027-01-28', 'draft', 'yard', ARRAY[$2]::uuid[]) RETURNING id`,
        [w.operationId, w.destinationYard],
      );
      await db.query(
        `INSERT INTO move_origins (operation_id, move_id, yard_id, lot_id, colonies) VALUES ($1, $2, $3, $4, 1)`,
        [w.operationId, id, w.yard, w.lot],
      );
      return id;
    }
    case 'hive-setups':
      return createHiveSetup(db, w.operationId);
    case 'colony-lots':
      return createLot(db, w.operationId, w.hiveSetup);
    case 'ledger':
      return one(`SELECT id FROM ledger_entries WHERE operation_id = $1 LIMIT 1`, [w.operationId]);
    case 'users':
      return (await createUser(db, w.operationId, 'crew')).id;
  }
  throw new Error(`no target for ${resource}`);
}

const calcBodies: Record<string, object> = {
  '/hive-weight': { boxes: [{ size: 'deep', honeyFill: 0.5 }] },
  '/load-plan': {
    colonies: 96,
    coloniesPerPallet: 4,
    palletTareKg: 20,
    hiveWeightKg: { mean: 50, sd: 5, samples: 10 },
    trucks: [{ id: 'a', payloadKg: 20000, palletSpots: 24, tiers: 2 }],
  },
  '/move-window': {
    origin: { lat: 28, lon: -97.9 },
    destination: { lat: 29, lon: -98.5 },
    date: '2027-01-20',
    loadingMinutes: 90,
    averageSpeedKmh: 80,
  },
  '/site-plan': { crop: 'almond', areaHa: 40, coloniesPerPallet: 4, palletsPerDrop: 4 },
};

/** A valid body for the route, read at call time (current versions). */
async function bodyFor(
  db: DataSource,
  w: World,
  method: string,
  resource: string,
  tail: string,
  id: string | null,
): Promise<object> {
  const version = async () => {
    const table =
      { 'hive-setups': 'hive_setups', 'colony-lots': 'colony_lots' }[resource] ?? resource;
    return (await db.query(`SELECT version FROM ${table} WHERE id = $1`, [id]))[0]
      .version as number;
  };
  if (resource === 'session') {
    if (tail === '/preferences') return { units: 'metric' };
    if (tail === '/password')
      return { currentPassword: 'not-my-password', newPassword: 'a-fresh-passphrase' };
    return {
      email: `nobody-${Math.random().toString(36).slice(2)}@example.test`,
      password: 'wrong-password',
    };
  }
  if (resource === 'calc') return calcBodies[tail];
  if (tail === '/archive') return { version: await version() };
  if (tail === '/status') return { version: await version(), status: 'planned' };
  const create: Record<string, object> = {
    yards: { name: 'Matrix yard', latitude: 28, longitude: -98, capacity: 100 },
    sites: {
      name: 'Matrix block',
      kind: 'orchard',
      crop: 'almond',
      growerId: w.growerA,
      latitude: 36.6,
      longitude: -120.3,
    },
    growers: { name: 'Matrix grower', contacts: [{ name: 'Pat', email: 'pat@example.test' }] },
    contracts: {
      growerId: w.growerA,
      crop: 'almond',
      season: 2027,
      coloniesOrdered: 50,
      minFrames: 6,
      feePerColonyCents: 19000,
      deliveryStartOn: '2027-02-01',
      deliveryEndOn: '2027-02-05',
    },
    trucks: { name: 'Matrix rig', payloadKg: 20000, palletSpots: 24, tiers: 2, tareKg: 15000 },
    moves: {
      name: 'Matrix haul',
      nightOf: '2027-01-20',
      destinationKind: 'yard',
      destinationIds: [w.destinationYard],
      origins: [{ yardId: w.yard, lotId: w.lot, colonies: 1 }],
      loads: [{ truckId: w.truck }],
    },
    'hive-setups': { name: 'Matrix setup', boxes: [{ size: 'deep', honeyFill: 0.5 }] },
    'colony-lots': { name: 'Matrix lot', hiveSetupId: w.hiveSetup, coloniesPerPallet: 4 },
    ledger: {
      lotId: w.lot,
      kind: 'loss',
      occurredOn: '2026-06-01',
      colonies: 1,
      from: { kind: 'yard', id: w.yard },
      reason: 'dead-out',
    },
    'weight-samples': { yardId: w.yard, sampledOn: '2026-11-02', weightsKg: [48.5, 52, 55.1] },
    'strength-samples': {
      placeKind: 'yard',
      placeId: w.yard,
      sampledOn: '2026-11-02',
      frames: [7, 8, 9, 6],
    },
    users: {
      email: `matrix-${Math.random().toString(36).slice(2)}@example.test`,
      name: 'New hand',
      role: 'crew',
      password: 'a-fresh-passphrase',
    },
  };
  if (method === 'POST') return create[resource];
  const patch: Record<string, object> = {
    yards: { capacity: 123 },
    sites: { notes: 'matrix' },
    growers: { billingAddress: 'matrix' },
    contracts: { terms: 'matrix' },
    trucks: { notes: 'matrix' },
    moves: { notes: 'matrix' },
    'hive-setups': { name: 'Matrix renamed' },
    'colony-lots': { notes: 'matrix' },
    users: { name: 'Renamed hand' },
  };
  return { version: await version(), ...patch[resource] };
}

/** A fingerprint of every tenant record of the operation, to prove a denied write changed nothing. */
async function snapshot(db: DataSource, operationId: string) {
  const tables = [
    'weight_samples',
    'strength_samples',
    'yards',
    'sites',
    'growers',
    'grower_contacts',
    'contracts',
    'contract_events',
    'trucks',
    'moves',
    'move_origins',
    'move_loads',
    'hive_setups',
    'colony_lots',
    'ledger_entries',
    'users',
  ];
  const parts = await Promise.all(
    tables.map(
      async (t) =>
        (
          await db.query(
            `SELECT md5(COALESCE(string_agg(x::text, '|' ORDER BY x.id), '')) AS h FROM ${t} x WHERE operation_id = $1`,
            [operationId],
          )
        )[0].h,
    ),
  );
  return parts.join(',');
}

let t: TestApp;
let world: World;
const clients = {} as Record<Actor, Client>;

beforeAll(async () => {
  t = await startTestApp();
  const people = await createCrew(t.db);
  const other = await createOperation(t.db, 'Another operation');
  const otherOwner = await createUser(t.db, other, 'owner');
  const deactivated = await createUser(t.db, people.operationId, 'planner');
  const hiveSetup = await createHiveSetup(t.db, people.operationId);
  const lot = await createLot(t.db, people.operationId, hiveSetup);
  const yard = await createYard(t.db, people.operationId, 'Origin');
  await buyColonies(t.db, people.operationId, lot, yard, 400);
  world = {
    operationId: people.operationId,
    growerA: people.growerA,
    hiveSetup,
    lot,
    yard,
    destinationYard: await createYard(t.db, people.operationId, 'Destination'),
    truck: await freshTarget(t.db, { operationId: people.operationId } as World, 'trucks'),
  };
  clients.anonymous = await anonymousClient(t.app);
  clients.owner = await signedInClient(t.app, people.owner.email, testPassword);
  clients.planner = await signedInClient(t.app, people.planner.email, testPassword);
  clients.crew = await signedInClient(t.app, people.crew.email, testPassword);
  clients.growerA = await signedInClient(t.app, people.growerUserA.email, testPassword);
  clients.growerB = await signedInClient(t.app, people.growerUserB.email, testPassword);
  clients.otherOwner = await signedInClient(t.app, otherOwner.email, testPassword);
  clients.deactivated = await signedInClient(t.app, deactivated.email, testPassword);
  // Deactivated behind the app's back: the cookie is still live, the account is not.
  await t.db.query(`UPDATE users SET active = false WHERE id = $1`, [deactivated.id]);
}, 60_000);
afterAll(() => t.close());

describe('authorization matrix', () => {
  it('when the app lists its routes then every one is in the matrix, and every matrix row is a route', () => {
    const routes: string[] = t.app.locals.apiRoutes;
    expect(routes.filter((r) => !(r in matrix))).toEqual([]);
    expect(Object.keys(matrix).filter((r) => !routes.includes(r))).toEqual([]);
  });

  for (const [route, row] of Object.entries(matrix)) {
    it(`${route}: each caller gets the expected status; denied writes change nothing`, async () => {
      const [method, path] = route.split(' ');
      const [, , resource, ...rest] = path.split('/');
      const hasId = rest[0] === ':id';
      const tail = path.slice(`/api/${resource}${hasId ? '/:id' : ''}`.length);
      // Denied callers first, so allowed writes do not archive the target under them.
      const order = [...actors].sort(
        (a, b) => Number(row[actors.indexOf(a)] < 300) - Number(row[actors.indexOf(b)] < 300),
      );
      for (const actor of order) {
        const expected = row[actors.indexOf(actor)];
        const id = hasId ? await freshTarget(t.db, world, resource, method) : null;
        const url = path.replace(':id', id ?? '');
        const body =
          method === 'GET' || method === 'DELETE'
            ? undefined
            : await bodyFor(t.db, world, method, resource, tail, id);
        const before = method === 'GET' ? '' : await snapshot(t.db, world.operationId);
        const client = clients[actor];
        const response =
          method === 'GET'
            ? await client.get(url)
            : method === 'DELETE'
              ? await client.delete(url)
              : await client[method.toLowerCase() as 'post' | 'patch' | 'put'](url, body);
        expect({
          actor,
          status: response.status,
          body: response.status === expected ? null : response.body,
        }).toEqual({ actor, status: expected, body: null });
        if (expected >= 400) {
          expect(response.body.error?.code, `${actor} gets the error envelope`).toBeTruthy();
          if (method !== 'GET')
            expect(
              await snapshot(t.db, world.operationId),
              `${actor}'s denied ${route} changed nothing`,
            ).toBe(before);
        }
        if (route === 'DELETE /api/session' && actor !== 'anonymous' && actor !== 'deactivated') {
          // Signing out really signed them out.
          const again = await client.get('/api/yards');
          expect(again.status).toBe(401);
        }
      }
    });
  }
});
