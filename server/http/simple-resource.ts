import type { DataSource, EntityManager, ObjectLiteral, SelectQueryBuilder } from 'typeorm';
import type { z } from 'zod';
import type { TenantRepository } from '../db/tenant-repository';
import { AppError } from '../errors/app-error';
import type { Actor } from '../middleware/authorise';
import type { Role } from '../../shared/schemas/users';
import { resourceRouter, type ResourceService } from './resource-router';

type Versioned = ObjectLiteral & { id: string; version: number };
type ListQuery = { limit: number; offset: number; archived: boolean };

interface SimpleResource<T extends Versioned, V> {
  repository: TenantRepository<T>;
  createSchema: z.ZodType<Record<string, unknown>>;
  updateSchema: z.ZodType<{ version: number } & Record<string, unknown>>;
  listSchema: z.ZodType<ListQuery>;
  readRoles: Role[];
  writeRoles: Role[];
  present: (record: T, actor: Actor) => V;
  defaultSort?: string;
  refineList?: (qb: SelectQueryBuilder<T>, query: ListQuery) => void;
  /** Fields holding ids of other records that must belong to the same operation. */
  references?: Array<{ field: string; repository: TenantRepository<Versioned> }>;
}

/**
 * A record with no rules beyond roles, validation, tenant-scoped references and versions
 * (hive setups, trucks, colony lots). Resources with more to them have their own services.
 */
export function simpleResourceRouter<T extends Versioned, V>(
  db: DataSource,
  resource: SimpleResource<T, V>,
) {
  const { repository, present } = resource;

  // A reference to another operation's record reads as "no such record" (400), never a link.
  const checkReferences = async (
    tx: EntityManager,
    actor: Actor,
    input: Record<string, unknown>,
  ) => {
    for (const { field, repository: referenced } of resource.references ?? []) {
      const value = input[field];
      if (typeof value !== 'string') continue;
      await referenced.get(tx, actor.operationId, value).catch(() => {
        throw AppError.validation([{ field, message: 'No such record.' }]);
      });
    }
  };

  const service: ResourceService<
    ListQuery,
    Record<string, unknown>,
    { version: number } & Record<string, unknown>
  > = {
    async list(actor, query) {
      const page = await repository.list(
        db,
        actor.operationId,
        { ...query, sort: resource.defaultSort ?? 'name' },
        (qb) => resource.refineList?.(qb, query),
      );
      return { items: page.items.map((r) => present(r, actor)), total: page.total };
    },
    async get(actor, id) {
      return present(await repository.get(db, actor.operationId, id), actor);
    },
    async create(actor, input) {
      const record = await db.transaction(async (tx) => {
        await checkReferences(tx, actor, input);
        return repository.insert(tx, actor.operationId, input as Partial<T>);
      });
      return present(record, actor);
    },
    async update(actor, id, { version, ...changes }) {
      const record = await db.transaction(async (tx) => {
        await checkReferences(tx, actor, changes);
        return repository.update(tx, actor.operationId, id, version, changes as Partial<T>);
      });
      return present(record, actor);
    },
    async archive(actor, id, version) {
      return present(
        await db.transaction((tx) => repository.archive(tx, actor.operationId, id, version)),
        actor,
      );
    },
  };
  return resourceRouter(service, resource);
}
