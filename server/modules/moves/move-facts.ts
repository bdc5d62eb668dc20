import type { DataSource, EntityManager } from 'typeorm';
import { computeHiveWeight, summariseWeightSamples } from '../../../shared/domain/hive-weight';
import type { HiveBox } from '../../../shared/domain/hive-weight';
import { mean } from '../../../shared/domain/statistics';
import type { PlaceKind } from '../../../shared/schemas/ledger';
import { AppError } from '../../errors/app-error';
import { LedgerRepository } from '../ledger/ledger.repository';
import {
  ASSUMED_WEIGHT_SAMPLES,
  ASSUMED_WEIGHT_SD_SHARE,
  DEFAULT_AVERAGE_SPEED_KMH,
  DEFAULT_LOADING_MINUTES,
  DEFAULT_PALLET_TARE_KG,
  type DestinationFact,
  type OriginFact,
  type PlanFacts,
  type TruckFact,
} from './move-plan';
import type { StrengthSource, WeightSource } from '../../../shared/schemas/move-plan';
import { MovesRepository, promisingStatuses } from './moves.repository';

type Db = DataSource | EntityManager;

const ledger = new LedgerRepository();
const promises = new MovesRepository();

/** The inputs of a plan: a move's create body, or a saved move's rows. */
export interface PlanInput {
  nightOf: string;
  destinationKind: PlaceKind;
  destinationIds: string[];
  contractId?: string | null;
  drivers?: 1 | 2;
  loadingMinutes?: number;
  averageSpeedKmh?: number;
  origins: Array<{ yardId: string; lotId: string; colonies: number }>;
  loads?: Array<{ truckId: string; driverNames?: string[] }>;
}

/** Moves whose colonies count towards a contract's order (open or already delivered). */
const deliveringStatuses = [...promisingStatuses, 'placed', 'closed'];

const fail = (field: string, message: string) => AppError.validation([{ field, message }]);

/** Free colonies of each (yard, lot) on a night: what can leave then less other moves' promises. */
export async function freeColoniesOf(
  db: Db,
  operationId: string,
  nightOf: string,
  pairs: Array<{ yardId: string; lotId: string }>,
  exceptMoveId: string | null,
): Promise<Map<string, { there: number; promised: number; free: number }>> {
  const result = new Map<string, { there: number; promised: number; free: number }>();
  for (const { yardId, lotId } of pairs) {
    const key = `${yardId}:${lotId}`;
    if (result.has(key)) continue;
    const there = await ledger.lowestBalanceFrom(
      db as EntityManager,
      operationId,
      lotId,
      { kind: 'yard', id: yardId },
      nightOf,
    );
    const promised = await promises.promisedElsewhere(
      db as EntityManager,
      operationId,
      yardId,
      lotId,
      exceptMoveId,
    );
    result.set(key, { there, promised, free: Math.max(0, there - promised) });
  }
  return result;
}

interface WeightRow {
  lot_id: string | null;
  yard_id: string | null;
  sampled_on: string;
  weights_kg: number[];
}

/** The latest weighing for a lot at a yard, else for the lot anywhere, else for the yard. */
function weightFor(
  rows: WeightRow[],
  yardId: string,
  lotId: string,
): { stats: { mean: number; sd: number; samples: number }; source: WeightSource } | null {
  const exact = rows.find((r) => r.lot_id === lotId && r.yard_id === yardId);
  const lotAnywhere = rows
    .filter((r) => r.lot_id === lotId)
    .sort((a, b) => b.sampled_on.localeCompare(a.sampled_on))[0];
  const yardOnly = rows.find((r) => r.lot_id === null && r.yard_id === yardId);
  if (exact) {
    return {
      stats: summariseWeightSamples(exact.weights_kg),
      source: { kind: 'yard-sample', sampledOn: exact.sampled_on },
    };
  }
  if (lotAnywhere) {
    return {
      stats: summariseWeightSamples(lotAnywhere.weights_kg),
      source: {
        kind: 'lot-sample',
        sampledOn: lotAnywhere.sampled_on,
        yardId: lotAnywhere.yard_id,
      },
    };
  }
  if (yardOnly) {
    return {
      stats: summariseWeightSamples(yardOnly.weights_kg),
      source: { kind: 'yard-sample', sampledOn: yardOnly.sampled_on },
    };
  }
  return null;
}

/**
 * Reads what a plan needs from the operation's records: yards, lots with their box setups and
 * latest weighings and strength checks, trucks, destinations, the contract, and free colonies.
 * A reference to a record the operation does not have is a 400 naming the field.
 */
export async function gatherPlanFacts(
  db: Db,
  operationId: string,
  input: PlanInput,
  exceptMoveId: string | null,
): Promise<PlanFacts> {
  const yardIds = [...new Set(input.origins.map((o) => o.yardId))];
  const lotIds = [...new Set(input.origins.map((o) => o.lotId))];
  const truckIds = [...new Set((input.loads ?? []).map((l) => l.truckId))];
  const destinationTable = input.destinationKind === 'yard' ? 'yards' : 'sites';

  // One after another: inside a transaction the queries share one connection.
  const yards = (await db.query(
    `SELECT id, name, latitude, longitude FROM yards WHERE operation_id = $1 AND id = ANY($2::uuid[])`,
    [operationId, yardIds],
  )) as Array<{ id: string; name: string; latitude: number; longitude: number }>;
  const lots = (await db.query(
    `SELECT l.id, l.name, l.colonies_per_pallet, l.mean_frames, h.name AS hive_setup_name, h.boxes
         FROM colony_lots l JOIN hive_setups h ON h.id = l.hive_setup_id
        WHERE l.operation_id = $1 AND l.id = ANY($2::uuid[])`,
    [operationId, lotIds],
  )) as Array<{
    id: string;
    name: string;
    colonies_per_pallet: number;
    mean_frames: number | null;
    hive_setup_name: string;
    boxes: HiveBox[];
  }>;
  const trucks = (await db.query(
    `SELECT id, name, payload_kg, pallet_spots, tiers, tare_kg, legal_gross_kg
         FROM trucks WHERE operation_id = $1 AND id = ANY($2::uuid[])`,
    [operationId, truckIds],
  )) as Array<{
    id: string;
    name: string;
    payload_kg: number;
    pallet_spots: number;
    tiers: number;
    tare_kg: number;
    legal_gross_kg: number;
  }>;
  const destinations = (await db.query(
    `SELECT id, name, latitude, longitude FROM ${destinationTable} WHERE operation_id = $1 AND id = ANY($2::uuid[])`,
    [operationId, input.destinationIds],
  )) as Array<{ id: string; name: string; latitude: number; longitude: number }>;
  const weights = (await db.query(
    `SELECT DISTINCT ON (lot_id, yard_id) lot_id, yard_id, to_char(sampled_on, 'YYYY-MM-DD') AS sampled_on, weights_kg
         FROM weight_samples
        WHERE operation_id = $1 AND sampled_on <= $4 AND cardinality(weights_kg) >= 2
          AND (lot_id = ANY($2::uuid[]) OR (lot_id IS NULL AND yard_id = ANY($3::uuid[])))
        ORDER BY lot_id, yard_id, sampled_on DESC, created_at DESC`,
    [operationId, lotIds, yardIds, input.nightOf],
  )) as WeightRow[];
  const strengths = (await db.query(
    `SELECT DISTINCT ON (lot_id, place_id) lot_id, place_id, to_char(sampled_on, 'YYYY-MM-DD') AS sampled_on, frames
         FROM strength_samples
        WHERE operation_id = $1 AND place_kind = 'yard' AND lot_id = ANY($2::uuid[])
          AND place_id = ANY($3::uuid[]) AND sampled_on <= $4 AND cardinality(frames) >= 2
        ORDER BY lot_id, place_id, sampled_on DESC, created_at DESC`,
    [operationId, lotIds, yardIds, input.nightOf],
  )) as Array<{ lot_id: string; place_id: string; sampled_on: string; frames: number[] }>;

  const yardById = new Map(yards.map((y) => [y.id, y]));
  const lotById = new Map(lots.map((l) => [l.id, l]));
  const truckById = new Map(trucks.map((t) => [t.id, t]));
  const destinationById = new Map(destinations.map((d) => [d.id, d]));

  input.origins.forEach((o, i) => {
    if (!yardById.has(o.yardId)) throw fail(`origins.${i}.yardId`, 'No such yard.');
    if (!lotById.has(o.lotId)) throw fail(`origins.${i}.lotId`, 'No such colony lot.');
  });
  (input.loads ?? []).forEach((l, i) => {
    if (!truckById.has(l.truckId)) throw fail(`loads.${i}.truckId`, 'No such truck.');
    if ((input.loads ?? []).findIndex((x) => x.truckId === l.truckId) !== i)
      throw fail(`loads.${i}.truckId`, 'This truck is already on the move.');
  });
  input.destinationIds.forEach((id, i) => {
    if (!destinationById.has(id))
      throw fail(`destinationIds.${i}`, `No such ${input.destinationKind}.`);
  });

  let contract: PlanFacts['contract'] = null;
  if (input.contractId) {
    const [row] = (await db.query(
      `SELECT c.id, c.status, c.colonies_ordered, c.min_frames,
              (SELECT COALESCE(SUM(o.colonies), 0)::int FROM move_origins o JOIN moves m ON m.id = o.move_id
                WHERE m.operation_id = c.operation_id AND m.contract_id = c.id AND m.archived_at IS NULL
                  AND m.status = ANY($3) AND ($4::uuid IS NULL OR m.id <> $4)) AS others
         FROM contracts c WHERE c.operation_id = $1 AND c.id = $2`,
      [operationId, input.contractId, deliveringStatuses, exceptMoveId],
    )) as Array<{
      id: string;
      status: string;
      colonies_ordered: number;
      min_frames: number;
      others: number;
    }>;
    if (!row) throw fail('contractId', 'No such contract.');
    contract = {
      id: row.id,
      status: row.status,
      coloniesOrdered: row.colonies_ordered,
      minFrames: row.min_frames,
      coloniesOnOtherMoves: row.others,
    };
  }

  const free = await freeColoniesOf(db, operationId, input.nightOf, input.origins, exceptMoveId);
  const origins: OriginFact[] = input.origins.map((o, pickupOrder) => {
    const yard = yardById.get(o.yardId)!;
    const lot = lotById.get(o.lotId)!;
    const weighed = weightFor(weights, o.yardId, o.lotId);
    let hiveWeightKg = weighed?.stats;
    let weightSource = weighed?.source;
    if (!hiveWeightKg || !weightSource) {
      const computed = computeHiveWeight({
        boxes: lot.boxes,
        framesOfBees: lot.mean_frames ?? undefined,
      }).weightKg;
      hiveWeightKg = {
        mean: computed,
        sd: computed * ASSUMED_WEIGHT_SD_SHARE,
        samples: ASSUMED_WEIGHT_SAMPLES,
      };
      weightSource = { kind: 'hive-setup', hiveSetupName: lot.hive_setup_name };
    }
    const strength = strengths.find((s) => s.lot_id === o.lotId && s.place_id === o.yardId);
    let strengthSource: StrengthSource = { kind: 'unknown' };
    let meanFrames: number | null = null;
    if (strength) {
      meanFrames = mean(strength.frames);
      strengthSource = {
        kind: 'strength-sample',
        sampledOn: strength.sampled_on,
        samples: strength.frames.length,
      };
    } else if (lot.mean_frames !== null) {
      meanFrames = lot.mean_frames;
      strengthSource = { kind: 'lot' };
    }
    return {
      pickupOrder,
      yardId: yard.id,
      yardName: yard.name,
      latitude: yard.latitude,
      longitude: yard.longitude,
      lotId: lot.id,
      lotName: lot.name,
      colonies: o.colonies,
      coloniesPerPallet: lot.colonies_per_pallet,
      hiveWeightKg,
      weightSource,
      meanFrames,
      strengthSource,
      freeColonies: free.get(`${o.yardId}:${o.lotId}`)!.free,
    };
  });

  const truckFacts: TruckFact[] = (input.loads ?? []).map((l, i) => {
    const t = truckById.get(l.truckId)!;
    return {
      key: `load-${i}`,
      truckId: t.id,
      name: t.name,
      driverNames: l.driverNames ?? [],
      payloadKg: t.payload_kg,
      palletSpots: t.pallet_spots,
      tiers: t.tiers,
      tareKg: t.tare_kg,
      legalGrossKg: t.legal_gross_kg,
    };
  });
  const destinationFacts: DestinationFact[] = input.destinationIds.map((id) => {
    const d = destinationById.get(id)!;
    return { kind: input.destinationKind, ...d };
  });

  return {
    nightOf: input.nightOf,
    drivers: input.drivers ?? 1,
    loadingMinutes: input.loadingMinutes ?? DEFAULT_LOADING_MINUTES,
    averageSpeedKmh: input.averageSpeedKmh ?? DEFAULT_AVERAGE_SPEED_KMH,
    palletTareKg: DEFAULT_PALLET_TARE_KG,
    origins,
    trucks: truckFacts,
    destinations: destinationFacts,
    contract,
  };
}

/** Per yard and lot on a night: colonies the ledger has, those other open moves take, and free. */
export async function availabilityOn(
  db: Db,
  operationId: string,
  nightOf: string,
  exceptMoveId: string | null,
) {
  const counts = await ledger.countsOn(db, operationId, nightOf, { kind: 'yard' });
  const promisedRows = (await db.query(
    `SELECT o.yard_id, o.lot_id, y.name AS yard_name, l.name AS lot_name, m.id AS move_id,
            m.name AS move_name, to_char(m.night_of, 'YYYY-MM-DD') AS night_of, m.status,
            SUM(o.colonies)::int AS colonies
       FROM move_origins o JOIN moves m ON m.id = o.move_id
       JOIN yards y ON y.id = o.yard_id JOIN colony_lots l ON l.id = o.lot_id
      WHERE o.operation_id = $1 AND m.status = ANY($2) AND m.archived_at IS NULL
        AND ($3::uuid IS NULL OR m.id <> $3)
      GROUP BY o.yard_id, o.lot_id, y.name, l.name, m.id, m.name, m.night_of, m.status
      ORDER BY m.night_of, m.name`,
    [operationId, [...promisingStatuses], exceptMoveId],
  )) as Array<{
    yard_id: string;
    lot_id: string;
    yard_name: string;
    lot_name: string;
    move_id: string;
    move_name: string;
    night_of: string;
    status: string;
    colonies: number;
  }>;
  const rows = new Map<
    string,
    { yardId: string; yardName: string; lotId: string; lotName: string; inLedger: number }
  >();
  for (const c of counts) {
    rows.set(`${c.placeId}:${c.lotId}`, {
      yardId: c.placeId,
      yardName: c.placeName,
      lotId: c.lotId,
      lotName: c.lotName,
      inLedger: c.colonies,
    });
  }
  for (const p of promisedRows) {
    const key = `${p.yard_id}:${p.lot_id}`;
    if (!rows.has(key))
      rows.set(key, {
        yardId: p.yard_id,
        yardName: p.yard_name,
        lotId: p.lot_id,
        lotName: p.lot_name,
        inLedger: 0,
      });
  }
  const free = await freeColoniesOf(db, operationId, nightOf, [...rows.values()], exceptMoveId);
  const items = [...rows.entries()].map(([key, row]) => {
    const f = free.get(key)!;
    return {
      ...row,
      /** What can leave that night without a later count going negative. */
      canLeave: f.there,
      promised: f.promised,
      free: f.free,
      promisedTo: promisedRows
        .filter((p) => `${p.yard_id}:${p.lot_id}` === key)
        .map((p) => ({
          moveId: p.move_id,
          moveName: p.move_name,
          nightOf: p.night_of,
          status: p.status,
          colonies: p.colonies,
        })),
    };
  });
  items.sort((a, b) => a.yardName.localeCompare(b.yardName) || a.lotName.localeCompare(b.lotName));
  return { nightOf, items };
}
