import { randomBytes } from 'node:crypto';
import pg from 'pg';
import type { TestProject } from 'vitest/node';
import { setUpRoles } from '../../../scripts/lib/databaseRoles.mjs';
import { migrateDatabase } from '../src/db/migrateDatabase';

declare module 'vitest' {
  export interface ProvidedContext {
    /** The migrated database the tests of this run share, as the app's role. */
    databaseUrl: string;
    /** The same database as the role that owns its tables (migrations run as it). */
    ownerDatabaseUrl: string;
    /** A maintenance connection that may create and drop databases. */
    adminUrl: string;
  }
}

/** The project cluster's maintenance database, on PGPORT. */
export function defaultAdminUrl(): string {
  return `postgres://postgres@127.0.0.1:${process.env.PGPORT || '55432'}/postgres`;
}

/**
 * Uses DATABASE_URL (the app's role) and DATABASE_OWNER_URL when the caller gives them (the root
 * `npm test` makes a fresh database per run); otherwise creates `sheaf_test_<random>` through
 * SHEAF_PG_ADMIN_URL with the owner and app roles, and drops it after the run. Either way the
 * migrations run first, as the owner.
 */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const adminUrl = process.env.SHEAF_PG_ADMIN_URL ?? defaultAdminUrl();
  let databaseUrl = process.env.DATABASE_URL;
  let ownerDatabaseUrl = process.env.DATABASE_OWNER_URL ?? databaseUrl;
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
    const roles = await setUpRoles(adminUrl, created);
    databaseUrl = roles.appUrl;
    ownerDatabaseUrl = roles.ownerUrl;
  }
  await migrateDatabase(ownerDatabaseUrl!);
  project.provide('databaseUrl', databaseUrl);
  project.provide('ownerDatabaseUrl', ownerDatabaseUrl!);
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
