/**
 * The database a benchmark runs against: DATABASE_URL when set, otherwise a throwaway database
 * made through SHEAF_PG_ADMIN_URL (default: the project-local cluster on PGPORT), migrated, and
 * dropped by `drop()`.
 */
import { randomBytes } from 'node:crypto';
import pg from 'pg';
import { migrateDatabase } from '../../src/db/migrateDatabase';

export interface BenchDatabase {
  /** Where the server connects. */
  url: string;
  drop(): Promise<void>;
}

function defaultAdminUrl(): string {
  return `postgres://postgres@127.0.0.1:${process.env.PGPORT ?? '55432'}/postgres`;
}

async function adminQuery(adminUrl: string, sql: string): Promise<void> {
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  try {
    await admin.query(sql);
  } finally {
    await admin.end();
  }
}

export async function openBenchDatabase(prefix: string): Promise<BenchDatabase> {
  if (process.env.DATABASE_URL) {
    await migrateDatabase(process.env.DATABASE_URL);
    return { url: process.env.DATABASE_URL, drop: async () => undefined };
  }
  const adminUrl = process.env.SHEAF_PG_ADMIN_URL ?? defaultAdminUrl();
  const name = `${prefix}_${randomBytes(6).toString('hex')}`;
  await adminQuery(adminUrl, `CREATE DATABASE ${name}`);
  const parsed = new URL(adminUrl);
  parsed.pathname = `/${name}`;
  const url = parsed.toString();
  await migrateDatabase(url);
  return { url, drop: () => adminQuery(adminUrl, `DROP DATABASE IF EXISTS ${name} WITH (FORCE)`) };
}
