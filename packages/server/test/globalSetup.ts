import { randomBytes } from 'node:crypto';
import pg from 'pg';
import type { TestProject } from 'vitest/node';
import { migrateDatabase } from '../src/db/migrateDatabase';

declare module 'vitest' {
  export interface ProvidedContext {
    /** The migrated database the tests of this run share. */
    databaseUrl: string;
    /** A maintenance connection that may create and drop databases. */
    adminUrl: string;
  }
}

export const DEFAULT_ADMIN_URL = 'postgres://postgres@127.0.0.1:55432/postgres';

function withDatabase(url: string, database: string): string {
  const parsed = new URL(url);
  parsed.pathname = `/${database}`;
  return parsed.toString();
}

/**
 * Uses DATABASE_URL when the caller gives one (the root `npm test` makes a fresh database per
 * run); otherwise creates `sheaf_test_<random>` through SHEAF_PG_ADMIN_URL and drops it after
 * the run. Either way the migrations run first.
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const adminUrl = process.env.SHEAF_PG_ADMIN_URL ?? DEFAULT_ADMIN_URL;
  let databaseUrl = process.env.DATABASE_URL;
  let created: string | null = null;
  if (!databaseUrl) {
    created = `sheaf_test_${randomBytes(6).toString('hex')}`;
    const admin = new pg.Client({ connectionString: adminUrl });
    await admin.connect();
    try {
      await admin.query(`CREATE DATABASE ${created}`);
    } finally {
      await admin.end();
    }
    databaseUrl = withDatabase(adminUrl, created);
  }
  await migrateDatabase(databaseUrl);
  project.provide('databaseUrl', databaseUrl);
  project.provide('adminUrl', adminUrl);

  return async () => {
    if (!created) return;
    const admin = new pg.Client({ connectionString: adminUrl });
    await admin.connect();
    try {
      await admin.query(`DROP DATABASE IF EXISTS ${created} WITH (FORCE)`);
    } finally {
      await admin.end();
    }
  };
}
