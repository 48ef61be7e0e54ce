import { migrationUrlFromEnv } from '../config';
import { migrateDatabase } from './migrateDatabase';

/**
 * `tsx packages/server/src/db/migrate.ts`: migrates the database as DATABASE_OWNER_URL's role (the
 * owner of the tables), or DATABASE_URL's when there is one role; exits non-zero on failure.
 */
function redact(url: string): string {
  return url.replace(/\/\/([^:@/]+):[^@/]*@/, '//$1:***@');
}

try {
  const url = migrationUrlFromEnv();
  const applied = await migrateDatabase(url);
  process.stdout.write(
    applied.length > 0
      ? `migrated ${redact(url)}: ${applied.join(', ')}\n`
      : `database ${redact(url)} is up to date\n`,
  );
} catch (error) {
  process.stderr.write(`migration failed: ${error instanceof Error ? error.message : String(error)}\n`);
  process.exit(1);
}
