import { databaseUrlFromEnv } from '../config';
import { migrateDatabase } from './migrateDatabase';

/** `tsx packages/server/src/db/migrate.ts`: migrates DATABASE_URL; exits non-zero on failure. */
function redact(url: string): string {
  return url.replace(/\/\/([^:@/]+):[^@/]*@/, '//$1:***@');
}

try {
  const url = databaseUrlFromEnv();
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
