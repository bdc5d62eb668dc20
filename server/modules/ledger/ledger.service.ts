import type { DataSource, EntityManager } from 'typeorm';
import { format } from 'date-fns';
import type { z } from 'zod';
import { AppError } from '../../errors/app-error';
import type { Actor } from '../../middleware/authorise';
import type {
  ColonyCount,
  LedgerEntryCreateRequest,
  ledgerListQuery,
  Place,
} from '../../../shared/schemas/ledger';
import { TenantRepository } from '../../db/tenant-repository';
import { ColonyLot } from '../colony-lots/colony-lot.entity';
import { LedgerEntry } from './ledger-entry.entity';
import { LedgerRepository } from './ledger.repository';

/** Today's date in the server's calendar, YYYY-MM-DD. */
export const today = () => format(new Date(), 'yyyy-MM-dd');

const lots = new TenantRepository(ColonyLot, 'Colony lot');

/** The colony ledger: record entries, list them, count colonies by place on a date. */
export class LedgerService {
  readonly repository = new LedgerRepository();

  constructor(private readonly db: DataSource) {}

  async list(actor: Actor, query: z.infer<typeof ledgerListQuery>) {
    const qb = this.db
      .getRepository(LedgerEntry)
      .createQueryBuilder('entry')
      .where('entry.operationId = :op', { op: actor.operationId });
    if (query.lotId) qb.andWhere('entry.lotId = :lotId', { lotId: query.lotId });
    if (query.kind) qb.andWhere('entry.kind = :kind', { kind: query.kind });
    if (query.from) qb.andWhere('entry.occurredOn >= :from', { from: query.from });
    if (query.to) qb.andWhere('entry.occurredOn <= :to', { to: query.to });
    if (query.placeId) {
      qb.andWhere('(entry.fromId = :placeId OR entry.toId = :placeId)', { placeId: query.placeId });
    }
    if (query.placeKind) {
      qb.andWhere('(entry.fromKind = :placeKind OR entry.toKind = :placeKind)', {
        placeKind: query.placeKind,
      });
    }
    qb.orderBy('entry.occurredOn', 'DESC')
      .addOrderBy('entry.createdAt', 'DESC')
      .take(query.limit)
      .skip(query.offset);
    const [items, total] = await qb.getManyAndCount();
    return { items: items.map(presentEntry), total };
  }

  async get(actor: Actor, id: string) {
    const entry = await this.db
      .getRepository(LedgerEntry)
      .findOneBy({ id, operationId: actor.operationId });
    if (!entry) throw AppError.notFound('Ledger entry');
    return presentEntry(entry);
  }

  counts(
    actor: Actor,
    on = today(),
    place?: { kind?: Place['kind']; id?: string },
  ): Promise<ColonyCount[]> {
    return this.repository.countsOn(this.db, actor.operationId, on, place);
  }

  /** Records one entry in its own transaction. */
  create(actor: Actor, input: LedgerEntryCreateRequest) {
    return this.db.transaction((tx) => this.record(tx, actor, input).then(presentEntry));
  }

  /**
   * Appends an entry inside the caller's transaction, after checking the places and that no count
   * goes below zero on that date or after. Moves and placements call this too.
   */
  async record(
    tx: EntityManager,
    actor: Actor,
    input: LedgerEntryCreateRequest & { moveId?: string },
  ): Promise<LedgerEntry> {
    await lots.get(tx, actor.operationId, input.lotId).catch(() => {
      throw AppError.validation([{ field: 'lotId', message: 'No such colony lot.' }]);
    });
    for (const side of ['from', 'to'] as const) {
      const place = input[side];
      if (place && !(await this.repository.placeExists(tx, actor.operationId, place))) {
        throw AppError.validation([{ field: `${side}.id`, message: `No such ${place.kind}.` }]);
      }
    }
    await this.repository.lockLot(tx, actor.operationId, input.lotId);
    if (input.from) {
      const available = await this.repository.lowestBalanceFrom(
        tx,
        actor.operationId,
        input.lotId,
        input.from,
        input.occurredOn,
      );
      if (available < input.colonies) {
        throw new AppError(
          409,
          'conflict',
          `Only ${available} colonies of this lot are there on ${input.occurredOn} (or later); ${input.colonies} cannot leave.`,
          {
            available,
          },
        );
      }
    }
    const saved = await tx.getRepository(LedgerEntry).save(
      tx.getRepository(LedgerEntry).create({
        operationId: actor.operationId,
        lotId: input.lotId,
        kind: input.kind,
        occurredOn: input.occurredOn,
        colonies: input.colonies,
        fromKind: input.from?.kind ?? null,
        fromId: input.from?.id ?? null,
        toKind: input.to?.kind ?? null,
        toId: input.to?.id ?? null,
        reason: input.reason,
        moveId: input.moveId ?? null,
        recordedBy: actor.id,
      }),
    );
    return saved;
  }
}

export function presentEntry(entry: LedgerEntry) {
  return {
    id: entry.id,
    lotId: entry.lotId,
    kind: entry.kind,
    occurredOn: entry.occurredOn,
    colonies: entry.colonies,
    from: entry.fromId ? { kind: entry.fromKind, id: entry.fromId } : null,
    to: entry.toId ? { kind: entry.toKind, id: entry.toId } : null,
    reason: entry.reason,
    moveId: entry.moveId,
    recordedBy: entry.recordedBy,
    createdAt: entry.createdAt.toISOString(),
  };
}
