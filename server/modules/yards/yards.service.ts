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

// A list reads only what a yard's view shows.
const yards = new TenantRepository(Yard, 'Yard', [
  'id',
  'name',
  'latitude',
  'longitude',
  'capacity',
  'accessNotes',
  'notes',
  'lastVisitOn',
  'version',
  'archivedAt',
]);
const ledger = new LedgerRepository();

type SetupCount = YardView['coloniesBySetup'][number];

/** Colonies by hive setup from per-lot counts (a yard holds lots of several setups). */
function bySetup(counts: ColonyCount[]): SetupCount[] {
  const setups = new Map<string, SetupCount>();
  for (const c of counts) {
    const entry = setups.get(c.hiveSetupId) ?? {
      hiveSetupId: c.hiveSetupId,
      hiveSetupName: c.hiveSetupName,
      colonies: 0,
    };
    entry.colonies += c.colonies;
    setups.set(c.hiveSetupId, entry);
  }
  return [...setups.values()].sort((a, b) => a.hiveSetupName.localeCompare(b.hiveSetupName));
}

function present(yard: Yard, coloniesBySetup: SetupCount[]): YardView {
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
    colonies: coloniesBySetup.reduce((sum, c) => sum + c.colonies, 0),
    coloniesBySetup,
  };
}

/** Holding yards with their colonies from the ledger. */
export class YardsService {
  constructor(private readonly db: DataSource) {}

  /** Today's colonies of one yard by hive setup. */
  private async setupsAt(actor: Actor, id: string) {
    return bySetup(
      await ledger.countsOn(this.db, actor.operationId, today(), { kind: 'yard', id }),
    );
  }

  async list(actor: Actor, query: YardListQuery) {
    const page = await yards.list(this.db, actor.operationId, query, (qb) => {
      if (query.q)
        qb.andWhere('record.name ILIKE :q', { q: `%${query.q.replace(/[%_\\]/g, '\\$&')}%` });
    });
    // Every yard's counts in one read of the running balances: cheaper than picking out the
    // page's yards, and a page is most of an operation's yards.
    const counts = await ledger.countsOn(this.db, actor.operationId, today(), { kind: 'yard' });
    const byYard = new Map<string, ColonyCount[]>();
    for (const c of counts) {
      const here = byYard.get(c.placeId);
      if (here) here.push(c);
      else byYard.set(c.placeId, [c]);
    }
    return {
      items: page.items.map((y) => present(y, bySetup(byYard.get(y.id) ?? []))),
      total: page.total,
    };
  }

  async get(actor: Actor, id: string) {
    const yard = await yards.get(this.db, actor.operationId, id);
    return present(yard, await this.setupsAt(actor, yard.id));
  }

  async create(actor: Actor, input: YardCreateRequest) {
    const yard = await this.db.transaction((tx) => yards.insert(tx, actor.operationId, input));
    return present(yard, []);
  }

  async update(actor: Actor, id: string, { version, ...changes }: YardUpdateRequest) {
    const yard = await this.db.transaction((tx) =>
      yards.update(tx, actor.operationId, id, version, changes),
    );
    return present(yard, await this.setupsAt(actor, yard.id));
  }

  async archive(actor: Actor, id: string, version: number) {
    const yard = await this.db.transaction((tx) =>
      yards.archive(tx, actor.operationId, id, version),
    );
    return present(yard, await this.setupsAt(actor, yard.id));
  }
}
