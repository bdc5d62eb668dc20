import type { DataSource, EntityManager } from 'typeorm';
import type { z } from 'zod';
import { TenantRepository } from '../../db/tenant-repository';
import { AppError } from '../../errors/app-error';
import { isoOrNull } from '../../http/present';
import type { Actor } from '../../middleware/authorise';
import {
  moveTransitions,
  type MoveCreateRequest,
  type MoveStatus,
  type MoveUpdateRequest,
  type moveListQuery,
  type moveOrigin,
} from '../../../shared/schemas/moves';
import { colonyLots } from '../colony-lots/colony-lots.router';
import { contracts } from '../contracts/contracts.service';
import { LedgerRepository } from '../ledger/ledger.repository';
import { LedgerService } from '../ledger/ledger.service';
import { trucks } from '../trucks/trucks.router';
import { Move } from './move.entity';
import { MoveLoad } from './move-load.entity';
import { MoveOrigin } from './move-origin.entity';
import { MovesRepository, promisingStatuses } from './moves.repository';
import { plannedStopsOf, presentLoad, storeMovePlan } from './move-planning';
import { apportion } from '../../../shared/domain/apportion';
import { splitLeftAndLost } from '../../../shared/domain/placement-split';

export const moves = new TenantRepository(Move, 'Move');
const ledger = new LedgerRepository();
const promises = new MovesRepository();

type OriginInput = z.infer<typeof moveOrigin>;

/** Night moves: what goes where, on which trucks; placing one writes the ledger. */
export class MovesService {
  private readonly ledgerService: LedgerService;

  constructor(private readonly db: DataSource) {
    this.ledgerService = new LedgerService(db);
  }

  private async present(db: DataSource | EntityManager, move: Move) {
    // One after another: inside a transaction both queries share one connection.
    const origins = await db.getRepository(MoveOrigin).find({
      where: { operationId: move.operationId, moveId: move.id },
      order: { pickupOrder: 'ASC' },
    });
    const loads = await db.getRepository(MoveLoad).find({
      where: { operationId: move.operationId, moveId: move.id },
      order: { position: 'ASC', id: 'ASC' },
    });
    return {
      id: move.id,
      name: move.name,
      nightOf: move.nightOf,
      status: move.status,
      destinationKind: move.destinationKind,
      destinationIds: move.destinationIds,
      contractId: move.contractId,
      drivers: move.drivers,
      loadingMinutes: move.loadingMinutes,
      averageSpeedKmh: move.averageSpeedKmh,
      timeline: move.timeline,
      notes: move.notes,
      origins: origins.map((o) => ({
        yardId: o.yardId,
        lotId: o.lotId,
        colonies: o.colonies,
        pickupOrder: o.pickupOrder,
      })),
      loads: loads.map(presentLoad),
      version: move.version,
      archivedAt: isoOrNull(move.archivedAt),
    };
  }

  private async checkReferences(
    tx: EntityManager,
    actor: Actor,
    input: Partial<MoveCreateRequest>,
    kind: Move['destinationKind'],
  ) {
    const fail = (field: string, message: string) => AppError.validation([{ field, message }]);
    for (const [i, destinationId] of (input.destinationIds ?? []).entries()) {
      if (!(await ledger.placeExists(tx, actor.operationId, { kind, id: destinationId })))
        throw fail(`destinationIds.${i}`, `No such ${kind}.`);
    }
    for (const [i, origin] of (input.origins ?? []).entries()) {
      if (!(await ledger.placeExists(tx, actor.operationId, { kind: 'yard', id: origin.yardId })))
        throw fail(`origins.${i}.yardId`, 'No such yard.');
      await colonyLots.get(tx, actor.operationId, origin.lotId).catch(() => {
        throw fail(`origins.${i}.lotId`, 'No such colony lot.');
      });
    }
    for (const [i, load] of (input.loads ?? []).entries()) {
      await trucks.get(tx, actor.operationId, load.truckId).catch(() => {
        throw fail(`loads.${i}.truckId`, 'No such truck.');
      });
    }
    if (input.contractId) {
      await contracts.get(tx, actor.operationId, input.contractId).catch(() => {
        throw fail('contractId', 'No such contract.');
      });
    }
  }

  /** Refuses to promise colonies that are not there or that another open move already takes. */
  private async checkPromises(
    tx: EntityManager,
    actor: Actor,
    moveId: string,
    nightOf: string,
    origins: OriginInput[],
  ) {
    await promises.lockPromises(tx, actor.operationId);
    const wanted = new Map<string, OriginInput>();
    for (const o of origins) {
      const key = `${o.yardId}:${o.lotId}`;
      wanted.set(key, { ...o, colonies: (wanted.get(key)?.colonies ?? 0) + o.colonies });
    }
    for (const o of wanted.values()) {
      const there = await ledger.lowestBalanceFrom(
        tx,
        actor.operationId,
        o.lotId,
        { kind: 'yard', id: o.yardId },
        nightOf,
      );
      const promised = await promises.promisedElsewhere(
        tx,
        actor.operationId,
        o.yardId,
        o.lotId,
        moveId,
      );
      if (there - promised < o.colonies) {
        throw new AppError(
          409,
          'conflict',
          `Only ${Math.max(0, there - promised)} of these colonies are free at that yard on ${nightOf} (${there} there, ${promised} promised to other moves); ${o.colonies} cannot be promised.`,
          { yardId: o.yardId, lotId: o.lotId, there, promised, wanted: o.colonies },
        );
      }
    }
  }

  private async replaceParts(
    tx: EntityManager,
    actor: Actor,
    moveId: string,
    input: Partial<MoveCreateRequest>,
  ) {
    if (input.origins) {
      await tx.getRepository(MoveOrigin).delete({ operationId: actor.operationId, moveId });
      await tx.getRepository(MoveOrigin).insert(
        input.origins.map((o, pickupOrder) => ({
          ...o,
          operationId: actor.operationId,
          moveId,
          pickupOrder,
        })),
      );
    }
    if (input.loads) {
      await tx.getRepository(MoveLoad).delete({ operationId: actor.operationId, moveId });
      if (input.loads.length) {
        await tx.getRepository(MoveLoad).insert(
          input.loads.map((l, position) => ({
            operationId: actor.operationId,
            moveId,
            truckId: l.truckId,
            position,
            driverNames: l.driverNames ?? [],
            version: 1,
          })),
        );
      }
    }
  }

  /** Recomputes and stores the move's plan: each load's planned counts and page, the timeline. */
  private async storePlan(tx: EntityManager, actor: Actor, moveId: string) {
    await storeMovePlan(tx, actor.operationId, moveId);
  }

  async list(actor: Actor, query: z.infer<typeof moveListQuery>) {
    const page = await moves.list(
      this.db,
      actor.operationId,
      { ...query, sort: 'nightOf' },
      (qb) => {
        if (query.status) qb.andWhere('record.status = :status', { status: query.status });
        if (query.from) qb.andWhere('record.nightOf >= :from', { from: query.from });
        if (query.to) qb.andWhere('record.nightOf <= :to', { to: query.to });
      },
    );
    return {
      items: await Promise.all(page.items.map((m) => this.present(this.db, m))),
      total: page.total,
    };
  }

  async get(actor: Actor, id: string) {
    return this.present(this.db, await moves.get(this.db, actor.operationId, id));
  }

  async create(actor: Actor, { origins, loads, ...fields }: MoveCreateRequest) {
    return this.db.transaction(async (tx) => {
      await this.checkReferences(tx, actor, { ...fields, origins, loads }, fields.destinationKind);
      const move = await moves.insert(tx, actor.operationId, { ...fields, status: 'draft' });
      await this.replaceParts(tx, actor, move.id, { origins, loads });
      await this.storePlan(tx, actor, move.id);
      return this.present(tx, await moves.get(tx, actor.operationId, move.id));
    });
  }

  async update(
    actor: Actor,
    id: string,
    { version, origins, loads, ...fields }: MoveUpdateRequest,
  ) {
    return this.db.transaction(async (tx) => {
      const before = await moves.get(tx, actor.operationId, id);
      if (!['draft', 'planned'].includes(before.status)) {
        throw new AppError(
          409,
          'conflict',
          `A move that is ${before.status} can no longer be edited.`,
        );
      }
      await this.checkReferences(
        tx,
        actor,
        { ...fields, origins, loads },
        fields.destinationKind ?? before.destinationKind,
      );
      const after = await moves.update(tx, actor.operationId, id, version, fields);
      await this.replaceParts(tx, actor, id, { origins, loads });
      if (before.status === 'planned')
        await this.checkPromises(tx, actor, id, after.nightOf, await this.originsOf(tx, actor, id));
      await this.storePlan(tx, actor, id);
      return this.present(tx, await moves.get(tx, actor.operationId, id));
    });
  }

  async archive(actor: Actor, id: string, version: number) {
    return this.db.transaction(async (tx) => {
      const move = await moves.get(tx, actor.operationId, id);
      if ((promisingStatuses as readonly string[]).includes(move.status)) {
        throw new AppError(409, 'conflict', 'Cancel this move before archiving it.');
      }
      return this.present(tx, await moves.archive(tx, actor.operationId, id, version));
    });
  }

  private originsOf(tx: EntityManager, actor: Actor, moveId: string) {
    return tx.getRepository(MoveOrigin).find({ where: { operationId: actor.operationId, moveId } });
  }

  /**
   * Moves a move to its next status. Planning promises its colonies; placing writes the ledger
   * (colonies leave each yard and arrive at the destination) in the same transaction.
   */
  async changeStatus(actor: Actor, id: string, version: number, status: MoveStatus) {
    return this.db.transaction((tx) => this.changeStatusIn(tx, actor, id, version, status));
  }

  /** changeStatus inside the caller's transaction (offline sync applies each change in its own). */
  async changeStatusIn(
    tx: EntityManager,
    actor: Actor,
    id: string,
    version: number,
    status: MoveStatus,
  ) {
    const move = await moves.get(tx, actor.operationId, id);
    if (!moveTransitions[move.status].includes(status)) {
      throw new AppError(409, 'conflict', `A move that is ${move.status} cannot become ${status}.`);
    }
    if (actor.role === 'crew' && !['loading', 'rolling', 'placed'].includes(status)) {
      throw AppError.forbidden(
        'Crew mark moves loading, rolling and placed; planners do the rest.',
      );
    }
    const origins = await this.originsOf(tx, actor, id);
    if (status === 'planned') await this.checkPromises(tx, actor, id, move.nightOf, origins);
    const updated = await moves.update(tx, actor.operationId, id, version, { status });
    if (status === 'placed') await this.writePlacement(tx, actor, move, origins);
    return this.present(tx, updated);
  }

  /** The move as the API presents it, read inside the caller's transaction. */
  async presentIn(db: DataSource | EntityManager, actor: Actor, id: string) {
    return this.present(db, await moves.get(db, actor.operationId, id));
  }

  /**
   * Writes what the crew recorded into the ledger: colonies left behind stay in their yard (no
   * entry), colonies lost on the way leave their yard as a loss, and the rest move to the
   * destinations — in the proportions of the recorded placements per destination, or evenly when
   * none were recorded. `splitLeftAndLost` decides which origins the left-behind and lost come from.
   */
  private async writePlacement(tx: EntityManager, actor: Actor, move: Move, origins: MoveOrigin[]) {
    const loads = await tx
      .getRepository(MoveLoad)
      .find({ where: { operationId: actor.operationId, moveId: move.id } });
    const split = splitLeftAndLost(
      origins,
      loads.map((l) => ({ ...l, stops: plannedStopsOf(l) ?? [] })),
    );
    if (!split.ok) {
      if ('origin' in split) {
        const origin = origins[split.origin];
        const [yard] = (await tx.query(`SELECT name FROM yards WHERE id = $1`, [
          origin.yardId,
        ])) as Array<{ name: string }>;
        throw new AppError(
          409,
          'conflict',
          `The loads record ${split.leftBehind} colonies left behind at ${yard?.name ?? 'one yard'}, more than the ${origin.colonies} this move takes from it.`,
        );
      }
      throw new AppError(
        409,
        'conflict',
        `The loads record ${split.leftBehind} left behind and ${split.lost} lost, more than the ${split.total} colonies of this move.`,
      );
    }
    const { leftBehind: leftPer, lost: lostPer } = split;

    const destinations = move.destinationIds;
    const recorded = new Map<string, number>();
    for (const placement of loads.flatMap((l) => l.placements ?? [])) {
      if (destinations.includes(placement.placeId))
        recorded.set(
          placement.placeId,
          (recorded.get(placement.placeId) ?? 0) + placement.colonies,
        );
    }
    const recordedTotal = [...recorded.values()].reduce((a, b) => a + b, 0);
    const weights = destinations.map((d) => (recordedTotal > 0 ? (recorded.get(d) ?? 0) : 1));

    for (const [i, origin] of origins.entries()) {
      const from = { kind: 'yard' as const, id: origin.yardId };
      if (lostPer[i] > 0) {
        await this.ledgerService.record(tx, actor, {
          lotId: origin.lotId,
          kind: 'loss',
          occurredOn: move.nightOf,
          colonies: lostPer[i],
          from,
          reason: `Lost in transit on move "${move.name}"`,
          moveId: move.id,
        });
      }
      const moved = apportion(origin.colonies - leftPer[i] - lostPer[i], weights);
      for (const [d, destinationId] of destinations.entries()) {
        if (moved[d] === 0) continue;
        await this.ledgerService.record(tx, actor, {
          lotId: origin.lotId,
          kind: 'move',
          occurredOn: move.nightOf,
          colonies: moved[d],
          from,
          to: { kind: move.destinationKind, id: destinationId },
          reason: `Placed by move "${move.name}"`,
          moveId: move.id,
        });
      }
    }
  }
}
