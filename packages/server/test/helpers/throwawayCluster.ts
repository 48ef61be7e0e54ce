/**
 * A PostgreSQL cluster of a test's own, in a temporary folder on a free port, so the test can stop
 * and restart it without disturbing other test files that share the run's cluster. Made with the
 * same bootstrap as `npm start` (scripts/lib/postgres.mjs): Debian's server binaries, run as the
 * `postgres` user when the tests run as root.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import { setUpRoles } from '../../../../scripts/lib/databaseRoles.mjs';
import { controlClusterIn, giveToServerUser, startClusterIn, stopClusterIn } from '../../../../scripts/lib/postgres.mjs';
import { migrateDatabase } from '../../src/db/migrateDatabase';

export interface ThrowawayCluster {
  port: number;
  /** The migrated `sheaf` database, as the app's role. */
  appUrl: string;
  ownerUrl: string;
  /** `pg_ctl stop|start|restart -m fast`, without blocking the event loop. */
  control(action: 'start' | 'stop' | 'restart'): Promise<void>;
  remove(): Promise<void>;
}

/** A port nothing listens on now (the kernel's pick). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const { port } = probe.address() as { port: number };
      probe.close(() => resolve(port));
    });
  });
}

export async function startThrowawayCluster(): Promise<ThrowawayCluster> {
  const parent = mkdtempSync(join(tmpdir(), 'sheaf-pg-'));
  giveToServerUser(parent);
  const home = join(parent, 'pg');
  const cluster = await startClusterIn(home, { port: await freePort() });
  const admin = new pg.Client({ connectionString: cluster.adminUrl });
  await admin.connect();
  try {
    await admin.query('CREATE DATABASE sheaf');
  } finally {
    await admin.end();
  }
  const { appUrl, ownerUrl } = await setUpRoles(cluster.adminUrl, 'sheaf');
  await migrateDatabase(ownerUrl);
  return {
    port: cluster.port,
    appUrl,
    ownerUrl,
    control: (action) => controlClusterIn(home, action),
    async remove() {
      stopClusterIn(home);
      rmSync(parent, { recursive: true, force: true });
    },
  };
}
