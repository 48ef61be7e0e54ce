import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { dataSourceOptions } from './options';

/** Runs every pending migration on the database, each in its own transaction; returns their names. */
export async function migrateDatabase(databaseUrl: string): Promise<string[]> {
  const dataSource = new DataSource(dataSourceOptions(databaseUrl, 2));
  await dataSource.initialize();
  try {
    const applied = await dataSource.runMigrations({ transaction: 'each' });
    return applied.map((m) => m.name);
  } finally {
    await dataSource.destroy();
  }
}
