import { randomUUID } from 'node:crypto';
import { mkdir, rm, writeFile } from 'node:fs/promises';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import type { Env } from '../../server/config/env';
import {
  buyColonies,
  createCrew,
  createGrower,
  createHiveSetup,
  createLot,
  createUser,
  createYard,
} from './factories';

/**
 * Targets and valid bodies for every API route, shared by the authorization matrix and the
 * fuzzer: each route gets a fresh record of its resource and a body that a permitted caller
 * would send, so a refusal can only come from the check under test.
 */

/** Files written for document routes, removed by `removeStoredDocuments`. */
const storedDocuments: string[] = [];
let documentsDir = '.data/documents';

/** Deletes the document files the fixtures wrote. */
export async function removeStoredDocuments() {
  await Promise.all(storedDocuments.map((file) => rm(file, { force: true })));
}

/** A 0.01° square block near Fresno with one drop inside it, for boundary and drop routes. */
const matrixBlock = {
  type: 'Polygon',
  coordinates: [
    [
      [-120.3, 36.6],
      [-120.29, 36.6],
      [-120.29, 36.61],
      [-120.3, 36.61],
      [-120.3, 36.6],
    ],
  ],
};
const matrixDrops = {
  type: 'FeatureCollection',
  features: [
    {
      type: 'Feature',
      properties: { drop: 1, pallets: 4, colonies: 16 },
      geometry: { type: 'Point', coordinates: [-120.295, 36.605] },
    },
  ],
};

export interface World {
  operationId: string;
  growerA: string;
  hiveSetup: string;
  lot: string;
  yard: string;
  destinationYard: string;
  truck: string;
}

/** A fresh record of the route's resource (so each allowed write has its own target). */
export async function freshTarget(
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
        `INSERT INTO sites (operation_id, grower_id, name, kind, crop, latitude, longitude, boundary, drops)
         VALUES ($1, $2, 'Block', 'orchard', 'almond', 36.605, -120.295, $3, $4) RETURNING id`,
        [w.operationId, w.growerA, JSON.stringify(matrixBlock), JSON.stringify(matrixDrops)],
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
    case 'proposals': {
      const contract = await freshTarget(db, w, 'contracts');
      await db.query(`UPDATE contracts SET status = 'offered' WHERE id = $1`, [contract]);
      return one(
        `INSERT INTO proposals (operation_id, contract_id, delivery_start_on, delivery_end_on, colonies, expires_at)
         VALUES ($1, $2, '2027-02-05', '2027-02-10', 100, now() + interval '1 day') RETURNING id`,
        [w.operationId, contract],
      );
    }
    case 'notifications':
      return one(
        `INSERT INTO notifications (operation_id, user_id, kind, title)
         SELECT operation_id, id, 'proposal-confirmed', 'Matrix' FROM users
          WHERE operation_id = $1 AND role = 'owner' LIMIT 1 RETURNING id`,
        [w.operationId],
      );
    case 'spray-notices':
      return one(
        `INSERT INTO spray_notices (operation_id, grower_id, site_id, starts_at, ends_at, product)
         VALUES ($1, $2, $3, '2027-02-20T13:00Z', '2027-02-20T16:00Z', 'Matrix product') RETURNING id`,
        [w.operationId, w.growerA, await freshTarget(db, w, 'sites')],
      );
    case 'invoices': {
      // A draft deposit invoice of grower A, on a contract of its own.
      const contract = await freshTarget(db, w, 'contracts');
      return one(
        `INSERT INTO invoices (operation_id, contract_id, grower_id, number, kind, status, lines, amount_cents)
         VALUES ($1, $2, $3, (SELECT COALESCE(MAX(number), 0) + 1 FROM invoices WHERE operation_id = $1),
                 'deposit', 'draft', '[]', 100000) RETURNING id`,
        [w.operationId, contract, w.growerA],
      );
    }
    case 'documents': {
      // A contract PDF shared with grower A, with its file in the store.
      const storedName = `${randomUUID()}.pdf`;
      await mkdir(documentsDir, { recursive: true });
      await writeFile(path.join(documentsDir, storedName), '%PDF-1.7 matrix');
      storedDocuments.push(path.join(documentsDir, storedName));
      return one(
        `INSERT INTO documents (operation_id, kind, original_name, stored_name, content_type, size_bytes, attached_kind, attached_id, shared_with_grower)
         VALUES ($1, 'contract', 'matrix.pdf', $2, 'application/pdf', 15, 'contract', $3, true) RETURNING id`,
        [w.operationId, storedName, await freshTarget(db, w, 'contracts')],
      );
    }
  }
  throw new Error(`no target for ${resource}`);
}

/** Query strings for GET routes that need one. */
export const routeQueries: Record<string, string> = {
  'GET /api/moves/availability': '?nightOf=2027-01-28',
  'GET /api/season': '?from=2027-01-01&to=2027-03-01',
};

/** Fills `:loadId` with a load of the (then planned) move, so crew may record on it. */
export async function withLoad(db: DataSource, w: World, url: string, moveId: string | null) {
  if (!url.includes(':loadId') || !moveId) return url;
  await db.query(`UPDATE moves SET status = 'planned' WHERE id = $1`, [moveId]);
  const [load] = await db.query(
    `INSERT INTO move_loads (operation_id, move_id, truck_id) VALUES ($1, $2, $3) RETURNING id`,
    [w.operationId, moveId, w.truck],
  );
  return url.replace(':loadId', load.id);
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
export async function bodyFor(
  db: DataSource,
  w: World,
  method: string,
  resource: string,
  tail: string,
  id: string | null,
): Promise<object> {
  const version = async () => {
    const table =
      {
        'hive-setups': 'hive_setups',
        'colony-lots': 'colony_lots',
        'spray-notices': 'spray_notices',
      }[resource] ?? resource;
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
  if (tail === '/boundary')
    return { format: 'geojson', text: JSON.stringify(matrixBlock), version: await version() };
  if (tail === '/drops')
    return { version: await version(), drop: 1, latitude: 36.604, longitude: -120.296 };
  if (resource === 'moves' && tail === '/sync')
    return {
      changes: [
        {
          idempotencyKey: `matrix-${Math.random().toString(36).slice(2)}`,
          kind: 'note',
          moveId: await freshTarget(db, w, 'moves'),
          payload: { text: 'matrix' },
        },
      ],
    };
  if (tail === '/loads/:loadId') return { version: 1, palletsLoaded: 3 };
  if (resource === 'calendar-feeds') return {};
  if (tail === '/archive') return { version: await version() };
  if (tail === '/proposals')
    return { deliveryStartOn: '2027-02-05', deliveryEndOn: '2027-02-10', colonies: 90 };
  if (tail === '/confirm' || tail === '/decline' || tail === '/read') return {};
  if (tail === '/counter') return { deliveryStartOn: '2027-02-08', deliveryEndOn: '2027-02-12' };
  if (tail === '/acknowledge') return { version: await version(), action: 'move' };
  if (tail === '/share') return { version: await version(), sharedWithGrower: false };
  if (resource === 'spray-notices')
    return {
      siteId: await freshTarget(db, w, 'sites'),
      startsAt: '2027-02-20T05:00:00-08:00',
      endsAt: '2027-02-20T08:00:00-08:00',
      product: 'Matrix product',
    };
  if (tail === '/status') return { version: await version(), status: 'planned' };
  if (tail === '/issue' || tail === '/void') return { version: await version() };
  if (tail === '/checkout' || tail === '/webhook') return {};
  if (resource === 'invoices') {
    const contractId = await freshTarget(db, w, 'contracts');
    await db.query(`UPDATE contracts SET status = 'agreed', deposit_cents = 50000 WHERE id = $1`, [
      contractId,
    ]);
    return { contractId, kind: 'deposit' };
  }
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
export async function snapshot(db: DataSource, operationId: string) {
  const tables = [
    'weight_samples',
    'strength_samples',
    'proposals',
    'proposal_tokens',
    'notifications',
    'spray_notices',
    'documents',
    'sent_emails',
    'invoices',
    'payments',
    'checkout_sessions',
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

/** An operation with people of every role, a lot of 400 colonies in a yard, a second yard and a truck. */
export async function createWorld(db: DataSource, env: Env) {
  documentsDir = env.DOCUMENTS_DIR;
  const people = await createCrew(db);
  const hiveSetup = await createHiveSetup(db, people.operationId);
  const lot = await createLot(db, people.operationId, hiveSetup);
  const yard = await createYard(db, people.operationId, 'Origin');
  await buyColonies(db, people.operationId, lot, yard, 400);
  const world: World = {
    operationId: people.operationId,
    growerA: people.growerA,
    hiveSetup,
    lot,
    yard,
    destinationYard: await createYard(db, people.operationId, 'Destination'),
    truck: await freshTarget(db, { operationId: people.operationId } as World, 'trucks'),
  };
  return { world, people };
}

/** Splits "METHOD /api/resource/:id/tail" into its parts. */
export function routeParts(route: string) {
  const [method, path] = route.split(' ');
  const [, , resource, ...rest] = path.split('/');
  const hasId = rest[0] === ':id';
  const tail = path.slice(`/api/${resource}${hasId ? '/:id' : ''}`.length);
  return { method, path, resource, hasId, tail };
}
