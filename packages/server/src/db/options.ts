import 'reflect-metadata';
import type { DataSourceOptions } from 'typeorm';
import { ENTITIES } from '../entities/index';
import { MIGRATIONS } from './migrations/index';

/** How long a query waits for a pooled connection (or a new one) before failing as unavailable. */
export const CONNECT_TIMEOUT_MS = 5_000;

/**
 * Options of a DataSource on the given PostgreSQL URL. The schema comes from migrations only:
 * `synchronize` stays off everywhere, and no extension is created (the app's role may not).
 * `onPoolError` hears about idle connections the server ended (a restart): the pool drops them
 * and opens new ones on demand.
 */
export function dataSourceOptions(databaseUrl: string, poolSize = 10, onPoolError?: (error: Error) => void): DataSourceOptions {
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
    installExtensions: false,
    connectTimeoutMS: CONNECT_TIMEOUT_MS,
    ...(onPoolError ? { poolErrorHandler: onPoolError } : {}),
    extra: { max: poolSize, application_name: 'sheaf-server' },
  };
}
