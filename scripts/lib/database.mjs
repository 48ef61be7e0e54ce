// Chooses the database: DATABASE_URL when set, otherwise the project-local cluster; sets up the
// owner and app roles where it may.
// Runs after the npm packages are installed, so it may use the `pg` driver.
import { setUpRoles, withDatabase } from './databaseRoles.mjs';
import { step } from './log.mjs';
import { startCluster } from './postgres.mjs';

/** Splits a postgres URL into its database name and a URL of the same server's `postgres` database. */
export function splitDatabaseUrl(url) {
  const parsed = new URL(url);
  const name = decodeURIComponent(parsed.pathname.replace(/^\//, '')) || 'postgres';
  parsed.pathname = '/postgres';
  return { name, adminUrl: parsed.toString() };
}

async function adminQuery(adminUrl, sql) {
  const { default: pg } = await import('pg');
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try {
    return await client.query(sql);
  } finally {
    await client.end();
  }
}

function quoteIdent(name) {
  if (!/^[A-Za-z0-9_]+$/.test(name)) throw new Error(`database name "${name}" may hold only letters, digits and _`);
  return `"${name}"`;
}

export async function createDatabaseIfMissing(adminUrl, name) {
  const found = await adminQuery(adminUrl, `SELECT 1 FROM pg_database WHERE datname = '${name}'`);
  if (found.rowCount === 0) await adminQuery(adminUrl, `CREATE DATABASE ${quoteIdent(name)}`);
}

export async function dropDatabase(adminUrl, name) {
  await adminQuery(adminUrl, `DROP DATABASE IF EXISTS ${quoteIdent(name)} WITH (FORCE)`);
}

/**
 * Returns {url, ownerUrl, adminUrl, name, startedHere}: `url` is what the app connects as (the
 * app role), `ownerUrl` what migrations run as (the owner role).
 *
 * Without DATABASE_URL: the project cluster (started when needed); the database is created when
 * missing and given the two roles (scripts/lib/databaseRoles.mjs).
 * With DATABASE_URL: that server; nothing is installed or started. `databaseName` picks another
 * database on it (test runs use a throwaway one), created when missing and given the two roles
 * when DATABASE_URL's role may do so. Otherwise DATABASE_URL is the app's connection and
 * DATABASE_OWNER_URL (default: DATABASE_URL) the migrations' one; `npm run db:roles` sets the
 * roles up on a managed database.
 */
export async function prepareDatabase(root, { databaseName } = {}) {
  if (process.env.DATABASE_URL) {
    const serverUrl = process.env.DATABASE_URL;
    const { name: defaultName, adminUrl } = splitDatabaseUrl(serverUrl);
    const name = databaseName ?? defaultName;
    if (databaseName === undefined) {
      return { url: serverUrl, ownerUrl: process.env.DATABASE_OWNER_URL || serverUrl, adminUrl, name, startedHere: false };
    }
    await createDatabaseIfMissing(adminUrl, name);
    try {
      const { ownerUrl, appUrl } = await setUpRoles(adminUrl, name);
      return { url: appUrl, ownerUrl, adminUrl, name, startedHere: false };
    } catch (error) {
      step(`could not create the database roles through DATABASE_URL (${error.message}); the tests connect as its role`);
      const url = withDatabase(serverUrl, name);
      return { url, ownerUrl: url, adminUrl, name, startedHere: false };
    }
  }
  const cluster = await startCluster(root);
  const name = databaseName ?? 'sheaf';
  await createDatabaseIfMissing(cluster.adminUrl, name);
  const { ownerUrl, appUrl } = await setUpRoles(cluster.adminUrl, name);
  return { url: appUrl, ownerUrl, adminUrl: cluster.adminUrl, name, startedHere: cluster.startedHere };
}
