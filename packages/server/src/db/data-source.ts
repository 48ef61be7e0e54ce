import { DataSource } from 'typeorm';
import { databaseUrlFromEnv } from '../config';
import { dataSourceOptions } from './options';

/**
 * The application's DataSource on DATABASE_URL. The only DataSource exported here, so the TypeORM
 * CLI can load this file (`typeorm migration:show -d src/db/data-source.ts`).
 */
export const AppDataSource = new DataSource(dataSourceOptions(databaseUrlFromEnv()));
