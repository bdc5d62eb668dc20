import type { DataSource } from 'typeorm';
import { buyColonies, createCrew, createHiveSetup, createLot } from '../../../support/factories';

/** Inserts a row and returns its id. */
async function insertId(db: DataSource, sql: string, params: unknown[]): Promise<string> {
  return (await db.query(sql, params))[0].id as string;
}

/**
 * A small invented operation for the move tests: two south-Texas yards with their own lots, an
 * almond block in the San Joaquin Valley with a grower contact, two semis, and an offered contract.
 */
export async function createMoveWorld(db: DataSource) {
  const people = await createCrew(db);
  const op = people.operationId;
  const setup = await createHiveSetup(db, op); // two deeps, honey fill 0.5 and 0.2
  const weighedLot = await createLot(db, op, setup);
  const unweighedLot = await createLot(db, op, setup);
  const yard = (name: string, lat: number, lon: number, access: string) =>
    insertId(
      db,
      `INSERT INTO yards (operation_id, name, latitude, longitude, capacity, access_notes) VALUES ($1, $2, $3, $4, 600, $5) RETURNING id`,
      [op, name, lat, lon, access],
    );
  const yardA = await yard(
    'Mesquite Tank',
    27.95,
    -97.85,
    'Gate code 4471; chain on the east gate.',
  );
  const yardB = await yard('Caliche Bend', 28.3, -98.1, 'Cattle guard; gate open.');
  await buyColonies(db, op, weighedLot, yardA, 300, '2026-10-01');
  await buyColonies(db, op, unweighedLot, yardB, 150, '2026-10-01');
  // Ten hives weighed at yard A (invented scale readings, kg).
  await db.query(
    `INSERT INTO weight_samples (operation_id, yard_id, lot_id, sampled_on, weights_kg) VALUES ($1, $2, $3, '2026-12-01', $4)`,
    [op, yardA, weighedLot, [58, 61, 55, 66, 50, 63, 57, 60, 53, 68]],
  );
  const site = await insertId(
    db,
    `INSERT INTO sites (operation_id, grower_id, name, kind, crop, latitude, longitude, access_notes, drops)
     VALUES ($1, $2, 'Block 12 North', 'orchard', 'almond', 36.62, -120.31, 'Enter from the canal road.', $3) RETURNING id`,
    [
      op,
      people.growerA,
      JSON.stringify({
        type: 'FeatureCollection',
        features: [1, 2, 3].map((i) => ({
          type: 'Feature',
          properties: { drop: i },
          geometry: { type: 'Point', coordinates: [-120.31 + i / 1000, 36.62] },
        })),
      }),
    ],
  );
  await db.query(
    `INSERT INTO grower_contacts (operation_id, grower_id, name, phone, title) VALUES ($1, $2, 'Rosalind Quill', '+1 559 555 0142', 'Orchard manager')`,
    [op, people.growerA],
  );
  const truck = (name: string) =>
    insertId(
      db,
      `INSERT INTO trucks (operation_id, name, payload_kg, pallet_spots, tiers, tare_kg, legal_gross_kg) VALUES ($1, $2, 21000, 24, 2, 15000, 36287.39) RETURNING id`,
      [op, name],
    );
  const truck1 = await truck('Semi 1');
  const truck2 = await truck('Semi 2');
  const contract = await insertId(
    db,
    `INSERT INTO contracts (operation_id, grower_id, site_ids, crop, season, status, colonies_ordered, min_frames, fee_per_colony_cents, delivery_start_on, delivery_end_on, removal_on)
     VALUES ($1, $2, ARRAY[$3]::uuid[], 'almond', 2027, 'offered', 400, 6, 19400, '2027-02-01', '2027-02-10', '2027-03-10') RETURNING id`,
    [op, people.growerA, site],
  );
  return {
    ...people,
    setup,
    weighedLot,
    unweighedLot,
    yardA,
    yardB,
    site,
    truck1,
    truck2,
    contract,
  };
}

export type MoveWorld = Awaited<ReturnType<typeof createMoveWorld>>;

/** A create body for a two-truck move from both yards to the almond block. */
export function twoYardMove(w: MoveWorld, overrides: Record<string, unknown> = {}) {
  return {
    name: 'Almond run',
    nightOf: '2027-01-26',
    destinationKind: 'site',
    destinationIds: [w.site],
    contractId: w.contract,
    drivers: 1,
    loadingMinutes: 120,
    averageSpeedKmh: 85,
    origins: [
      { yardId: w.yardA, lotId: w.weighedLot, colonies: 200 },
      { yardId: w.yardB, lotId: w.unweighedLot, colonies: 150 },
    ],
    loads: [
      { truckId: w.truck1, driverNames: ['Test crew'] },
      { truckId: w.truck2, driverNames: ['Ida Fernhollow'] },
    ],
    ...overrides,
  };
}

/** Every key anywhere in a response that names money (crew must never receive one). */
export function moneyKeys(value: unknown): string[] {
  if (Array.isArray(value)) return value.flatMap(moneyKeys);
  if (value && typeof value === 'object')
    return Object.entries(value).flatMap(([key, inner]) => [
      ...(/cents|fee|price|amount|invoice/i.test(key) ? [key] : []),
      ...moneyKeys(inner),
    ]);
  return [];
}
