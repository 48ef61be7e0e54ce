import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createServer, type Server } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { giveToServerUser, startClusterIn, stopClusterIn } from '../../../scripts/lib/postgres.mjs';
import { freePort } from './helpers/throwawayCluster';

/**
 * Two checkouts on one machine: while another program (another checkout's PostgreSQL, say) holds
 * the port a cluster would use, `npm start` and `npm test` start it on the next free port — or,
 * when PGPORT asks for that port, say exactly what to do.
 */
describe('the project cluster beside another checkout', () => {
  let blocker: Server;
  let taken: number;
  let parent: string;
  let home: string;

  beforeAll(async () => {
    taken = await freePort();
    blocker = createServer();
    await new Promise<void>((resolve) => blocker.listen(taken, '127.0.0.1', resolve));
    parent = mkdtempSync(join(tmpdir(), 'sheaf-pg-port-'));
    giveToServerUser(parent);
    home = join(parent, 'pg');
  });
  afterAll(async () => {
    stopClusterIn(home);
    await new Promise((resolve) => blocker.close(resolve));
    rmSync(parent, { recursive: true, force: true });
  });

  it('refuses a PGPORT another program holds, saying what to do', async () => {
    await expect(startClusterIn(home, { port: taken })).rejects.toThrow(
      `port ${taken} on 127.0.0.1 (PGPORT) is taken by another program — another checkout's PostgreSQL, perhaps. Set PGPORT to a free port, or leave PGPORT unset and a free one is picked.`,
    );
  });

  it('starts on the next free port when the port it used last is taken, and remembers it', async () => {
    // The port this cluster "used last time" is now held by someone else.
    writeFileSync(join(home, 'port'), String(taken));
    const cluster = await startClusterIn(home);
    expect(cluster.startedHere).toBe(true);
    expect(cluster.port).not.toBe(taken);
    expect(cluster.port).toBeGreaterThan(taken);
    expect(readFileSync(join(home, 'port'), 'utf8')).toBe(String(cluster.port));
    const client = new pg.Client({ connectionString: cluster.adminUrl });
    await client.connect();
    expect((await client.query('SELECT 1 AS one')).rows).toEqual([{ one: 1 }]);
    await client.end();
    // A second start finds it running and uses it where it is.
    const again = await startClusterIn(home);
    expect([again.port, again.startedHere]).toEqual([cluster.port, false]);
  }, 120_000);
});
