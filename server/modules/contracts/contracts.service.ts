import type { DataSource, EntityManager } from 'typeorm';
import type { z } from 'zod';
import { TenantRepository } from '../../db/tenant-repository';
import { AppError } from '../../errors/app-error';
import { isoOrNull } from '../../http/present';
import type { Actor } from '../../middleware/authorise';
import type {
  ContractCreateRequest,
  ContractUpdateRequest,
  contractListQuery,
} from '../../../shared/schemas/contracts';
import { growers } from '../growers/growers.service';
import { sites } from '../sites/sites.service';
import { Contract } from './contract.entity';
import { ContractEvent } from './contract-event.entity';

export const contracts = new TenantRepository(Contract, 'Contract');

/** A contract as each role may see it: crew get no money, growers no internal notes. */
export function presentContract(c: Contract, actor: Actor) {
  const money =
    actor.role === 'crew'
      ? {}
      : {
          feePerColonyCents: c.feePerColonyCents,
          depositCents: c.depositCents,
          frameAdjustmentCents: c.frameAdjustmentCents,
        };
  return {
    id: c.id,
    growerId: c.growerId,
    siteIds: c.siteIds,
    crop: c.crop,
    season: c.season,
    status: c.status,
    coloniesOrdered: c.coloniesOrdered,
    minFrames: c.minFrames,
    averageFrames: c.averageFrames,
    ...money,
    deliveryStartOn: c.deliveryStartOn,
    deliveryEndOn: c.deliveryEndOn,
    removalOn: c.removalOn,
    sprayNoticeHours: c.sprayNoticeHours,
    // Written terms often quote prices, so crew do not get them either.
    ...(actor.role === 'crew' ? {} : { terms: c.terms }),
    ...(actor.role === 'grower' ? {} : { internalNotes: c.internalNotes }),
    version: c.version,
    archivedAt: isoOrNull(c.archivedAt),
  };
}

/** Pollination contracts and their history. */
export class ContractsService {
  constructor(private readonly db: DataSource) {}

  /** The grower and sites must be this operation's, and the sites that grower's (or ownerless). */
  private async checkReferences(
    tx: EntityManager,
    actor: Actor,
    growerId: string,
    siteIds: string[],
  ) {
    await growers.get(tx, actor.operationId, growerId).catch(() => {
      throw AppError.validation([{ field: 'growerId', message: 'No such grower.' }]);
    });
    for (const [index, siteId] of siteIds.entries()) {
      const site = await sites.get(tx, actor.operationId, siteId).catch(() => null);
      if (!site)
        throw AppError.validation([{ field: `siteIds.${index}`, message: 'No such site.' }]);
      if (site.growerId && site.growerId !== growerId) {
        throw AppError.validation([
          { field: `siteIds.${index}`, message: 'This site belongs to another grower.' },
        ]);
      }
    }
  }

  private record(
    tx: EntityManager,
    actor: Actor,
    contractId: string,
    kind: string,
    detail: Record<string, unknown> = {},
  ) {
    return tx.getRepository(ContractEvent).insert({
      operationId: actor.operationId,
      contractId,
      kind,
      detail: detail as never,
      actorUserId: actor.id,
      occurredAt: new Date(),
    });
  }

  async list(actor: Actor, query: z.infer<typeof contractListQuery>) {
    const page = await contracts.list(this.db, actor.operationId, query, (qb) => {
      if (actor.role === 'grower') qb.andWhere('record.growerId = :own', { own: actor.growerId });
      if (query.growerId) qb.andWhere('record.growerId = :growerId', { growerId: query.growerId });
      if (query.status) qb.andWhere('record.status = :status', { status: query.status });
      if (query.crop) qb.andWhere('record.crop = :crop', { crop: query.crop });
      if (query.season) qb.andWhere('record.season = :season', { season: query.season });
    });
    return { items: page.items.map((c) => presentContract(c, actor)), total: page.total };
  }

  async get(actor: Actor, id: string) {
    const contract = await contracts.get(this.db, actor.operationId, id);
    if (actor.role === 'grower' && contract.growerId !== actor.growerId)
      throw AppError.notFound('Contract');
    return presentContract(contract, actor);
  }

  /** The contract's history, oldest first. */
  async history(actor: Actor, id: string) {
    await this.get(actor, id);
    const events = await this.db.getRepository(ContractEvent).find({
      where: { operationId: actor.operationId, contractId: id },
      order: { occurredAt: 'ASC' },
    });
    return {
      items: events.map((e) => ({
        id: e.id,
        kind: e.kind,
        detail: e.detail,
        occurredAt: e.occurredAt.toISOString(),
      })),
    };
  }

  async create(actor: Actor, input: ContractCreateRequest) {
    return this.db.transaction(async (tx) => {
      await this.checkReferences(tx, actor, input.growerId, input.siteIds ?? []);
      const contract = await contracts.insert(tx, actor.operationId, { status: 'draft', ...input });
      await this.record(tx, actor, contract.id, 'created', { status: contract.status });
      return presentContract(contract, actor);
    });
  }

  async update(actor: Actor, id: string, { version, ...changes }: ContractUpdateRequest) {
    return this.db.transaction(async (tx) => {
      const before = await contracts.get(tx, actor.operationId, id);
      await this.checkReferences(
        tx,
        actor,
        changes.growerId ?? before.growerId,
        changes.siteIds ?? before.siteIds,
      );
      const after = await contracts.update(tx, actor.operationId, id, version, changes);
      const changed = Object.keys(changes).filter(
        (k) =>
          JSON.stringify(before[k as keyof Contract]) !==
          JSON.stringify(after[k as keyof Contract]),
      );
      if (before.status !== after.status)
        await this.record(tx, actor, id, 'status-changed', {
          from: before.status,
          to: after.status,
        });
      if (changed.some((k) => k !== 'status'))
        await this.record(tx, actor, id, 'edited', {
          fields: changed.filter((k) => k !== 'status'),
        });
      return presentContract(after, actor);
    });
  }

  async archive(actor: Actor, id: string, version: number) {
    return this.db.transaction(async (tx) => {
      const contract = await contracts.archive(tx, actor.operationId, id, version);
      await this.record(tx, actor, id, 'archived');
      return presentContract(contract, actor);
    });
  }
}
