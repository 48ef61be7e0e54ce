/**
 * A server killed with SIGKILL in the middle of edits loses nothing any client had received
 * from it: every relayed update was in PostgreSQL before it was relayed. The server runs as a
 * child process (`node --import tsx src/index.ts`) so it can be killed for real.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { fileURLToPath } from 'node:url';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import * as Y from 'yjs';
import { cellText, sheetContentFromDoc } from '../../src/collab/sheetDoc';
import { dataSourceOptions } from '../../src/db/options';
import { createUser } from '../helpers/fixtures';
import { TestClient as HttpClient } from '../helpers/TestClient';
import {
  collabUrlOf,
  connectClient,
  createOrganizationWith,
  createSheetWith,
  includesAll,
  lugSheet,
  readStoredSheet,
  waitFor,
  type CollabEndpoint,
  type CollabUser,
  type TestClient,
} from './collabHarness';

const serverDir = fileURLToPath(new URL('../..', import.meta.url));
let dataSource: DataSource;
let child: ChildProcess | null = null;
let childOutput = '';
const clients: TestClient[] = [];

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      probe.close(() => (typeof address === 'object' && address !== null ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}

/** Starts `src/index.ts` in a child process on `port` and waits until it answers. */
async function startChildServer(port: number): Promise<ChildProcess> {
  const started = spawn(process.execPath, ['--import', 'tsx', 'src/index.ts'], {
    cwd: serverDir,
    env: {
      ...process.env,
      NODE_ENV: 'test',
      HOST: '127.0.0.1',
      PORT: String(port),
      DATABASE_URL: inject('databaseUrl'),
      LOG_LEVEL: 'warn',
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  started.stdout?.on('data', (chunk: Buffer) => (childOutput += chunk.toString()));
  started.stderr?.on('data', (chunk: Buffer) => (childOutput += chunk.toString()));
  const exited = new Promise<never>((_resolve, reject) =>
    started.once('exit', (code) => reject(new Error(`the server exited early (${code}):\n${childOutput}`))),
  );
  const ready = waitFor(
    'the child server to answer',
    async () => (await fetch(`http://127.0.0.1:${port}/api/health`).catch(() => null))?.ok === true,
    45_000,
  );
  await Promise.race([ready, exited]);
  return started;
}

function exitOf(process: ChildProcess): Promise<void> {
  return process.exitCode !== null || process.signalCode !== null
    ? Promise.resolve()
    : new Promise((resolve) => process.once('exit', () => resolve()));
}

beforeAll(async () => {
  dataSource = new DataSource(dataSourceOptions(inject('databaseUrl'), 3));
  await dataSource.initialize();
});

afterAll(async () => {
  for (const client of clients) client.destroy();
  if (child !== null && child.exitCode === null && child.signalCode === null) {
    child.kill('SIGKILL');
    await exitOf(child);
  }
  await dataSource?.destroy();
});

async function signIn(url: string, label: string): Promise<CollabUser> {
  const user = await createUser(dataSource, label);
  const http = new HttpClient(url);
  await http.csrf();
  await http.signIn(user.email, user.password);
  return { id: user.id, name: user.name, cookie: http.cookieHeader() };
}

describe('a server killed mid-edit', () => {
  it('keeps every update a client received, and the clients merge the rest after the restart', async () => {
    const port = await freePort();
    const url = `http://127.0.0.1:${port}`;
    const endpoint: CollabEndpoint = { url, collabUrl: collabUrlOf(url) };
    child = await startChildServer(port);

    const [ada, ben] = [await signIn(url, 'crash-ada'), await signIn(url, 'crash-ben')];
    const organization = await createOrganizationWith(dataSource, [
      { user: ada, role: 'engineer' },
      { user: ben, role: 'engineer' },
    ]);
    const sheetId = await createSheetWith(dataSource, organization, lugSheet(), ada.id);
    const [a, b] = [connectClient(endpoint, sheetId, { cookie: ada.cookie }), connectClient(endpoint, sheetId, { cookie: ben.cookie })];
    clients.push(a, b);
    await Promise.all([a.synced(), b.synced()]);

    // Everything either client receives from the server, gathered in one document: the sheet as
    // first synced (nobody has typed yet, so all of it came from the server), then every update.
    const received = new Y.Doc();
    Y.applyUpdate(received, Y.encodeStateAsUpdate(a.doc));
    let receivedUpdates = 0;
    for (const client of [a, b]) {
      client.doc.on('update', (update: Uint8Array, origin: unknown) => {
        if (origin !== client.provider) return;
        receivedUpdates++;
        Y.applyUpdate(received, update);
      });
    }

    // Both type steadily, each into their own expression and both into the note.
    let step = 0;
    const typing = setInterval(() => {
      step++;
      cellText(a.doc, 'k2', 'expr')!.insert(0, String(step % 10));
      cellText(b.doc, 'k3', 'expr')!.insert(0, String((step + 5) % 10));
      cellText(step % 2 === 0 ? a.doc : b.doc, 'k1', 'text')!.insert(0, step % 2 === 0 ? 'a' : 'b');
    }, 4);
    try {
      await waitFor('a stream of relayed edits', () => receivedUpdates >= 60, 20_000);
      child.kill('SIGKILL');
      await exitOf(child);
      const receivedAtKill = Y.encodeStateAsUpdate(received);
      // Edits made while the server is down stay with the clients for now.
      await new Promise((resolve) => setTimeout(resolve, 150));
      clearInterval(typing);

      // Before anyone can resend anything: the database alone has all that was relayed.
      const stored = await readStoredSheet(dataSource, sheetId);
      const relayed = new Y.Doc();
      Y.applyUpdate(relayed, receivedAtKill);
      expect(cellText(relayed, 'k2', 'expr')!.length).toBeGreaterThan('18 kN'.length + 10);
      expect(cellText(relayed, 'k3', 'expr')!.length).toBeGreaterThan('40 mm * 12 mm'.length + 10);
      expect(includesAll(stored.doc, relayed)).toBe(true);
      expect(stored.logRows).toBeGreaterThan(0);
    } finally {
      clearInterval(typing);
    }

    // Restarted on the same port: the clients reconnect by themselves and merge what they typed offline.
    child = await startChildServer(port);
    await waitFor(
      'both clients to reconnect and converge',
      () => a.provider.synced && b.provider.synced && JSON.stringify(sheetContentFromDoc(a.doc)) === JSON.stringify(sheetContentFromDoc(b.doc)),
      30_000,
    );
    const held = sheetContentFromDoc(a.doc);
    expect(cellText(a.doc, 'k2', 'expr')!.length).toBe('18 kN'.length + step);
    expect(cellText(a.doc, 'k3', 'expr')!.length).toBe('40 mm * 12 mm'.length + step);
    const fresh = connectClient(endpoint, sheetId, { cookie: ben.cookie });
    clients.push(fresh);
    await fresh.synced();
    expect(sheetContentFromDoc(fresh.doc)).toEqual(held);

    // A clean stop compacts: the stored content is what everyone holds.
    for (const client of [a, b, fresh]) client.destroy();
    child.kill('SIGTERM');
    await exitOf(child);
    const compacted = await readStoredSheet(dataSource, sheetId);
    expect(compacted.logRows).toBe(0);
    expect(compacted.content).toEqual(held);
  }, 120_000);
});
