// Chooses the database: DATABASE_URL when set, otherwise the project-local cluster.
// Runs after the npm packages are installed, so it may use the `pg` driver.
import { startCluster } from './postgres.mjs';

/** Splits a postgres URL into its database name and a URL of the same server's `postgres` database. */
export function splitDatabaseUrl(url) {
  const parsed = new URL(url);
  const name = decodeURIComponent(parsed.pathname.replace(/^\//, '')) || 'postgres';
  parsed.pathname = '/postgres';
  return { name, adminUrl: parsed.toString() };
}

function withDatabase(url, name) {
  const parsed = new URL(url);
  parsed.pathname = `/${encodeURIComponent(name)}`;
  return parsed.toString();
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
 * Returns {url, adminUrl, name, startedHere}. With DATABASE_URL set, that server is used and
 * nothing is installed or started. `databaseName` picks another database on the same server
 * (test runs use a throwaway one), created when missing.
 */
export async function prepareDatabase(root, { databaseName } = {}) {
  let serverUrl;
  let startedHere = false;
  if (process.env.DATABASE_URL) {
    serverUrl = process.env.DATABASE_URL;
  } else {
    const cluster = startCluster(root);
    serverUrl = `${cluster.base}/sheaf`;
    startedHere = cluster.startedHere;
  }
  const { name: defaultName, adminUrl } = splitDatabaseUrl(serverUrl);
  const name = databaseName ?? defaultName;
  await createDatabaseIfMissing(adminUrl, name);
  return { url: withDatabase(serverUrl, name), adminUrl, name, startedHere };
}
