import type { EntityManager } from 'typeorm';
import type { z } from 'zod';
import { AppError } from '../../errors/app-error';
import type { Actor } from '../../middleware/authorise';
import type { loadRecordFields, moveWeightsFields } from '../../../shared/schemas/moves';
import { stopKey } from '../../../shared/domain/pick-up-stops';
import { MoveLoad } from './move-load.entity';
import { MoveOrigin } from './move-origin.entity';
import { plannedStopsOf, presentLoad } from './move-planning';
import { moves } from './moves.service';

type LoadRecordFields = z.infer<typeof loadRecordFields>;
type MoveWeightsFields = z.infer<typeof moveWeightsFields>;

/** Statuses in which the crew may record counts, checks, weights and notes on a move. */
export const recordableStatuses = ['planned', 'loading', 'rolling', 'placed'];

async function recordableMove(tx: EntityManager, actor: Actor, moveId: string) {
  const move = await moves.get(tx, actor.operationId, moveId);
  if (move.archivedAt || !recordableStatuses.includes(move.status)) {
    throw new AppError(
      409,
      'conflict',
      `This move is ${move.archivedAt ? 'archived' : move.status}: nothing more can be recorded on it.`,
    );
  }
  return move;
}

async function loadOf(tx: EntityManager, actor: Actor, moveId: string, loadId: string) {
  const load = await tx
    .getRepository(MoveLoad)
    .findOneBy({ id: loadId, moveId, operationId: actor.operationId });
  if (!load) throw AppError.notFound('Load');
  return load;
}

/**
 * The pick-up stops (yard and lot) of one load with the colonies it takes at each: from its saved
 * plan, else the move's origins (whole origins, an upper bound for one truck).
 */
async function stopsOf(tx: EntityManager, actor: Actor, moveId: string, load: MoveLoad) {
  const stops =
    plannedStopsOf(load) ??
    (await tx.getRepository(MoveOrigin).findBy({ moveId, operationId: actor.operationId }));
  return new Map(stops.map((s) => [stopKey(s), s.colonies]));
}

/**
 * Checks counts given per pick-up stop (`field` names them in errors) against the load's stops:
 * each must be one of the truck's stops, and none counted twice.
 */
function checkStops(
  stops: Map<string, number>,
  field: 'palletsByStop' | 'leftBehindByStop',
  counts: Array<{ yardId: string; lotId: string }>,
) {
  const seen = new Set<string>();
  counts.forEach((c, i) => {
    const stop = stopKey(c);
    if (!stops.has(stop)) {
      throw AppError.validation([
        { field: `${field}.${i}`, message: 'Not a pick-up stop of this truck.' },
      ]);
    }
    if (seen.has(stop)) {
      throw AppError.validation([
        { field: `${field}.${i}`, message: 'This stop is counted twice.' },
      ]);
    }
    seen.add(stop);
  });
}

/**
 * A truck's total from its parts (stops or drops): the parts' sum when no total is given, or a 400
 * when both are given and disagree.
 */
function totalOfParts(
  field: string,
  total: number | null | undefined,
  sum: number,
  parts: string,
): number {
  if (total === undefined || total === null) return sum;
  if (total !== sum) {
    throw AppError.validation([{ field, message: `${parts} add up to ${sum}, not ${total}.` }]);
  }
  return total;
}

/** A per-stop list replaces the old one; a bare truck total clears the stops it may not match. */
function stopsToStore<T>(byStop: T[] | null | undefined, total: number | null | undefined) {
  if (byStop !== undefined) return byStop;
  return total !== undefined ? null : undefined;
}

/** A 409 that carries the current load, so the device can show what it conflicts with. */
function staleLoad(current: MoveLoad): AppError {
  return new AppError(
    409,
    'version_conflict',
    'Someone else recorded on this load since you opened it. Here is what it holds now.',
    { currentVersion: current.version, current: presentLoad(current) },
  );
}

/** The crew's records on a night's move: counts per load, the pre-roll check, weights, notes. */
export const moveRecords = {
  /** Writes the given fields of one load at `version`; 409 with the current load when stale. */
  async recordLoadIn(
    tx: EntityManager,
    actor: Actor,
    moveId: string,
    loadId: string,
    version: number,
    fields: LoadRecordFields,
  ) {
    const move = await recordableMove(tx, actor, moveId);
    const load = await loadOf(tx, actor, moveId, loadId);
    const stops =
      fields.palletsByStop || fields.leftBehindByStop
        ? await stopsOf(tx, actor, moveId, load)
        : new Map<string, number>();
    let palletsLoaded = fields.palletsLoaded;
    if (fields.palletsByStop) {
      checkStops(stops, 'palletsByStop', fields.palletsByStop);
      const sum = fields.palletsByStop.reduce((total, c) => total + c.pallets, 0);
      palletsLoaded = totalOfParts('palletsLoaded', palletsLoaded, sum, 'The stops');
    }
    let coloniesLeftBehind = fields.coloniesLeftBehind;
    if (fields.leftBehindByStop) {
      const byStop = fields.leftBehindByStop;
      checkStops(stops, 'leftBehindByStop', byStop);
      byStop.forEach((c, i) => {
        const planned = stops.get(stopKey(c)) ?? 0;
        if (c.colonies > planned) {
          throw AppError.validation([
            {
              field: `leftBehindByStop.${i}.colonies`,
              message: `More than the ${planned} colonies this truck takes here.`,
            },
          ]);
        }
      });
      const sum = byStop.reduce((total, c) => total + c.colonies, 0);
      coloniesLeftBehind = totalOfParts('coloniesLeftBehind', coloniesLeftBehind, sum, 'The stops');
    }
    const placements = fields.placements ?? undefined;
    let coloniesPlaced = fields.coloniesPlaced;
    if (placements) {
      placements.forEach((p, i) => {
        if (!move.destinationIds.includes(p.placeId)) {
          throw AppError.validation([
            { field: `placements.${i}.placeId`, message: 'Not a destination of this move.' },
          ]);
        }
      });
      const sum = placements.reduce((total, p) => total + p.colonies, 0);
      coloniesPlaced = totalOfParts('coloniesPlaced', coloniesPlaced, sum, 'The drops');
    }
    const set: Record<string, unknown> = {
      palletsLoaded,
      palletsByStop: stopsToStore(fields.palletsByStop, fields.palletsLoaded),
      coloniesPlaced,
      coloniesLeftBehind,
      leftBehindByStop: stopsToStore(fields.leftBehindByStop, fields.coloniesLeftBehind),
      coloniesLost: fields.coloniesLost,
      placements: placements === undefined ? undefined : placements,
      preRollCheck: fields.preRollCheck === undefined ? undefined : fields.preRollCheck,
      notes: fields.notes,
    };
    const values = Object.fromEntries(Object.entries(set).filter(([, v]) => v !== undefined));
    const result = await tx
      .getRepository(MoveLoad)
      .createQueryBuilder()
      .update()
      .set({ ...values, version: () => 'version + 1' } as never)
      .where('id = :id AND operation_id = :op AND move_id = :moveId AND version = :version', {
        id: load.id,
        op: actor.operationId,
        moveId,
        version,
      })
      .execute();
    const current = await loadOf(tx, actor, moveId, loadId);
    if (result.affected !== 1) throw staleLoad(current);
    return presentLoad(current);
  },

  /** Appends a note to a load (or to the move when no load is named), signed with the author. */
  async addNoteIn(
    tx: EntityManager,
    actor: Actor,
    moveId: string,
    loadId: string | undefined,
    version: number | undefined,
    text: string,
  ) {
    await recordableMove(tx, actor, moveId);
    const line = `${actor.name}: ${text}`;
    if (loadId) {
      const load = await loadOf(tx, actor, moveId, loadId);
      const rows = (await tx.query(
        `UPDATE move_loads SET notes = CASE WHEN notes = '' THEN $4 ELSE notes || E'\\n' || $4 END,
                version = version + 1
          WHERE operation_id = $1 AND id = $2 AND ($3::int IS NULL OR version = $3) RETURNING id`,
        [actor.operationId, load.id, version ?? null, line],
      )) as [unknown[], number];
      if (rows[1] !== 1) throw staleLoad(await loadOf(tx, actor, moveId, loadId));
      return presentLoad(await loadOf(tx, actor, moveId, loadId));
    }
    const rows = (await tx.query(
      `UPDATE moves SET notes = CASE WHEN notes = '' THEN $4 ELSE notes || E'\\n' || $4 END,
              version = version + 1, updated_at = now()
        WHERE operation_id = $1 AND id = $2 AND ($3::int IS NULL OR version = $3) RETURNING id`,
      [actor.operationId, moveId, version ?? null, line],
    )) as [unknown[], number];
    if (rows[1] !== 1) {
      const current = await moves.get(tx, actor.operationId, moveId);
      throw AppError.staleVersion(current.version);
    }
    const move = await moves.get(tx, actor.operationId, moveId);
    return { moveId: move.id, notes: move.notes, version: move.version };
  },

  /** Stores hive weights read during loading, tied to the move. */
  async addWeightsIn(tx: EntityManager, actor: Actor, moveId: string, fields: MoveWeightsFields) {
    const move = await recordableMove(tx, actor, moveId);
    const check = async (table: string, id: string | null | undefined, field: string) => {
      if (!id) return;
      const rows = (await tx.query(`SELECT 1 FROM ${table} WHERE operation_id = $1 AND id = $2`, [
        actor.operationId,
        id,
      ])) as unknown[];
      if (rows.length !== 1) throw AppError.validation([{ field, message: 'No such record.' }]);
    };
    await check('yards', fields.yardId, 'yardId');
    await check('colony_lots', fields.lotId, 'lotId');
    const [row] = (await tx.query(
      `INSERT INTO weight_samples (operation_id, yard_id, lot_id, move_id, sampled_on, weights_kg, notes, recorded_by)
       VALUES ($1, $2, $3, $4, $5, $6, $7, $8)
       RETURNING id, yard_id AS "yardId", lot_id AS "lotId", move_id AS "moveId",
                 to_char(sampled_on, 'YYYY-MM-DD') AS "sampledOn", weights_kg AS "weightsKg", notes`,
      [
        actor.operationId,
        fields.yardId ?? null,
        fields.lotId ?? null,
        move.id,
        fields.sampledOn ?? move.nightOf,
        fields.weightsKg,
        fields.notes ?? '',
        actor.id,
      ],
    )) as Array<Record<string, unknown>>;
    return row;
  },
};
