import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { area, centroid } from '@turf/turf';
import type { Polygon } from 'geojson';
import type { DataSource, EntityManager } from 'typeorm';
import { hashPassword } from '../modules/session/passwords';
import { contractStatuses } from '../../shared/schemas/contracts';
import { boxSizes } from '../../shared/schemas/hive-setups';
import { ledgerKinds, placeKinds } from '../../shared/schemas/ledger';
import { moveStatuses } from '../../shared/schemas/moves';
import { queenStatuses } from '../../shared/schemas/colony-lots';
import { cropKeys, siteKinds } from '../../shared/schemas/sites';
import { roles, units } from '../../shared/schemas/users';

/** Where the invented demo scenario lives (one JSON file per kind of record). */
export const demoFixturesDir = new URL('../../fixtures/demo/', import.meta.url);

// Fixture shapes. Records name each other by `key`; the seed turns keys into stable UUIDs.
type Key = string;
interface PlaceRef {
  kind: string;
  key: Key;
}
interface Owned {
  key: Key;
  operation: Key;
}

export interface DemoFixtures {
  operationsAndUsers: {
    password: string;
    operations: Array<{ key: Key; name: string }>;
    users: Array<
      Owned & { email: string; name: string; role: string; grower?: Key; units: string }
    >;
  };
  growers: Array<
    Owned & {
      name: string;
      billingAddress: string;
      internalNotes: string;
      contacts: Array<{ name: string; email: string | null; phone: string | null; title: string }>;
    }
  >;
  yards: Array<
    Owned & {
      name: string;
      latitude: number;
      longitude: number;
      capacity: number;
      accessNotes: string;
      notes: string;
      lastVisitOn: string | null;
    }
  >;
  sites: Array<
    Owned & {
      grower: Key | null;
      name: string;
      kind: string;
      crop: string;
      bloomStartOn: string | null;
      bloomEndOn: string | null;
      accessNotes: string;
      notes: string;
      boundary: Polygon;
    }
  >;
  hiveSetupsAndLots: {
    hiveSetups: Array<Owned & { name: string; boxes: Array<{ size: string; honeyFill: number }> }>;
    colonyLots: Array<
      Owned & {
        name: string;
        hiveSetup: Key;
        coloniesPerPallet: number;
        queenStatus: string;
        meanFrames: number | null;
        notes: string;
      }
    >;
  };
  fleet: Array<
    Owned & {
      name: string;
      payloadKg: number;
      palletSpots: number;
      tiers: number;
      tareKg: number;
      legalGrossKg: number;
      notes: string;
    }
  >;
  contracts: Array<
    Owned & {
      grower: Key;
      sites: Key[];
      crop: string;
      season: number;
      status: string;
      coloniesOrdered: number;
      minFrames: number;
      averageFrames: number | null;
      feePerColonyCents: number;
      depositCents: number;
      frameAdjustmentCents: number;
      deliveryStartOn: string;
      deliveryEndOn: string;
      removalOn: string | null;
      sprayNoticeHours: number;
      terms: string;
      internalNotes: string;
      events: Array<{
        kind: string;
        occurredAt: string;
        actor?: Key;
        detail: Record<string, unknown>;
      }>;
    }
  >;
  moves: Array<
    Owned & {
      name: string;
      nightOf: string;
      status: string;
      destinationKind: string;
      destinations: Key[];
      contract: Key | null;
      drivers: number;
      loadingMinutes: number;
      averageSpeedKmh: number;
      notes: string;
      origins: Array<{ yard: Key; lot: Key; colonies: number; pickupOrder: number }>;
      loads: Array<{
        truck: Key;
        driverNames: string[];
        palletsPlanned: number;
        coloniesPlanned: number;
        palletsLoaded?: number;
        coloniesPlaced?: number;
        coloniesLost?: number;
        preRollCheck?: Record<string, unknown>;
        notes?: string;
      }>;
    }
  >;
  ledger: Array<{
    operation: Key;
    lot: Key;
    kind: string;
    occurredOn: string;
    colonies: number;
    from?: PlaceRef;
    to?: PlaceRef;
    reason: string;
    move?: Key;
    recordedBy?: Key;
  }>;
  samples: {
    weightSamples: Array<{
      operation: Key;
      yard: Key;
      lot: Key;
      sampledOn: string;
      weightsKg: number[];
      notes: string;
      recordedBy?: Key;
    }>;
    strengthSamples: Array<{
      operation: Key;
      place: PlaceRef;
      lot: Key;
      sampledOn: string;
      frames: number[];
      notes: string;
      recordedBy?: Key;
    }>;
  };
}

const readFixture = <T>(file: string): T =>
  JSON.parse(readFileSync(new URL(file, demoFixturesDir), 'utf8')) as T;

/** Reads the demo scenario from fixtures/demo. */
export function loadDemoFixtures(): DemoFixtures {
  return {
    operationsAndUsers: readFixture('operations-and-users.json'),
    growers: readFixture('growers.json'),
    yards: readFixture('yards.json'),
    sites: readFixture('sites.json'),
    hiveSetupsAndLots: readFixture('hive-setups-and-lots.json'),
    fleet: readFixture('fleet.json'),
    contracts: readFixture('contracts.json'),
    moves: readFixture('moves.json'),
    ledger: readFixture('ledger.json'),
    samples: readFixture('samples.json'),
  };
}

/** A stable UUID (version 5 layout, SHA-1 of the key) so demo links survive a reseed. */
export function demoId(key: Key): string {
  const bytes = createHash('sha1').update(`duskhaul-demo/${key}`).digest().subarray(0, 16);
  bytes[6] = (bytes[6] & 0x0f) | 0x50;
  bytes[8] = (bytes[8] & 0x3f) | 0x80;
  const hex = bytes.toString('hex');
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

/** Throws unless `value` is one of `allowed`, naming where the bad value sits. */
function oneOf<T extends string>(value: string, allowed: readonly T[], where: string): T {
  if (!(allowed as readonly string[]).includes(value)) {
    throw new Error(`Demo fixture ${where}: "${value}" is not one of ${allowed.join(', ')}.`);
  }
  return value as T;
}

/**
 * Keys of the records seeded so far, with their operation: a reference to a missing key, or to
 * another operation's record, is a fixture error and stops the seed.
 */
class KeyRegistry {
  private readonly records = new Map<Key, { kind: string; operation: Key }>();

  add(kind: string, key: Key, operation: Key): string {
    if (this.records.has(key)) throw new Error(`Demo fixture: key "${key}" is used twice.`);
    this.records.set(key, { kind, operation });
    return demoId(key);
  }

  id(kind: string, key: Key, operation: Key): string {
    const record = this.records.get(key);
    if (!record || record.kind !== kind) {
      throw new Error(`Demo fixture: no ${kind} with key "${key}".`);
    }
    if (record.operation !== operation) {
      throw new Error(
        `Demo fixture: ${kind} "${key}" belongs to another operation than ${operation}.`,
      );
    }
    return demoId(key);
  }

  optionalId(kind: string, key: Key | null | undefined, operation: Key): string | null {
    return key ? this.id(kind, key, operation) : null;
  }
}

/** Inserts one row; table and column names come from this file, every value is a parameter. */
async function insert(tx: EntityManager, table: string, row: Record<string, unknown>) {
  const columns = Object.keys(row);
  const placeholders = columns.map((_, i) => `$${i + 1}`).join(', ');
  await tx.query(
    `INSERT INTO ${table} (${columns.join(', ')}) VALUES (${placeholders})`,
    Object.values(row),
  );
}

const json = (value: unknown) => JSON.stringify(value);

/**
 * Seeds the invented demo scenario (fixtures/demo) in one transaction, only when the database
 * has no operations yet. Every demo user's password is the fixture's; it is hashed once.
 */
export async function seedDemo(db: DataSource): Promise<{ seeded: boolean }> {
  if (await hasOperations(db)) return { seeded: false };
  const fixtures = loadDemoFixtures();
  const passwordHash = await hashPassword(fixtures.operationsAndUsers.password);

  return db.transaction(async (tx) => {
    // Two seeders starting together: the second waits here, then finds the data.
    await tx.query(`SELECT pg_advisory_xact_lock(hashtext('duskhaul:seed-demo'))`);
    if (await hasOperations(tx)) return { seeded: false };
    await insertScenario(tx, fixtures, passwordHash);
    return { seeded: true };
  });
}

async function hasOperations(db: DataSource | EntityManager): Promise<boolean> {
  const [row]: Array<{ any: boolean }> = await db.query(
    'SELECT EXISTS (SELECT 1 FROM operations) AS any',
  );
  return row.any;
}

async function insertScenario(tx: EntityManager, f: DemoFixtures, passwordHash: string) {
  const keys = new KeyRegistry();
  const op = (key: Key) => keys.id('operation', key, key);

  for (const operation of f.operationsAndUsers.operations) {
    const id = keys.add('operation', operation.key, operation.key);
    await insert(tx, 'operations', { id, name: operation.name });
  }

  for (const grower of f.growers) {
    const id = keys.add('grower', grower.key, grower.operation);
    await insert(tx, 'growers', {
      id,
      operation_id: op(grower.operation),
      name: grower.name,
      billing_address: grower.billingAddress,
      internal_notes: grower.internalNotes,
    });
    for (const [position, contact] of grower.contacts.entries()) {
      await insert(tx, 'grower_contacts', {
        id: demoId(`${grower.key}/contact/${position}`),
        operation_id: op(grower.operation),
        grower_id: id,
        name: contact.name,
        email: contact.email,
        phone: contact.phone,
        title: contact.title,
        position,
      });
    }
  }

  for (const user of f.operationsAndUsers.users) {
    await insert(tx, 'users', {
      id: keys.add('user', user.key, user.operation),
      operation_id: op(user.operation),
      email: user.email,
      name: user.name,
      role: oneOf(user.role, roles, `user ${user.key} role`),
      grower_id: keys.optionalId('grower', user.grower, user.operation),
      password_hash: passwordHash,
      units: oneOf(user.units, units, `user ${user.key} units`),
    });
  }

  for (const yard of f.yards) {
    await insert(tx, 'yards', {
      id: keys.add('yard', yard.key, yard.operation),
      operation_id: op(yard.operation),
      name: yard.name,
      latitude: yard.latitude,
      longitude: yard.longitude,
      capacity: yard.capacity,
      access_notes: yard.accessNotes,
      notes: yard.notes,
      last_visit_on: yard.lastVisitOn,
    });
  }

  for (const site of f.sites) {
    // The site's point is the boundary's centroid; its area comes from the boundary (m² → ha).
    const [longitude, latitude] = centroid(site.boundary).geometry.coordinates;
    await insert(tx, 'sites', {
      id: keys.add('site', site.key, site.operation),
      operation_id: op(site.operation),
      grower_id: keys.optionalId('grower', site.grower, site.operation),
      name: site.name,
      kind: oneOf(site.kind, siteKinds, `site ${site.key} kind`),
      crop: oneOf(site.crop, cropKeys, `site ${site.key} crop`),
      boundary: json(site.boundary),
      latitude,
      longitude,
      area_ha: area(site.boundary) / 10_000,
      bloom_start_on: site.bloomStartOn,
      bloom_end_on: site.bloomEndOn,
      access_notes: site.accessNotes,
      notes: site.notes,
    });
  }

  for (const setup of f.hiveSetupsAndLots.hiveSetups) {
    for (const box of setup.boxes) oneOf(box.size, boxSizes, `hive setup ${setup.key} box size`);
    await insert(tx, 'hive_setups', {
      id: keys.add('hive-setup', setup.key, setup.operation),
      operation_id: op(setup.operation),
      name: setup.name,
      boxes: json(setup.boxes),
    });
  }

  for (const lot of f.hiveSetupsAndLots.colonyLots) {
    await insert(tx, 'colony_lots', {
      id: keys.add('lot', lot.key, lot.operation),
      operation_id: op(lot.operation),
      name: lot.name,
      hive_setup_id: keys.id('hive-setup', lot.hiveSetup, lot.operation),
      colonies_per_pallet: lot.coloniesPerPallet,
      queen_status: oneOf(lot.queenStatus, queenStatuses, `lot ${lot.key} queen status`),
      mean_frames: lot.meanFrames,
      notes: lot.notes,
    });
  }

  for (const truck of f.fleet) {
    await insert(tx, 'trucks', {
      id: keys.add('truck', truck.key, truck.operation),
      operation_id: op(truck.operation),
      name: truck.name,
      payload_kg: truck.payloadKg,
      pallet_spots: truck.palletSpots,
      tiers: truck.tiers,
      tare_kg: truck.tareKg,
      legal_gross_kg: truck.legalGrossKg,
      notes: truck.notes,
    });
  }

  await insertContracts(tx, f, keys);
  await insertMoves(tx, f, keys);

  for (const [index, entry] of f.ledger.entries()) {
    const where = `ledger entry ${index}`;
    const place = (ref: PlaceRef | undefined) =>
      ref
        ? {
            kind: oneOf(ref.kind, placeKinds, `${where} place kind`),
            id: keys.id(ref.kind, ref.key, entry.operation),
          }
        : null;
    const from = place(entry.from);
    const to = place(entry.to);
    await insert(tx, 'ledger_entries', {
      id: demoId(`ledger/${entry.operation}/${index}`),
      operation_id: op(entry.operation),
      lot_id: keys.id('lot', entry.lot, entry.operation),
      kind: oneOf(entry.kind, ledgerKinds, `${where} kind`),
      occurred_on: entry.occurredOn,
      colonies: entry.colonies,
      from_kind: from?.kind ?? null,
      from_id: from?.id ?? null,
      to_kind: to?.kind ?? null,
      to_id: to?.id ?? null,
      reason: entry.reason,
      move_id: keys.optionalId('move', entry.move, entry.operation),
      recorded_by: keys.optionalId('user', entry.recordedBy, entry.operation),
    });
  }

  await insertSamples(tx, f, keys);
}

async function insertContracts(tx: EntityManager, f: DemoFixtures, keys: KeyRegistry) {
  for (const contract of f.contracts) {
    const operationId = keys.id('operation', contract.operation, contract.operation);
    const id = keys.add('contract', contract.key, contract.operation);
    await insert(tx, 'contracts', {
      id,
      operation_id: operationId,
      grower_id: keys.id('grower', contract.grower, contract.operation),
      site_ids: contract.sites.map((site) => keys.id('site', site, contract.operation)),
      crop: oneOf(contract.crop, cropKeys, `contract ${contract.key} crop`),
      season: contract.season,
      status: oneOf(contract.status, contractStatuses, `contract ${contract.key} status`),
      colonies_ordered: contract.coloniesOrdered,
      min_frames: contract.minFrames,
      average_frames: contract.averageFrames,
      fee_per_colony_cents: contract.feePerColonyCents,
      deposit_cents: contract.depositCents,
      frame_adjustment_cents: contract.frameAdjustmentCents,
      delivery_start_on: contract.deliveryStartOn,
      delivery_end_on: contract.deliveryEndOn,
      removal_on: contract.removalOn,
      spray_notice_hours: contract.sprayNoticeHours,
      terms: contract.terms,
      internal_notes: contract.internalNotes,
    });
    for (const [index, event] of contract.events.entries()) {
      await insert(tx, 'contract_events', {
        id: demoId(`${contract.key}/event/${index}`),
        operation_id: operationId,
        contract_id: id,
        kind: event.kind,
        detail: json(event.detail),
        actor_user_id: keys.optionalId('user', event.actor, contract.operation),
        occurred_at: event.occurredAt,
      });
    }
  }
}

async function insertMoves(tx: EntityManager, f: DemoFixtures, keys: KeyRegistry) {
  for (const move of f.moves) {
    const operationId = keys.id('operation', move.operation, move.operation);
    const id = keys.add('move', move.key, move.operation);
    const destinationKind = oneOf(move.destinationKind, placeKinds, `move ${move.key} destination`);
    await insert(tx, 'moves', {
      id,
      operation_id: operationId,
      name: move.name,
      night_of: move.nightOf,
      status: oneOf(move.status, moveStatuses, `move ${move.key} status`),
      destination_kind: destinationKind,
      destination_ids: move.destinations.map((key) =>
        keys.id(destinationKind, key, move.operation),
      ),
      contract_id: keys.optionalId('contract', move.contract, move.operation),
      drivers: move.drivers,
      loading_minutes: move.loadingMinutes,
      average_speed_kmh: move.averageSpeedKmh,
      notes: move.notes,
    });
    for (const [index, origin] of move.origins.entries()) {
      await insert(tx, 'move_origins', {
        id: demoId(`${move.key}/origin/${index}`),
        operation_id: operationId,
        move_id: id,
        yard_id: keys.id('yard', origin.yard, move.operation),
        lot_id: keys.id('lot', origin.lot, move.operation),
        colonies: origin.colonies,
        pickup_order: origin.pickupOrder,
      });
    }
    for (const [index, load] of move.loads.entries()) {
      await insert(tx, 'move_loads', {
        id: demoId(`${move.key}/load/${index}`),
        operation_id: operationId,
        move_id: id,
        truck_id: keys.id('truck', load.truck, move.operation),
        driver_names: load.driverNames,
        pallets_planned: load.palletsPlanned,
        colonies_planned: load.coloniesPlanned,
        pallets_loaded: load.palletsLoaded ?? null,
        colonies_placed: load.coloniesPlaced ?? null,
        colonies_lost: load.coloniesLost ?? null,
        pre_roll_check: load.preRollCheck ? json(load.preRollCheck) : null,
        notes: load.notes ?? '',
      });
    }
  }
}

async function insertSamples(tx: EntityManager, f: DemoFixtures, keys: KeyRegistry) {
  for (const [index, sample] of f.samples.weightSamples.entries()) {
    await insert(tx, 'weight_samples', {
      id: demoId(`weight-sample/${sample.operation}/${index}`),
      operation_id: keys.id('operation', sample.operation, sample.operation),
      yard_id: keys.id('yard', sample.yard, sample.operation),
      lot_id: keys.id('lot', sample.lot, sample.operation),
      sampled_on: sample.sampledOn,
      weights_kg: sample.weightsKg,
      notes: sample.notes,
      recorded_by: keys.optionalId('user', sample.recordedBy, sample.operation),
    });
  }
  for (const [index, sample] of f.samples.strengthSamples.entries()) {
    const placeKind = oneOf(sample.place.kind, placeKinds, `strength sample ${index} place`);
    await insert(tx, 'strength_samples', {
      id: demoId(`strength-sample/${sample.operation}/${index}`),
      operation_id: keys.id('operation', sample.operation, sample.operation),
      place_kind: placeKind,
      place_id: keys.id(placeKind, sample.place.key, sample.operation),
      lot_id: keys.id('lot', sample.lot, sample.operation),
      sampled_on: sample.sampledOn,
      frames: sample.frames,
      notes: sample.notes,
      recorded_by: keys.optionalId('user', sample.recordedBy, sample.operation),
    });
  }
}
