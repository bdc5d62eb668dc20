import type {
  DataSource,
  EntityManager,
  EntityTarget,
  ObjectLiteral,
  SelectQueryBuilder,
} from 'typeorm';
import type { ListResult } from '../../shared/schemas/common';
import { AppError } from '../errors/app-error';

export interface ListOptions {
  limit: number;
  offset: number;
  archived?: boolean;
  sort?: string;
  order?: 'asc' | 'desc';
}

type Db = DataSource | EntityManager;

/**
 * Reads and writes one kind of tenant-owned, versioned record. Every query is scoped to the
 * operation; every update checks the version in its WHERE clause (TypeORM's save() does not).
 */
export class TenantRepository<T extends ObjectLiteral & { id: string; version: number }> {
  /**
   * `listColumns`: the columns a list needs, when fewer than all. Reading and hydrating only
   * those is most of a long list's cost (timestamps especially).
   */
  constructor(
    private readonly entity: EntityTarget<T>,
    private readonly label: string,
    private readonly listColumns?: ReadonlyArray<keyof T & string>,
  ) {}

  query(db: Db, operationId: string, alias = 'record'): SelectQueryBuilder<T> {
    return db
      .getRepository(this.entity)
      .createQueryBuilder(alias)
      .where(`${alias}.operationId = :operationId`, { operationId });
  }

  /** A page of records, newest filters applied by `refine`, with the total before paging. */
  async list(
    db: Db,
    operationId: string,
    options: ListOptions,
    refine?: (qb: SelectQueryBuilder<T>) => void,
  ): Promise<ListResult<T>> {
    const qb = this.query(db, operationId);
    if (this.listColumns) qb.select(this.listColumns.map((column) => `record.${column}`));
    if (!options.archived) qb.andWhere('record.archivedAt IS NULL');
    refine?.(qb);
    if (options.sort)
      qb.orderBy(`record.${options.sort}`, options.order === 'desc' ? 'DESC' : 'ASC', 'NULLS LAST');
    qb.addOrderBy('record.id', 'ASC').limit(options.limit).offset(options.offset);
    // The total rides along on each row (one query, not getManyAndCount's two); a page past the
    // end has no rows to carry it, so only then is it counted on its own.
    qb.addSelect('COUNT(*) OVER ()', 'list_total');
    const { entities, raw } = await qb.getRawAndEntities<{ list_total: string }>();
    const total = raw.length > 0 ? Number(raw[0].list_total) : await qb.getCount();
    return { items: entities, total };
  }

  /** The record, or a 404 (also for another operation's record). */
  async get(db: Db, operationId: string, id: string, lock = false): Promise<T> {
    const qb = this.query(db, operationId).andWhere('record.id = :id', { id });
    if (lock) qb.setLock('pessimistic_write');
    const found = await qb.getOne();
    if (!found) throw AppError.notFound(this.label);
    return found;
  }

  async insert(db: Db, operationId: string, values: Partial<T>): Promise<T> {
    const result = await db
      .getRepository(this.entity)
      .createQueryBuilder()
      .insert()
      .values({ ...values, operationId, version: 1 } as never)
      .returning('id')
      .execute();
    return this.get(db, operationId, result.identifiers[0].id as string);
  }

  /** Applies `values` when the stored version is `version`; 409 when it is not, 404 when gone. */
  async update(
    db: Db,
    operationId: string,
    id: string,
    version: number,
    values: Partial<T>,
  ): Promise<T> {
    const set = Object.fromEntries(Object.entries(values).filter(([, v]) => v !== undefined));
    const result = await db
      .getRepository(this.entity)
      .createQueryBuilder()
      .update()
      .set({ ...set, version: () => 'version + 1' } as never)
      .where(
        'id = :id AND operation_id = :operationId AND version = :version AND archived_at IS NULL',
        {
          id,
          operationId,
          version,
        },
      )
      .execute();
    if (result.affected !== 1) await this.explainMissedWrite(db, operationId, id);
    return this.get(db, operationId, id);
  }

  /** Archives (never deletes) the record at `version`. */
  async archive(db: Db, operationId: string, id: string, version: number): Promise<T> {
    const result = await db
      .getRepository(this.entity)
      .createQueryBuilder()
      .update()
      .set({ archivedAt: () => 'now()', version: () => 'version + 1' } as never)
      .where(
        'id = :id AND operation_id = :operationId AND version = :version AND archived_at IS NULL',
        {
          id,
          operationId,
          version,
        },
      )
      .execute();
    if (result.affected !== 1) await this.explainMissedWrite(db, operationId, id);
    return this.get(db, operationId, id);
  }

  private async explainMissedWrite(db: Db, operationId: string, id: string): Promise<never> {
    const current = await this.get(db, operationId, id);
    if ((current as { archivedAt?: Date | null }).archivedAt) {
      throw new AppError(409, 'conflict', `This ${this.label.toLowerCase()} is archived.`);
    }
    throw AppError.staleVersion(current.version);
  }
}
