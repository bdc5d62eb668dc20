import 'reflect-metadata';
import { DataSource } from 'typeorm';
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
