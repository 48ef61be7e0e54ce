import pg from 'pg';
import { inject } from 'vitest';

/**
 * Runs SQL as the role that owns the tables (what migrations run as): for tests that must do
 * what the app's own role may not, such as adding a trigger.
 */
export async function asOwner<T = unknown>(sql: string, params: unknown[] = []): Promise<T[]> {
  const client = new pg.Client({ connectionString: inject('ownerDatabaseUrl') });
  await client.connect();
  try {
    return (await client.query(sql, params)).rows as T[];
  } finally {
    await client.end();
  }
}
