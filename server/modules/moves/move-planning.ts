import type { DataSource, EntityManager } from 'typeorm';
import { AppError } from '../../errors/app-error';
import type { Actor } from '../../middleware/authorise';
import type { LoadRecord, MovePreviewRequest } from '../../../shared/schemas/moves';
import { availabilityOn, gatherPlanFacts, type PlanInput } from './move-facts';
import type { MovePlan, PlannedStop, PlannedTruck } from '../../../shared/schemas/move-plan';
import { buildMovePlan } from './move-plan';
import type { MoveLoad } from './move-load.entity';
import type { Move } from './move.entity';

type Db = DataSource | EntityManager;

/** The pick-up stops of a load's saved plan; null for a load saved without one. */
export function plannedStopsOf(load: MoveLoad): PlannedStop[] | null {
  const plan = load.plan as { stops?: PlannedStop[] } | null;
  return plan?.stops ?? null;
}

/** What the crew recorded on a load, as the API presents it (moves, load sheet, Tonight). */
export function recordOf(l: MoveLoad): LoadRecord {
  return {
    palletsLoaded: l.palletsLoaded,
    palletsByStop: l.palletsByStop,
    coloniesPlaced: l.coloniesPlaced,
    coloniesLeftBehind: l.coloniesLeftBehind,
    leftBehindByStop: l.leftBehindByStop,
    coloniesLost: l.coloniesLost,
    placements: l.placements,
    preRollCheck: l.preRollCheck,
    notes: l.notes,
    version: l.version,
  };
}

/** A load as every staff role sees it (there is no money on a load). */
export function presentLoad(l: MoveLoad) {
  return {
    id: l.id,
    truckId: l.truckId,
    position: l.position,
    driverNames: l.driverNames,
    palletsPlanned: l.palletsPlanned,
    coloniesPlanned: l.coloniesPlanned,
    plan: l.plan,
    ...recordOf(l),
  };
}

/** Turns domain errors (impossible values the schema let through) into a 400, not a 500. */
function domainErrorsAsBadRequest(error: unknown): never {
  if (error instanceof RangeError || error instanceof TypeError) {
    throw new AppError(400, 'bad_request', `This plan cannot be computed: ${error.message}`);
  }
  throw error;
}

/** The plan for a create-shaped body (the planner's live preview). Reads only. */
export async function previewMove(db: DataSource, actor: Actor, input: MovePreviewRequest) {
  const facts = await gatherPlanFacts(db, actor.operationId, input, input.moveId ?? null);
  try {
    return buildMovePlan(facts);
  } catch (error) {
    return domainErrorsAsBadRequest(error);
  }
}

/** Colonies in the ledger, promised to other open moves, and free, per yard and lot. */
export function availability(
  db: DataSource,
  actor: Actor,
  nightOf: string,
  exceptMoveId: string | null,
) {
  return availabilityOn(db, actor.operationId, nightOf, exceptMoveId);
}

/** A saved move's plan inputs, from its rows (origins in pick-up order, loads in fill order). */
export async function planInputOf(db: Db, operationId: string, move: Move): Promise<PlanInput> {
  const origins = (await db.query(
    `SELECT yard_id, lot_id, colonies FROM move_origins WHERE operation_id = $1 AND move_id = $2 ORDER BY pickup_order, id`,
    [operationId, move.id],
  )) as Array<{ yard_id: string; lot_id: string; colonies: number }>;
  const loads = (await db.query(
    `SELECT truck_id, driver_names FROM move_loads WHERE operation_id = $1 AND move_id = $2 ORDER BY position, id`,
    [operationId, move.id],
  )) as Array<{ truck_id: string; driver_names: string[] }>;
  return {
    nightOf: move.nightOf,
    destinationKind: move.destinationKind,
    destinationIds: move.destinationIds,
    contractId: move.contractId,
    drivers: move.drivers,
    loadingMinutes: move.loadingMinutes,
    averageSpeedKmh: move.averageSpeedKmh,
    origins: origins.map((o) => ({ yardId: o.yard_id, lotId: o.lot_id, colonies: o.colonies })),
    loads: loads.map((l) => ({ truckId: l.truck_id, driverNames: l.driver_names })),
  };
}

/** What a move keeps in `moves.timeline`: the plan less the per-truck pages (those are on loads). */
export interface StoredPlan {
  computedAt: string;
  timeline: MovePlan['timeline'];
  origins: MovePlan['loadSheet']['origins'];
  totals: MovePlan['loadSheet']['totals'];
  palletTareKg: number;
  warnings: MovePlan['warnings'];
  cautions: MovePlan['cautions'];
  assumptions: string[];
}

/**
 * Computes a saved move's plan and stores it in the same transaction: each load's planned pallets,
 * colonies and page (`move_loads.plan`), and the rest in `moves.timeline`. Does not bump versions:
 * the plan follows from the move's own fields.
 */
export async function storeMovePlan(tx: EntityManager, operationId: string, moveId: string) {
  const [move] = (await tx.query(
    `SELECT id, to_char(night_of, 'YYYY-MM-DD') AS "nightOf", destination_kind AS "destinationKind",
            destination_ids AS "destinationIds", contract_id AS "contractId", drivers,
            loading_minutes AS "loadingMinutes", average_speed_kmh AS "averageSpeedKmh"
       FROM moves WHERE operation_id = $1 AND id = $2`,
    [operationId, moveId],
  )) as Move[];
  const input = await planInputOf(tx, operationId, move);
  const facts = await gatherPlanFacts(tx, operationId, input, moveId);
  let plan: MovePlan;
  try {
    plan = buildMovePlan(facts);
  } catch (error) {
    return domainErrorsAsBadRequest(error);
  }
  const loadIds = (await tx.query(
    `SELECT id FROM move_loads WHERE operation_id = $1 AND move_id = $2 ORDER BY position, id`,
    [operationId, moveId],
  )) as Array<{ id: string }>;
  for (const [i, { id }] of loadIds.entries()) {
    const page = plan.loadSheet.trucks[i];
    await tx.query(
      `UPDATE move_loads SET pallets_planned = $3, colonies_planned = $4, plan = $5 WHERE operation_id = $1 AND id = $2`,
      [operationId, id, page.pallets, page.colonies, JSON.stringify(page)],
    );
  }
  const stored: StoredPlan = {
    computedAt: new Date().toISOString(),
    timeline: plan.timeline,
    origins: plan.loadSheet.origins,
    totals: plan.loadSheet.totals,
    palletTareKg: plan.loadSheet.palletTareKg,
    warnings: plan.warnings,
    cautions: plan.cautions,
    assumptions: plan.assumptions,
  };
  await tx.query(`UPDATE moves SET timeline = $3 WHERE operation_id = $1 AND id = $2`, [
    operationId,
    moveId,
    JSON.stringify(stored),
  ]);
}

/**
 * A saved move's plan: the stored one when the move and every load carry it, else computed now
 * from the move's rows (moves saved before plans were stored, such as imported ones). Reads only.
 */
export async function planOfMove(
  db: Db,
  operationId: string,
  move: Move,
): Promise<MovePlan & { planSource: 'saved' | 'computed-now'; computedAt: string }> {
  const stored = move.timeline as Partial<StoredPlan> | null;
  const loads = (await db.query(
    `SELECT plan FROM move_loads WHERE operation_id = $1 AND move_id = $2 ORDER BY position, id`,
    [operationId, move.id],
  )) as Array<{ plan: PlannedTruck | null }>;
  if (stored?.computedAt && stored.timeline && loads.every((l) => l.plan)) {
    return {
      nightOf: move.nightOf,
      loadSheet: {
        palletTareKg: stored.palletTareKg ?? 0,
        trucks: loads.map((l) => l.plan!),
        origins: stored.origins ?? [],
        totals: stored.totals!,
      },
      timeline: stored.timeline,
      warnings: stored.warnings ?? [],
      cautions: stored.cautions ?? [],
      assumptions: stored.assumptions ?? [],
      planSource: 'saved',
      computedAt: stored.computedAt,
    };
  }
  const facts = await gatherPlanFacts(
    db,
    operationId,
    await planInputOf(db, operationId, move),
    move.id,
  );
  try {
    return {
      ...buildMovePlan(facts),
      planSource: 'computed-now',
      computedAt: new Date().toISOString(),
    };
  } catch (error) {
    return domainErrorsAsBadRequest(error);
  }
}
