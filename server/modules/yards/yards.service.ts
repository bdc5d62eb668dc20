import type { DataSource } from 'typeorm';
import type { Actor } from '../../middleware/authorise';
import { TenantRepository } from '../../db/tenant-repository';
import { isoOrNull } from '../../http/present';
import type { ColonyCount } from '../../../shared/schemas/ledger';
import type {
  YardCreateRequest,
  YardListQuery,
  YardUpdateRequest,
  YardView,
} from '../../../shared/schemas/yards';
import { LedgerRepository } from '../ledger/ledger.repository';
import { today } from '../ledger/ledger.service';
import { Yard } from './yard.entity';

const yards = new TenantRepository(Yard, 'Yard');
const ledger = new LedgerRepository();

function present(yard: Yard, counts: ColonyCount[]): YardView {
  const here = counts.filter((c) => c.placeKind === 'yard' && c.placeId === yard.id);
  const bySetup = new Map<
    string,
    { hiveSetupId: string; hiveSetupName: string; colonies: number }
  >();
  for (const c of here) {
    const entry = bySetup.get(c.hiveSetupId) ?? {
      hiveSetupId: c.hiveSetupId,
      hiveSetupName: c.hiveSetupName,
      colonies: 0,
    };
    entry.colonies += c.colonies;
    bySetup.set(c.hiveSetupId, entry);
  }
  return {
    id: yard.id,
    name: yard.name,
    latitude: yard.latitude,
    longitude: yard.longitude,
    capacity: yard.capacity,
    accessNotes: yard.accessNotes,
    notes: yard.notes,
    lastVisitOn: yard.lastVisitOn,
    version: yard.version,
    archivedAt: isoOrNull(yard.archivedAt),
    colonies: here.reduce((sum, c) => sum + c.colonies, 0),
    coloniesBySetup: [...bySetup.values()],
  };
}

/** Holding yards with their colonies from the ledger. */
export class YardsService {
  constructor(private readonly db: DataSource) {}

  private counts(actor: Actor) {
    return ledger.countsOn(this.db, actor.operationId, today(), { kind: 'yard' });
  }

  async list(actor: Actor, query: YardListQuery) {
    const page = await yards.list(this.db, actor.operationId, query, (qb) => {
      if (query.q)
        qb.andWhere('record.name ILIKE :q', { q: `%${query.q.replace(/[%_\\]/g, '\\$&')}%` });
    });
    const counts = await this.counts(actor);
    return { items: page.items.map((y) => present(y, counts)), total: page.total };
  }

  async get(actor: Actor, id: string) {
    return present(await yards.get(this.db, actor.operationId, id), await this.counts(actor));
  }

  async create(actor: Actor, input: YardCreateRequest) {
    const yard = await this.db.transaction((tx) => yards.insert(tx, actor.operationId, input));
    return present(yard, []);
  }

  async update(actor: Actor, id: string, { version, ...changes }: YardUpdateRequest) {
    const yard = await this.db.transaction((tx) =>
      yards.update(tx, actor.operationId, id, version, changes),
    );
    return present(yard, await this.counts(actor));
  }

  async archive(actor: Actor, id: string, version: number) {
    const yard = await this.db.transaction((tx) =>
      yards.archive(tx, actor.operationId, id, version),
    );
    return present(yard, await this.counts(actor));
  }
}
