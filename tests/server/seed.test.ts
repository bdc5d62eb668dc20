import 'reflect-metadata';
import { randomBytes } from 'node:crypto';
import { area, centroid, kinks } from '@turf/turf';
import type { Polygon } from 'geojson';
import pg from 'pg';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createDataSource } from '../../server/db/data-source';
import { loadDemoFixtures, seedDemo } from '../../server/db/seed';
import { verifyPassword } from '../../server/modules/session/passwords';
import { contractCreateRequest } from '../../shared/schemas/contracts';
import { growerCreateRequest } from '../../shared/schemas/growers';
import { hiveSetupCreateRequest } from '../../shared/schemas/hive-setups';
import { ledgerEntryCreateRequest } from '../../shared/schemas/ledger';
import { siteCreateRequest } from '../../shared/schemas/sites';
import { truckCreateRequest } from '../../shared/schemas/trucks';
import { yardCreateRequest } from '../../shared/schemas/yards';

const acreM2 = 4046.8564224; // 1 acre = 0.40468564224 ha exactly (international acre)
const anyId = '00000000-0000-4000-8000-000000000000';
const otherId = '11111111-1111-4111-8111-111111111111';

// The shared test database is used by other files at the same time: seed a throwaway one.
const serverUrl = process.env.DATABASE_URL;
if (!serverUrl) throw new Error('DATABASE_URL must point at a PostgreSQL server for this test.');
const databaseName = `seed_test_${randomBytes(6).toString('hex')}`;
const seedUrl = (() => {
  const url = new URL(serverUrl);
  url.pathname = `/${databaseName}`;
  return url.toString();
})();

async function onServer(sql: string) {
  const client = new pg.Client({ connectionString: serverUrl });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}

let db: DataSource;
let firstRun: { seeded: boolean };
let secondRun: { seeded: boolean };

beforeAll(async () => {
  // A name cannot be a query parameter; this one is built above from hex digits only.
  await onServer(`CREATE DATABASE ${databaseName}`);
  db = createDataSource({ url: seedUrl, poolSize: 2 });
  await db.initialize();
  await db.runMigrations({ transaction: 'each' });
  firstRun = await seedDemo(db);
  secondRun = await seedDemo(db);
});

afterAll(async () => {
  await db?.destroy();
  await onServer(`DROP DATABASE IF EXISTS ${databaseName} WITH (FORCE)`);
});

const operationId = async (name: string): Promise<string> => {
  const [row]: Array<{ id: string }> = await db.query('SELECT id FROM operations WHERE name = $1', [
    name,
  ]);
  return row.id;
};

/** Colonies per place and lot after every ledger entry (all dates). */
async function countsByPlaceAndLot(): Promise<
  Array<{ operation_id: string; place_id: string; lot_id: string; colonies: number }>
> {
  return db.query(
    `SELECT operation_id, place_id, lot_id, SUM(delta)::int AS colonies FROM (
       SELECT operation_id, to_id AS place_id, lot_id, colonies AS delta FROM ledger_entries WHERE to_id IS NOT NULL
       UNION ALL
       SELECT operation_id, from_id, lot_id, -colonies FROM ledger_entries WHERE from_id IS NOT NULL
     ) f GROUP BY operation_id, place_id, lot_id`,
  );
}

describe('seedDemo', () => {
  it('when run twice on an empty database then it seeds once', async () => {
    expect(firstRun).toEqual({ seeded: true });
    expect(secondRun).toEqual({ seeded: false });
    const [{ count }] = await db.query('SELECT count(*)::int AS count FROM operations');
    expect(count).toBe(2);
  });

  it('when seeded then every demo user exists with the demo password', async () => {
    const expected = {
      'owner@demo.test': 'owner',
      'planner@demo.test': 'planner',
      'crew@demo.test': 'crew',
      'grower@demo.test': 'grower',
      'grower2@demo.test': 'grower',
      'owner@second.test': 'owner',
    };
    const users: Array<{ email: string; role: string; password_hash: string }> = await db.query(
      'SELECT email, role, password_hash FROM users WHERE email = ANY($1)',
      [Object.keys(expected)],
    );
    expect(Object.fromEntries(users.map((u) => [u.email, u.role]))).toEqual(expected);
    for (const user of users) {
      expect(await verifyPassword(user.password_hash, 'duskhaul-demo')).toBe(true);
    }
    expect(await verifyPassword(users[0].password_hash, 'not-the-password')).toBe(false);
  });

  it('when the ledger is summed then each yard holds between 0 and its capacity', async () => {
    const yards: Array<{ name: string; capacity: number; colonies: number }> = await db.query(
      `SELECT y.name, y.capacity,
              COALESCE((SELECT SUM(colonies) FROM ledger_entries e WHERE e.to_kind = 'yard' AND e.to_id = y.id), 0)
            - COALESCE((SELECT SUM(colonies) FROM ledger_entries e WHERE e.from_kind = 'yard' AND e.from_id = y.id), 0)
              AS colonies
         FROM yards y`,
    );
    expect(yards.length).toBe(9);
    for (const yard of yards) {
      expect(Number(yard.colonies), yard.name).toBeGreaterThanOrEqual(0);
      expect(Number(yard.colonies), yard.name).toBeLessThanOrEqual(yard.capacity);
    }
  });

  it('when the first operation is counted then it holds about 3,000 colonies', async () => {
    const mesquite = await operationId('Mesquite Flats Apiaries');
    const total = (await countsByPlaceAndLot())
      .filter((c) => c.operation_id === mesquite)
      .reduce((sum, c) => sum + c.colonies, 0);
    expect(total).toBeGreaterThanOrEqual(2_700);
    expect(total).toBeLessThanOrEqual(3_300);
  });

  it('when the ledger is replayed by date then no lot is ever negative at any place', async () => {
    const entries: Array<{
      lot_id: string;
      from_id: string | null;
      to_id: string | null;
      colonies: number;
    }> = await db.query(
      `SELECT lot_id, from_id, to_id, colonies FROM ledger_entries
        ORDER BY occurred_on, (from_id IS NULL) DESC`, // arrivals of a day before departures
    );
    const balance = new Map<string, number>();
    for (const entry of entries) {
      if (entry.to_id) {
        const key = `${entry.to_id}/${entry.lot_id}`;
        balance.set(key, (balance.get(key) ?? 0) + entry.colonies);
      }
      if (entry.from_id) {
        const key = `${entry.from_id}/${entry.lot_id}`;
        const left = (balance.get(key) ?? 0) - entry.colonies;
        expect(left, key).toBeGreaterThanOrEqual(0);
        balance.set(key, left);
      }
    }
  });

  it('when sites are read then each boundary is simple, 5–500 acres, and gives the point and area', async () => {
    const sites: Array<{
      name: string;
      boundary: Polygon;
      latitude: number;
      longitude: number;
      area_ha: number;
    }> = await db.query('SELECT name, boundary, latitude, longitude, area_ha FROM sites');
    expect(sites.length).toBe(14);
    for (const site of sites) {
      expect(kinks(site.boundary).features, site.name).toHaveLength(0);
      const ring = site.boundary.coordinates[0];
      expect(ring[0], site.name).toEqual(ring[ring.length - 1]);
      const acres = area(site.boundary) / acreM2;
      expect(acres, site.name).toBeGreaterThanOrEqual(5);
      expect(acres, site.name).toBeLessThanOrEqual(500);
      expect(site.area_ha, site.name).toBeCloseTo(area(site.boundary) / 10_000, 6);
      const [lon, lat] = centroid(site.boundary).geometry.coordinates;
      expect(site.latitude).toBeCloseTo(lat, 9);
      expect(site.longitude).toBeCloseTo(lon, 9);
    }
  });

  it('when moves are not yet run then their origins fit the ledger count of each yard and lot', async () => {
    const promised: Array<{ yard_id: string; lot_id: string; colonies: number }> = await db.query(
      `SELECT o.yard_id, o.lot_id, SUM(o.colonies)::int AS colonies
         FROM move_origins o JOIN moves m ON m.id = o.move_id
        WHERE m.status IN ('draft', 'planned')
        GROUP BY o.yard_id, o.lot_id`,
    );
    expect(promised.length).toBeGreaterThan(0);
    const counts = await countsByPlaceAndLot();
    for (const origin of promised) {
      const here = counts.find((c) => c.place_id === origin.yard_id && c.lot_id === origin.lot_id);
      expect(origin.colonies).toBeLessThanOrEqual(here?.colonies ?? 0);
    }
    const [{ planned }] = await db.query(
      `SELECT count(*)::int AS planned FROM moves WHERE status = 'planned'`,
    );
    expect(planned).toBe(2);
  });

  it('when moves are read then every origin names a lot, a yard and a truck of the same operation', async () => {
    const orphans = await db.query(
      `SELECT o.id FROM move_origins o
         LEFT JOIN colony_lots l ON l.id = o.lot_id AND l.operation_id = o.operation_id
         LEFT JOIN yards y ON y.id = o.yard_id AND y.operation_id = o.operation_id
         JOIN moves m ON m.id = o.move_id AND m.operation_id = o.operation_id
        WHERE l.id IS NULL OR y.id IS NULL`,
    );
    expect(orphans).toEqual([]);
    const foreignTrucks = await db.query(
      `SELECT ml.id FROM move_loads ml JOIN trucks t ON t.id = ml.truck_id
        WHERE t.operation_id <> ml.operation_id`,
    );
    expect(foreignTrucks).toEqual([]);
  });

  it('when a move is closed then its ledger entries match its origins and placed counts', async () => {
    const closed: Array<{ origins: number; ledger: number; placed: number }> = await db.query(
      `SELECT (SELECT SUM(colonies) FROM move_origins o WHERE o.move_id = m.id)::int AS origins,
              (SELECT SUM(colonies) FROM ledger_entries e WHERE e.move_id = m.id AND e.kind = 'move')::int AS ledger,
              (SELECT SUM(colonies_placed) FROM move_loads l WHERE l.move_id = m.id)::int AS placed
         FROM moves m WHERE m.status = 'closed'`,
    );
    expect(closed.length).toBeGreaterThanOrEqual(1);
    for (const move of closed) {
      expect(move.ledger).toBe(move.origins);
      expect(move.placed).toBe(move.origins);
    }
  });

  it('when grower users are read then each is tied to a grower with contracts', async () => {
    const growers: Array<{ email: string; contracts: number }> = await db.query(
      `SELECT u.email, (SELECT count(*) FROM contracts c
                         WHERE c.grower_id = u.grower_id AND c.operation_id = u.operation_id)::int AS contracts
         FROM users u WHERE u.role = 'grower' ORDER BY u.email`,
    );
    expect(growers.map((g) => g.email)).toEqual(['grower2@demo.test', 'grower@demo.test']);
    expect(growers.find((g) => g.email === 'grower@demo.test')?.contracts).toBeGreaterThanOrEqual(
      2,
    );
    expect(growers.find((g) => g.email === 'grower2@demo.test')?.contracts).toBeGreaterThanOrEqual(
      1,
    );
  });

  it('when the two operations are compared then they share no records and refer only to their own', async () => {
    const mesquite = await operationId('Mesquite Flats Apiaries');
    const bluebonnet = await operationId('Bluebonnet Ridge Honey');
    for (const table of ['growers', 'yards', 'sites', 'contracts', 'users']) {
      const [row] = await db.query(
        `SELECT count(*) FILTER (WHERE operation_id = $1)::int AS first,
                count(*) FILTER (WHERE operation_id = $2)::int AS second
           FROM ${table}`,
        [mesquite, bluebonnet],
      );
      expect(row.first, table).toBeGreaterThan(0);
      expect(row.second, table).toBeGreaterThan(0);
    }
    const crossTenant = await db.query(
      `SELECT 'site' AS kind, s.id FROM sites s JOIN growers g ON g.id = s.grower_id WHERE g.operation_id <> s.operation_id
       UNION ALL
       SELECT 'contract', c.id FROM contracts c JOIN growers g ON g.id = c.grower_id WHERE g.operation_id <> c.operation_id
       UNION ALL
       SELECT 'contract-site', c.id FROM contracts c JOIN sites s ON s.id = ANY(c.site_ids) WHERE s.operation_id <> c.operation_id
       UNION ALL
       SELECT 'user', u.id FROM users u JOIN growers g ON g.id = u.grower_id WHERE g.operation_id <> u.operation_id
       UNION ALL
       SELECT 'ledger', e.id FROM ledger_entries e JOIN colony_lots l ON l.id = e.lot_id WHERE l.operation_id <> e.operation_id
       UNION ALL
       SELECT 'ledger-place', e.id FROM ledger_entries e
         LEFT JOIN yards y ON y.id = COALESCE(e.to_id, e.from_id)
         LEFT JOIN sites s ON s.id = COALESCE(e.to_id, e.from_id)
        WHERE COALESCE(y.operation_id, s.operation_id) <> e.operation_id`,
    );
    expect(crossTenant).toEqual([]);
  });

  it('when contracts are read then fees and deposits are in the ranges of the trade', async () => {
    const contracts: Array<{
      crop: string;
      status: string;
      colonies_ordered: number;
      fee_per_colony_cents: number;
      deposit_cents: number;
    }> = await db.query(
      `SELECT crop, status, colonies_ordered, fee_per_colony_cents, deposit_cents FROM contracts
        WHERE season = 2027`,
    );
    const statuses = new Set(contracts.map((c) => c.status));
    for (const status of ['draft', 'offered', 'agreed', 'turned-down', 'withdrawn']) {
      expect(statuses.has(status), status).toBe(true);
    }
    for (const contract of contracts.filter((c) => c.crop === 'almond')) {
      // USDA NASS Cost of Pollination (Dec 2023): almond $188 per colony in 2023.
      expect(contract.fee_per_colony_cents).toBeGreaterThanOrEqual(18_000);
      expect(contract.fee_per_colony_cents).toBeLessThanOrEqual(22_000);
      const share =
        contract.deposit_cents / (contract.colonies_ordered * contract.fee_per_colony_cents);
      expect(share).toBeCloseTo(0.25, 2);
    }
  });
});

describe('demo fixtures', () => {
  const fixtures = loadDemoFixtures();

  it('when checked against the API schemas then every record is valid input', () => {
    for (const yard of fixtures.yards) {
      const { key: _key, operation: _operation, ...fields } = yard;
      expect(yardCreateRequest.safeParse(fields).error, yard.key).toBeUndefined();
    }
    for (const grower of fixtures.growers) {
      const { key: _key, operation: _operation, ...fields } = grower;
      expect(growerCreateRequest.safeParse(fields).error, grower.key).toBeUndefined();
    }
    for (const site of fixtures.sites) {
      const { key: _key, operation: _operation, grower, ...fields } = site;
      const parsed = siteCreateRequest.safeParse({ ...fields, growerId: grower ? anyId : null });
      expect(parsed.error, site.key).toBeUndefined();
    }
    for (const setup of fixtures.hiveSetupsAndLots.hiveSetups) {
      const parsed = hiveSetupCreateRequest.safeParse({ name: setup.name, boxes: setup.boxes });
      expect(parsed.error, setup.key).toBeUndefined();
    }
    for (const truck of fixtures.fleet) {
      const { key: _key, operation: _operation, ...fields } = truck;
      expect(truckCreateRequest.safeParse(fields).error, truck.key).toBeUndefined();
    }
    for (const contract of fixtures.contracts) {
      const {
        key: _key,
        operation: _operation,
        grower: _grower,
        sites,
        events: _events,
        ...fields
      } = contract;
      const parsed = contractCreateRequest.safeParse({
        ...fields,
        growerId: anyId,
        siteIds: sites.map(() => anyId),
      });
      expect(parsed.error, contract.key).toBeUndefined();
    }
    for (const [index, entry] of fixtures.ledger.entries()) {
      const place = (ref: { kind: string } | undefined, id: string) =>
        ref ? { kind: ref.kind, id } : null;
      const parsed = ledgerEntryCreateRequest.safeParse({
        lotId: anyId,
        kind: entry.kind,
        occurredOn: entry.occurredOn,
        colonies: entry.colonies,
        from: place(entry.from, otherId),
        to: place(entry.to, anyId),
        reason: entry.reason,
      });
      expect(parsed.error, `ledger entry ${index}`).toBeUndefined();
    }
  });

  it('when loads are planned then pallets fit each truck and colonies fill the pallets', () => {
    const trucks = new Map(fixtures.fleet.map((t) => [t.key, t]));
    const lots = new Map(fixtures.hiveSetupsAndLots.colonyLots.map((l) => [l.key, l]));
    for (const move of fixtures.moves) {
      for (const load of move.loads) {
        const truck = trucks.get(load.truck);
        expect(truck, load.truck).toBeDefined();
        expect(load.palletsPlanned).toBeLessThanOrEqual(truck!.palletSpots * truck!.tiers);
      }
      if (move.loads.length > 0) {
        const pallets = move.origins.reduce(
          (sum, o) => sum + Math.ceil(o.colonies / lots.get(o.lot)!.coloniesPerPallet),
          0,
        );
        const colonies = move.origins.reduce((sum, o) => sum + o.colonies, 0);
        expect(
          move.loads.reduce((sum, l) => sum + l.palletsPlanned, 0),
          move.key,
        ).toBe(pallets);
        expect(
          move.loads.reduce((sum, l) => sum + l.coloniesPlanned, 0),
          move.key,
        ).toBe(colonies);
      }
    }
  });
});
