import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import WebSocket from 'ws';
import * as Y from 'yjs';
import { COLLAB_CLOSE } from '../../src/collab/closeCodes';
import { asOwner } from '../helpers/ownerDatabase';
import { cellText, sheetContentFromDoc } from '../../src/collab/sheetDoc';
import {
  connectClient,
  createOrganizationWith,
  createSheetWith,
  includesAll,
  lugSheet,
  readStoredSheet,
  signedInUser,
  startCollabTestServer,
  waitFor,
  waitForUnload,
  type CollabTestServer,
  type CollabUser,
  type TestClient,
  type TestOrganization,
} from './collabHarness';

let server: CollabTestServer;
let organization: TestOrganization;
let ada: CollabUser;
let ben: CollabUser;
const clients: TestClient[] = [];

beforeAll(async () => {
  server = await startCollabTestServer();
  server.collab.configure({ compactAfterUpdates: 1_000_000, compactAfterIdleMs: 3_600_000, maxStoreRetryDelayMs: 100 });
  ada = await signedInUser(server.server, 'ada');
  ben = await signedInUser(server.server, 'ben');
  organization = await createOrganizationWith(server.dataSource, [
    { user: ada, role: 'engineer' },
    { user: ben, role: 'owner' },
  ]);
});

afterAll(async () => {
  for (const client of clients) client.destroy();
  await server?.close();
});

function open(sheetId: string, user: CollabUser): TestClient {
  const client = connectClient(server, sheetId, { cookie: user.cookie });
  clients.push(client);
  return client;
}

/** Makes PostgreSQL refuse log rows of one sheet (a trigger scoped to it) until the returned function runs. */
async function refuseLogRowsOf(sheetId: string): Promise<() => Promise<void>> {
  const name = `collab_test_refuse_${randomUUID().replaceAll('-', '')}`;
  await asOwner(
    `CREATE FUNCTION ${name}() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN RAISE EXCEPTION 'log refused by the test'; END $$`,
  );
  await asOwner(
    `CREATE TRIGGER ${name} BEFORE INSERT ON sheet_updates FOR EACH ROW WHEN (NEW.sheet_id = '${sheetId}'::uuid) EXECUTE FUNCTION ${name}()`,
  );
  return async () => {
    await asOwner(`DROP TRIGGER ${name} ON sheet_updates`);
    await asOwner(`DROP FUNCTION ${name}()`);
  };
}

describe('durability of edits', () => {
  it('relays nothing it could not store, retries, and relays once stored', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), ada.id);
    const [a, b] = [open(sheetId, ada), open(sheetId, ben)];
    await Promise.all([a.synced(), b.synced()]);
    const failuresBefore = server.collab.metrics.storeFailures;
    const allow = await refuseLogRowsOf(sheetId);

    cellText(a.doc, 'k2', 'expr')!.insert(0, '2 * ');
    await waitFor('two failed attempts to store', () => server.collab.metrics.storeFailures >= failuresBefore + 2);
    // Queued behind the unsaved one: must wait too.
    cellText(b.doc, 'k3', 'expr')!.insert(0, '3 * ');
    await new Promise((resolve) => setTimeout(resolve, 300));
    expect(cellText(b.doc, 'k2', 'expr')!.toString()).toBe('18 kN');
    expect(cellText(a.doc, 'k3', 'expr')!.toString()).toBe('40 mm * 12 mm');
    expect((await readStoredSheet(server.dataSource, sheetId)).logRows).toBe(0);
    // A client joining now gets the stored document only.
    const late = open(sheetId, ben);
    await late.synced();
    expect(cellText(late.doc, 'k2', 'expr')!.toString()).toBe('18 kN');

    await allow();
    await waitFor('both edits to reach everyone once stored', () =>
      [a, b, late].every(
        (client) => cellText(client.doc, 'k2', 'expr')!.toString() === '2 * 18 kN' && cellText(client.doc, 'k3', 'expr')!.toString() === '3 * 40 mm * 12 mm',
      ),
    );
    const stored = await readStoredSheet(server.dataSource, sheetId);
    expect(stored.logRows).toBeGreaterThanOrEqual(2);
    expect(includesAll(stored.doc, a.doc)).toBe(true);
    for (const client of [a, b, late]) client.destroy();
    await waitForUnload(server, sheetId);
  });

  it('closes everyone with 4404 when the sheet is deleted while open', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), ada.id);
    const [a, b] = [open(sheetId, ada), open(sheetId, ben)];
    await Promise.all([a.synced(), b.synced()]);
    await server.dataSource.query(`DELETE FROM sheets WHERE id = $1`, [sheetId]);
    cellText(a.doc, 'k2', 'expr')!.insert(0, '2 * ');
    await waitFor('both to be told the sheet is gone', () => a.closes.length > 0 && b.closes.length > 0);
    expect(a.closes[0]?.code).toBe(COLLAB_CLOSE.notFound);
    expect(b.closes[0]?.code).toBe(COLLAB_CLOSE.notFound);
    expect(a.provider.shouldConnect).toBe(false);
    await waitForUnload(server, sheetId);
  });

  it('refuses an update that does not decode with 4400, and stores none of it', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), ada.id);
    const a = open(sheetId, ada);
    await a.synced();
    // A sync "update" message whose payload is not a Yjs update.
    a.provider.ws!.send(new Uint8Array([0, 2, 5, 200, 201, 202, 203, 204]));
    await waitFor('the server to close the client', () => a.closes.length > 0);
    expect(a.closes[0]?.code).toBe(COLLAB_CLOSE.badRequest);
    await waitForUnload(server, sheetId);
    expect((await readStoredSheet(server.dataSource, sheetId)).logRows).toBe(0);
  });
});

describe('dead connections', () => {
  it('cuts a socket that stops answering pings, and unloads its room', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), ada.id);
    const healthy = open(sheetId, ben);
    await healthy.synced();
    // A client whose machine went away: its socket never answers a ping.
    const silent = new WebSocket(`${server.collabUrl}/${sheetId}`, { headers: { cookie: ada.cookie, origin: server.url }, autoPong: false });
    await new Promise((resolve, reject) => {
      silent.once('open', resolve);
      silent.once('error', reject);
    });
    await waitFor('both connections in the room', async () => (await server.collab.loadedRoom(sheetId))?.connectionCount === 2);
    const closed = new Promise<number>((resolve) => silent.once('close', (code) => resolve(code)));
    server.collab.configure({ pingIntervalMs: 100 });
    try {
      expect(await closed).toBe(1006);
      await waitFor('the silent socket to leave the room', async () => (await server.collab.loadedRoom(sheetId))?.connectionCount === 1);
      // The healthy client answered every ping and is still there.
      expect(healthy.closes).toEqual([]);
    } finally {
      server.collab.configure({ pingIntervalMs: 30_000 });
    }
    healthy.destroy();
    await waitForUnload(server, sheetId);
  });
});

describe('graceful shutdown', () => {
  it('closes sockets with 4503, and leaves every received edit stored and compacted', async () => {
    const own = await startCollabTestServer();
    try {
      const sheetId = await createSheetWith(own.dataSource, organization, lugSheet(), ada.id);
      const a = connectClient(own, sheetId, { cookie: ada.cookie });
      const b = connectClient(own, sheetId, { cookie: ben.cookie });
      clients.push(a, b);
      await Promise.all([a.synced(), b.synced()]);
      const received = new Y.Doc();
      b.doc.on('update', (update: Uint8Array, origin: unknown) => {
        if (origin === b.provider) Y.applyUpdate(received, update);
      });
      for (let index = 0; index < 30; index++) cellText(a.doc, 'k1', 'text')!.insert(0, String(index % 10));
      await waitFor('b to receive the edits', () => cellText(b.doc, 'k1', 'text')!.length === 'Load case LC2'.length + 30);

      await own.close();
      await waitFor('both clients to be closed', () => a.closes.length > 0 && b.closes.length > 0);
      expect(a.closes[0]?.code).toBe(COLLAB_CLOSE.shuttingDown);
      expect(b.closes[0]?.code).toBe(COLLAB_CLOSE.shuttingDown);
      // Not final: the clients keep trying to reconnect.
      expect(a.provider.shouldConnect).toBe(true);
      const held = sheetContentFromDoc(a.doc);
      a.destroy();
      b.destroy();

      const stored = await readStoredSheet(server.dataSource, sheetId);
      expect(stored.logRows).toBe(0);
      expect(includesAll(stored.doc, received)).toBe(true);
      expect(stored.content).toEqual(held);
      expect(String(stored.content.cells[0]?.text)).toHaveLength('Load case LC2'.length + 30);
    } finally {
      await own.close();
    }
  });
});
