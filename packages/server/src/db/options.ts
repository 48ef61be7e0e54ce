import 'reflect-metadata';
import type { DataSourceOptions } from 'typeorm';
import { ENTITIES } from '../entities/index';
import { MIGRATIONS } from './migrations/index';

/**
 * Options of a DataSource on the given PostgreSQL URL. The schema comes from migrations only:
 * `synchronize` stays off everywhere.
 */
export function dataSourceOptions(databaseUrl: string, poolSize = 10): DataSourceOptions {
  return {
    type: 'postgres',
    url: databaseUrl,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTableName: 'migrations',
    migrationsTransactionMode: 'each',
    synchronize: false,
    migrationsRun: false,
    logging: false,
    extra: { max: poolSize, application_name: 'sheaf-server' },
  };
}
