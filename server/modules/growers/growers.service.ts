import type { DataSource, EntityManager } from 'typeorm';
import { TenantRepository } from '../../db/tenant-repository';
import { AppError } from '../../errors/app-error';
import { isoOrNull } from '../../http/present';
import type { Actor } from '../../middleware/authorise';
import type { GrowerContactInput, GrowerCreateRequest } from '../../../shared/schemas/growers';
import type { growerListQuery, growerUpdateRequest } from '../../../shared/schemas/growers';
import type { z } from 'zod';
import { Grower } from './grower.entity';
import { GrowerContact } from './grower-contact.entity';

export const growers = new TenantRepository(Grower, 'Grower');

function present(grower: Grower, contacts: GrowerContact[], actor: Actor) {
  return {
    id: grower.id,
    name: grower.name,
    billingAddress: grower.billingAddress,
    // The operation's own notes about a customer never reach the customer.
    ...(actor.role === 'grower' ? {} : { internalNotes: grower.internalNotes }),
    contacts: contacts
      .filter((c) => c.growerId === grower.id)
      .sort((a, b) => a.position - b.position)
      .map((c) => ({ id: c.id, name: c.name, email: c.email, phone: c.phone, title: c.title })),
    version: grower.version,
    archivedAt: isoOrNull(grower.archivedAt),
  };
}

/** Growers and their contacts; a grower user sees only their own grower. */
export class GrowersService {
  constructor(private readonly db: DataSource) {}

  private contactsOf(db: DataSource | EntityManager, operationId: string, growerIds: string[]) {
    if (growerIds.length === 0) return Promise.resolve([] as GrowerContact[]);
    return db
      .getRepository(GrowerContact)
      .createQueryBuilder('c')
      .where('c.operationId = :operationId AND c.growerId IN (:...growerIds)', {
        operationId,
        growerIds,
      })
      .getMany();
  }

  async list(actor: Actor, query: z.infer<typeof growerListQuery>) {
    const page = await growers.list(this.db, actor.operationId, query, (qb) => {
      if (actor.role === 'grower') qb.andWhere('record.id = :own', { own: actor.growerId });
      if (query.q)
        qb.andWhere('record.name ILIKE :q', { q: `%${query.q.replace(/[%_\\]/g, '\\$&')}%` });
    });
    const contacts = await this.contactsOf(
      this.db,
      actor.operationId,
      page.items.map((g) => g.id),
    );
    return { items: page.items.map((g) => present(g, contacts, actor)), total: page.total };
  }

  async get(actor: Actor, id: string) {
    if (actor.role === 'grower' && id !== actor.growerId) throw AppError.notFound('Grower');
    const grower = await growers.get(this.db, actor.operationId, id);
    return present(grower, await this.contactsOf(this.db, actor.operationId, [id]), actor);
  }

  async create(actor: Actor, { contacts = [], ...fields }: GrowerCreateRequest) {
    return this.db.transaction(async (tx) => {
      const grower = await growers.insert(tx, actor.operationId, fields);
      await this.replaceContacts(tx, actor.operationId, grower.id, contacts);
      return present(grower, await this.contactsOf(tx, actor.operationId, [grower.id]), actor);
    });
  }

  async update(
    actor: Actor,
    id: string,
    { version, contacts, ...fields }: z.infer<typeof growerUpdateRequest>,
  ) {
    return this.db.transaction(async (tx) => {
      const grower = await growers.update(tx, actor.operationId, id, version, fields);
      if (contacts) await this.replaceContacts(tx, actor.operationId, id, contacts);
      return present(grower, await this.contactsOf(tx, actor.operationId, [id]), actor);
    });
  }

  async archive(actor: Actor, id: string, version: number) {
    const grower = await this.db.transaction((tx) =>
      growers.archive(tx, actor.operationId, id, version),
    );
    return present(grower, await this.contactsOf(this.db, actor.operationId, [id]), actor);
  }

  /** Contacts are edited as a list: the list sent replaces the old one. */
  private async replaceContacts(
    tx: EntityManager,
    operationId: string,
    growerId: string,
    contacts: GrowerContactInput[],
  ) {
    await tx.getRepository(GrowerContact).delete({ operationId, growerId });
    if (contacts.length === 0) return;
    await tx.getRepository(GrowerContact).insert(
      contacts.map((c, position) => ({
        operationId,
        growerId,
        name: c.name,
        email: c.email ?? null,
        phone: c.phone ?? null,
        title: c.title ?? '',
        position,
      })),
    );
  }
}
