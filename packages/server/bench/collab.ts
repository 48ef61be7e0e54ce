/**
 * Co-editing benchmark (figures are printed, never asserted):
 *
 * - edit-to-remote-view latency, p50 and p95, with 2, 20 and 50 y-websocket clients on one sheet:
 *   one client types a character, and the time until each other client's copy shows it is one
 *   sample. It includes storing the update in PostgreSQL before the relay. Clients and server share
 *   this process (and its clock), so the figures include the clients' own work.
 * - server memory per open sheet: the heap grown by N open rooms, each with one connected raw
 *   websocket that has synced (so the figure also holds one small client socket per sheet).
 *
 * Runs against DATABASE_URL when set, otherwise in a throwaway database made through
 * SHEAF_PG_ADMIN_URL (default: the project-local cluster) and dropped afterwards.
 *
 *   npm run bench -w @sheaf/server
 */
import 'reflect-metadata';
import { randomBytes } from 'node:crypto';
import { performance } from 'node:perf_hooks';
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import WebSocket from 'ws';
import { WebsocketProvider } from 'y-websocket';
import * as Y from 'yjs';
import * as decoding from 'lib0/decoding';
import * as encoding from 'lib0/encoding';
import * as syncProtocol from 'y-protocols/sync';
import { loadConfig } from '../src/config';
import { collabServerOf } from '../src/collab/upgradeHandlers';
import { cellText, docFromSheetContent, type SheetFileContent } from '../src/collab/sheetDoc';
import { benchSheet } from './support/benchSheet';
import { openBenchDatabase } from './support/benchDatabase';
import { signIn } from './support/signIn';
import { percentile, socketClass, until } from './support/clients';
import { createPasswordUser } from '../src/services/accounts';
import { insertOrganization } from '../src/services/organizations';
import { startServer, type RunningServer } from '../src/server';

const CLIENT_COUNTS = [2, 20, 50];
const EDITS_PER_RUN = 60;
const MEMORY_ROOMS = 200;
const PASSWORD = 'benchmark password, long enough';

process.setMaxListeners(500);
setFlagsFromString('--expose-gc');
const collectGarbage = runInNewContext('gc') as () => void;


interface Bench {
  running: RunningServer;
  url: string;
  organizationId: string;
  projectId: string;
  cookies: string[];
}


async function createSheetRow(bench: Bench, content: SheetFileContent): Promise<string> {
  const rows = (await bench.running.deps.dataSource.query(
    `INSERT INTO sheets (organization_id, project_id, title, calc_number, content) VALUES ($1, $2, $3, $4, $5::jsonb) RETURNING id`,
    [bench.organizationId, bench.projectId, content.title, `B-${randomBytes(4).toString('hex')}`, JSON.stringify(content)],
  )) as Array<{ id: string }>;
  return rows[0]!.id;
}




async function latencyRun(bench: Bench, clientCount: number): Promise<{ samples: number[]; lost: number }> {
  const sheetId = await createSheetRow(bench, benchSheet());
  const collabUrl = `${bench.url.replace(/^http/, 'ws')}/collab`;
  const clients = Array.from({ length: clientCount }, (_, index) => {
    const doc = new Y.Doc();
    const provider = new WebsocketProvider(collabUrl, sheetId, doc, {
      WebSocketPolyfill: socketClass(bench.cookies[index % bench.cookies.length]!, bench.url) as unknown as typeof globalThis.WebSocket,
      disableBc: true,
    });
    return { doc, provider };
  });
  await until(() => clients.every((client) => client.provider.synced), 30_000);

  const samples: number[] = [];
  let lost = 0;
  for (let edit = 0; edit < EDITS_PER_RUN; edit++) {
    const writer = clients[edit % clientCount]!;
    const receivers = clients.filter((client) => client !== writer);
    const target = cellText(writer.doc, 'k2', 'expr')!.length + 1;
    const seen = new Map<Y.Doc, number>();
    const observers = receivers.map((client) => {
      const text = cellText(client.doc, 'k2', 'expr')!;
      const observer = (): void => {
        if (!seen.has(client.doc) && text.length >= target) seen.set(client.doc, performance.now());
      };
      text.observe(observer);
      return () => text.unobserve(observer);
    });
    const started = performance.now();
    cellText(writer.doc, 'k2', 'expr')!.insert(0, String(edit % 10));
    const complete = await until(() => seen.size === receivers.length, 5_000);
    for (const stop of observers) stop();
    if (!complete) lost += receivers.length - seen.size;
    for (const at of seen.values()) samples.push(at - started);
    // Typing pace: a key every 20 ms at most.
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
  for (const client of clients) {
    client.provider.destroy();
    client.doc.destroy();
  }
  return { samples: samples.sort((a, b) => a - b), lost };
}

/** A minimal client: sends sync step 1 and resolves when the server's step 2 arrives. */
function rawSyncedSocket(bench: Bench, sheetId: string): Promise<WebSocket> {
  return new Promise((resolve, reject) => {
    const Socket = socketClass(bench.cookies[0]!, bench.url);
    const socket = new Socket(`${bench.url.replace(/^http/, 'ws')}/collab/${sheetId}`);
    socket.binaryType = 'nodebuffer';
    socket.on('open', () => {
      const encoder = encoding.createEncoder();
      encoding.writeVarUint(encoder, 0);
      syncProtocol.writeSyncStep1(encoder, new Y.Doc());
      socket.send(encoding.toUint8Array(encoder));
    });
    socket.on('message', (data: Buffer) => {
      const decoder = decoding.createDecoder(new Uint8Array(data));
      if (decoding.readVarUint(decoder) === 0 && decoding.readVarUint(decoder) === syncProtocol.messageYjsSyncStep2) resolve(socket);
    });
    socket.on('error', reject);
    socket.on('close', (code) => reject(new Error(`closed with ${code}`)));
  });
}

async function memoryRun(bench: Bench): Promise<{ perRoomBytes: number; rooms: number }> {
  const collab = collabServerOf(bench.running.server)!;
  const content = benchSheet();
  const sheetIds: string[] = [];
  for (let index = 0; index < MEMORY_ROOMS; index++) sheetIds.push(await createSheetRow(bench, content));
  // Warm up: one room opened and closed, so code paths and pools are allocated before measuring.
  const warm = await rawSyncedSocket(bench, sheetIds[0]!);
  warm.close();
  await until(() => collab.openSheetIds().length === 0, 10_000);

  collectGarbage();
  const before = process.memoryUsage().heapUsed;
  const sockets: WebSocket[] = [];
  for (const sheetId of sheetIds) sockets.push(await rawSyncedSocket(bench, sheetId));
  collectGarbage();
  const after = process.memoryUsage().heapUsed;
  const rooms = collab.openSheetIds().length;
  for (const socket of sockets) socket.close();
  await until(() => collab.openSheetIds().length === 0, 30_000);
  return { perRoomBytes: (after - before) / rooms, rooms };
}

async function main(): Promise<void> {
  const database = await openBenchDatabase('sheaf_bench');
  let running: RunningServer | undefined;
  try {
    const config = loadConfig({ NODE_ENV: 'test', HOST: '127.0.0.1', PORT: '0', DATABASE_URL: database.url, LOG_LEVEL: 'silent' });
    running = await startServer(config, { rateLimits: { signInPerIp: 100_000, signInPerAccount: 100_000 } });
    const dataSource = running.deps.dataSource;
    const organization = await insertOrganization(dataSource.manager, `Bench ${randomBytes(3).toString('hex')}`);
    const projectRows = (await dataSource.query(`INSERT INTO projects (organization_id, name, code) VALUES ($1, 'Bench', 'BN') RETURNING id`, [
      organization.id,
    ])) as Array<{ id: string }>;
    const cookies: string[] = [];
    for (let index = 0; index < 10; index++) {
      const email = `bench-${index}-${randomBytes(4).toString('hex')}@bench.sheaf.test`;
      const user = await createPasswordUser(dataSource.manager, { email, password: PASSWORD, name: `Bench ${index}` });
      await dataSource.query(`INSERT INTO memberships (organization_id, user_id, role) VALUES ($1, $2, 'engineer')`, [organization.id, user.id]);
      cookies.push(await signIn(running.url, email, PASSWORD));
    }
    const bench: Bench = { running, url: running.url, organizationId: organization.id, projectId: projectRows[0]!.id, cookies };

    const sheet = benchSheet();
    console.log(`sheet: ${sheet.cells.length} cells, ${JSON.stringify(sheet).length} bytes of JSON, ${Y.encodeStateAsUpdate(docFromSheetContent(sheet)).length} bytes of Yjs state`);
    console.log('edit-to-remote-view latency (one key typed, until every other client shows it):');
    for (const count of CLIENT_COUNTS) {
      const { samples, lost } = await latencyRun(bench, count);
      console.log(
        `  ${String(count).padStart(2)} clients: p50 ${percentile(samples, 0.5).toFixed(2)} ms, p95 ${percentile(samples, 0.95).toFixed(2)} ms, max ${(samples.at(-1) ?? Number.NaN).toFixed(2)} ms (${samples.length} samples${lost > 0 ? `, ${lost} not seen within 5 s` : ''})`,
      );
    }
    const memory = await memoryRun(bench);
    console.log(`server memory per open sheet: ${(memory.perRoomBytes / 1024).toFixed(1)} KiB of heap (${memory.rooms} rooms, one synced socket each)`);
    const metrics = collabServerOf(running.server)!.metrics;
    console.log(`stored updates: ${metrics.updatesStored}, compactions: ${metrics.compactions}, store failures: ${metrics.storeFailures}`);
  } finally {
    await running?.close();
    await database.drop();
  }
}

main().catch((error: unknown) => {
  console.error(error);
  process.exit(1);
});
