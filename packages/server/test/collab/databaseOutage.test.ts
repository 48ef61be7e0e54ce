import * as decoding from 'lib0/decoding';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { COLLAB_MESSAGE, SAVING_STATE } from '@sheaf/sheet-doc';
import { cellText } from '../../src/collab/sheetDoc';
import { collabServerOf } from '../../src/collab/upgradeHandlers';
import type { CollabServer } from '../../src/collab/CollabServer';
import { startThrowawayCluster, type ThrowawayCluster } from '../helpers/throwawayCluster';
import { startTestServer, type TestServer } from '../helpers/testServer';
import {
  apiRequest,
  collabUrlOf,
  connectClient,
  createOrganizationWith,
  createSheetWith,
  includesAll,
  lugSheet,
  readStoredSheet,
  signedInUser,
  waitFor,
  type CollabEndpoint,
  type CollabUser,
  type TestClient,
  type TestOrganization,
} from './collabHarness';

/**
 * PostgreSQL restarts and goes away while people co-edit a sheet. The server stays up: requests
 * answer 503 with Retry-After meanwhile, health says the database is down, edits wait in memory
 * (nobody sees an edit before it is stored), the room says saving is paused once the wait passes
 * its bound, and within seconds of the database's return everything typed is stored and seen by
 * everyone. The database is a cluster of this file's own, so stopping it disturbs no other test.
 */
describe('a server that outlives its database', () => {
  let cluster: ThrowawayCluster;
  let server: TestServer;
  let collab: CollabServer;
  let endpoint: CollabEndpoint;
  let organization: TestOrganization;
  let ada: CollabUser;
  let ben: CollabUser;
  const clients: TestClient[] = [];

  beforeAll(async () => {
    cluster = await startThrowawayCluster();
    server = await startTestServer({ env: { DATABASE_URL: cluster.appUrl } });
    collab = collabServerOf(server.server)!;
    // Quick retries, and a short bound on how long edits may wait unsaved before saving pauses.
    collab.configure({ maxStoreRetryDelayMs: 200, compactAfterIdleMs: 3_600_000, unsaved: { maxFailingMs: 1_500 } });
    endpoint = { url: server.url, collabUrl: collabUrlOf(server.url) };
    ada = await signedInUser(server, 'ada');
    ben = await signedInUser(server, 'ben');
    organization = await createOrganizationWith(server.deps.dataSource, [
      { user: ada, role: 'engineer' },
      { user: ben, role: 'owner' },
    ]);
  }, 120_000);

  afterAll(async () => {
    for (const client of clients) client.destroy();
    await server?.close();
    await cluster?.remove();
  });

  /** A client that also records every saving state the room tells it. */
  function open(sheetId: string, user: CollabUser): TestClient & { saving: number[] } {
    const client = connectClient(endpoint, sheetId, { cookie: user.cookie });
    const saving: number[] = [];
    client.provider.messageHandlers[COLLAB_MESSAGE.saving] = (_encoder, decoder) => {
      saving.push(decoding.readVarUint(decoder));
    };
    clients.push(client);
    return Object.assign(client, { saving });
  }

  const health = () => fetch(`${server.url}/api/health`);

  it('stays up through pg_ctl restart -m fast under live co-editing, and loses nothing acknowledged', async () => {
    const sheetId = await createSheetWith(server.deps.dataSource, organization, lugSheet(), ada.id);
    const [a, b] = [open(sheetId, ada), open(sheetId, ben)];
    await Promise.all([a.synced(), b.synced()]);
    // Idle pooled connections of the session store and the app: the restart ends them all.
    expect((await apiRequest(endpoint, ada, 'GET', `/api/sheets/${sheetId}`)).status).toBe(200);

    const note = () => cellText(a.doc, 'k1', 'text')!;
    let typing = true;
    let typed = 0;
    const typist = (async () => {
      while (typing) {
        note().insert(note().length, String(typed++ % 10));
        await new Promise((resolve) => setTimeout(resolve, 15));
      }
    })();
    await waitFor('ben to see ada typing', () => cellText(b.doc, 'k1', 'text')!.length > 'Load case LC2'.length + 3);
    // What ben has seen was stored first: it must survive whatever happens next.
    const acknowledged = cellText(b.doc, 'k1', 'text')!.toString();

    const statuses: number[] = [];
    const restart = cluster.control('restart');
    const prober = (async () => {
      for (let i = 0; i < 40; i++) {
        const response = await apiRequest(endpoint, ada, 'GET', `/api/sheets/${sheetId}`).catch(() => ({ status: -1 }));
        statuses.push(response.status);
        await new Promise((resolve) => setTimeout(resolve, 25));
      }
    })();
    await restart;
    await prober;
    await new Promise((resolve) => setTimeout(resolve, 300));
    typing = false;
    await typist;

    // No request failed any other way than "try again later".
    expect(statuses.filter((status) => status !== 200 && status !== 503)).toEqual([]);
    await waitFor('health to answer 200 again', async () => (await health()).status === 200, 15_000);
    await waitFor('ben to have everything ada typed', () => cellText(b.doc, 'k1', 'text')!.toString() === note().toString(), 15_000);
    expect(cellText(b.doc, 'k1', 'text')!.toString().startsWith(acknowledged)).toBe(true);
    const room = await collab.loadedRoom(sheetId);
    await room!.flush();
    const stored = await readStoredSheet(server.deps.dataSource, sheetId);
    expect(includesAll(stored.doc, a.doc)).toBe(true);
    expect(cellText(stored.doc, 'k1', 'text')!.toString()).toBe(note().toString());
    expect((await apiRequest(endpoint, ben, 'GET', `/api/sheets/${sheetId}`)).status).toBe(200);
  }, 90_000);

  it('answers 503 with Retry-After while the database is down, pauses saving past the bound, and recovers by itself', async () => {
    const sheetId = await createSheetWith(server.deps.dataSource, organization, lugSheet(), ada.id);
    const [a, b] = [open(sheetId, ada), open(sheetId, ben)];
    await Promise.all([a.synced(), b.synced()]);
    const before = cellText(b.doc, 'k2', 'expr')!.toString();

    await cluster.control('stop');
    const down = await health();
    expect(down.status).toBe(503);
    expect(down.headers.get('retry-after')).toBe('5');
    expect(((await down.json()) as { error: { code: string } }).error.code).toBe('unavailable');
    const read = await fetch(`${server.url}/api/sheets/${sheetId}`, { headers: { cookie: ada.cookie } });
    expect([read.status, read.headers.get('retry-after')]).toEqual([503, '5']);
    expect(((await read.json()) as { error: { message: string } }).error.message).toMatch(/database is not reachable/);

    // Typed while the database is down: kept in memory, and relayed to nobody.
    cellText(a.doc, 'k2', 'expr')!.insert(0, '2 * ');
    await new Promise((resolve) => setTimeout(resolve, 500));
    expect(cellText(b.doc, 'k2', 'expr')!.toString()).toBe(before);
    // Past the bound the room says it is read-only for now, to everyone.
    await waitFor('both clients to be told saving is paused', () => a.saving.includes(SAVING_STATE.paused) && b.saving.includes(SAVING_STATE.paused));
    expect((await collab.loadedRoom(sheetId))!.isSavingPaused).toBe(true);
    const turnedAway = collab.metrics.updatesTurnedAway;
    // Typed while paused: turned away by the server, kept by the client, sent again on resume.
    cellText(a.doc, 'k3', 'expr')!.insert(0, '3 * ');
    await waitFor('the paused room to turn the edit away', () => collab.metrics.updatesTurnedAway > turnedAway);

    await cluster.control('start');
    await waitFor('health to answer 200 again', async () => (await health()).status === 200, 20_000);
    await waitFor('saving to resume', () => a.saving.at(-1) === SAVING_STATE.resumed && b.saving.at(-1) === SAVING_STATE.resumed, 20_000);
    await waitFor('ben to see both edits', () =>
      cellText(b.doc, 'k2', 'expr')!.toString() === `2 * ${before}` && cellText(b.doc, 'k3', 'expr')!.toString() === '3 * 40 mm * 12 mm',
    );
    const room = await collab.loadedRoom(sheetId);
    await room!.flush();
    expect(includesAll((await readStoredSheet(server.deps.dataSource, sheetId)).doc, a.doc)).toBe(true);
    expect((await apiRequest(endpoint, ada, 'GET', `/api/sheets/${sheetId}`)).status).toBe(200);
  }, 90_000);
});
