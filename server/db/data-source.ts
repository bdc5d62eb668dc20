import 'reflect-metadata';
import type { Pool } from 'pg';
import { DataSource, type EntityManager } from 'typeorm';
import { entities } from './entities';
import { migrations } from './migrations';
import { SnakeNamingStrategy } from './snake-naming-strategy';

export interface DatabaseOptions {
  url: string;
  poolSize?: number;
  statementTimeoutMs?: number;
}

/**
 * A TypeORM data source over node-postgres with every timeout set, so an unreachable database
 * fails requests quickly (503) instead of hanging them.
 */
export function createDataSource({
  url,
  poolSize = 10,
  statementTimeoutMs = 10_000,
}: DatabaseOptions) {
  return new DataSource({
    type: 'postgres',
    url,
    entities,
    migrations,
    migrationsTableName: 'schema_migrations',
    synchronize: false,
    namingStrategy: new SnakeNamingStrategy(),
    poolSize,
    connectTimeoutMS: 2_000,
    extra: {
      connectionTimeoutMillis: 2_000,
      query_timeout: statementTimeoutMs + 1_000,
      statement_timeout: statementTimeoutMs,
      idle_in_transaction_session_timeout: 30_000,
      application_name: 'duskhaul',
    },
  });
}

/**
 * The node-postgres pool under a data source, for the few hot or foreign paths that skip
 * TypeORM's query runner (session store, job queue, per-request session lookup).
 */
export const pgPool = (db: DataSource): Pool => (db.driver as unknown as { master: Pool }).master;

/**
 * A hot read through a named (prepared) statement: PostgreSQL plans it once per connection
 * instead of on every request, which costs more than running it. Inside a transaction (an
 * EntityManager) it runs as a plain query on the transaction's connection. `name` must be unique
 * to `text`.
 */
export async function preparedRead<R>(
  db: DataSource | EntityManager,
  name: string,
  text: string,
  values: unknown[],
): Promise<R[]> {
  if (db instanceof DataSource) return (await pgPool(db).query({ name, text, values })).rows as R[];
  return db.query(text, values);
}
