import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import WebSocket from 'ws';
import { COLLAB_CLOSE, isFinalCloseCode } from '../../src/collab/closeCodes';
import { cellText, sheetContentFromDoc } from '../../src/collab/sheetDoc';
import {
  connectClient,
  createOrganizationWith,
  createSheetWith,
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
const users = {} as Record<'owner' | 'engineer' | 'checker' | 'viewer' | 'outsider', CollabUser>;
const clients: TestClient[] = [];

beforeAll(async () => {
  server = await startCollabTestServer();
  server.collab.configure({ compactAfterUpdates: 1_000_000, compactAfterIdleMs: 3_600_000 });
  for (const role of ['owner', 'engineer', 'checker', 'viewer', 'outsider'] as const) users[role] = await signedInUser(server.server, role);
  organization = await createOrganizationWith(
    server.dataSource,
    (['owner', 'engineer', 'checker', 'viewer'] as const).map((role) => ({ user: users[role], role })),
  );
  // The outsider owns another organization and is no member of this one.
  await createOrganizationWith(server.dataSource, [{ user: users.outsider, role: 'owner' }]);
}, 60_000);

afterAll(async () => {
  for (const client of clients) client.destroy();
  await server?.close();
});

function open(sheetId: string, options: Parameters<typeof connectClient>[2]): TestClient {
  const client = connectClient(server, sheetId, options);
  clients.push(client);
  return client;
}

/** Waits for the server to close the client, and checks the client then gives up. */
async function refusedWith(client: TestClient, code: number): Promise<void> {
  await waitFor(`close code ${code}`, () => client.closes.length > 0);
  expect(client.closes[0]).toEqual({ code, reason: expect.any(String) });
  expect(client.provider.shouldConnect).toBe(false);
  expect(client.provider.synced).toBe(false);
}

describe('who may connect', () => {
  it('lets the owner and an engineer edit', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), users.engineer.id);
    const owner = open(sheetId, { cookie: users.owner.cookie });
    const engineer = open(sheetId, { cookie: users.engineer.cookie });
    await Promise.all([owner.synced(), engineer.synced()]);
    cellText(owner.doc, 'k2', 'expr')!.insert(0, '2 * ');
    cellText(engineer.doc, 'k3', 'expr')!.insert(0, '3 * ');
    await waitFor('both edits to reach both', () =>
      [owner, engineer].every((client) => cellText(client.doc, 'k2', 'expr')!.toString() === '2 * 18 kN' && cellText(client.doc, 'k3', 'expr')!.toString() === '3 * 40 mm * 12 mm'),
    );
    owner.destroy();
    engineer.destroy();
    await waitForUnload(server, sheetId);
  });

  it('gives a viewer and a checker the document but refuses their changes, and keeps their presence', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), users.engineer.id);
    const engineer = open(sheetId, { cookie: users.engineer.cookie });
    const viewer = open(sheetId, { cookie: users.viewer.cookie });
    const checker = open(sheetId, { cookie: users.checker.cookie });
    await Promise.all([engineer.synced(), viewer.synced(), checker.synced()]);
    expect(sheetContentFromDoc(viewer.doc)).toEqual(lugSheet());
    expect(sheetContentFromDoc(checker.doc)).toEqual(lugSheet());
    const droppedBefore = server.collab.metrics.readOnlyUpdatesDropped;

    cellText(viewer.doc, 'k2', 'expr')!.insert(0, 'VIEWER ');
    cellText(checker.doc, 'k3', 'expr')!.insert(0, 'CHECKER ');
    checker.provider.awareness.setLocalStateField('cell', 'k4');
    // The engineer's edit comes after theirs, so once it reaches the others theirs had their chance.
    cellText(engineer.doc, 'k4', 'txy')!.insert(0, '1.1 * ');
    await waitFor('the engineer\'s edit to reach the viewer and the checker', () =>
      [viewer, checker].every((client) => cellText(client.doc, 'k4', 'txy')!.toString() === '1.1 * 22 MPa'),
    );
    await waitFor('the checker\'s presence to reach the engineer', () => engineer.provider.awareness.getStates().get(checker.doc.clientID)?.cell === 'k4');
    expect(engineer.provider.awareness.getStates().get(checker.doc.clientID)?.user).toMatchObject({ id: users.checker.id });

    expect(server.collab.metrics.readOnlyUpdatesDropped).toBeGreaterThanOrEqual(droppedBefore + 2);
    expect(cellText(engineer.doc, 'k2', 'expr')!.toString()).toBe('18 kN');
    expect(cellText(engineer.doc, 'k3', 'expr')!.toString()).toBe('40 mm * 12 mm');
    expect(cellText(checker.doc, 'k2', 'expr')!.toString()).toBe('18 kN');
    expect(cellText(viewer.doc, 'k3', 'expr')!.toString()).toBe('40 mm * 12 mm');

    // A fresh sync (reconnect) sends their whole state again as sync step 2: still refused.
    viewer.provider.disconnect();
    viewer.provider.connect();
    await viewer.synced();
    await server.collab.loadedRoom(sheetId).then((room) => room?.flush());

    const stored = await readStoredSheet(server.dataSource, sheetId);
    const storedCells = sheetContentFromDoc(stored.doc).cells;
    expect(storedCells.find((cell) => cell.id === 'k2')?.expr).toBe('18 kN');
    expect(storedCells.find((cell) => cell.id === 'k3')?.expr).toBe('40 mm * 12 mm');
    expect(storedCells.find((cell) => cell.id === 'k4')?.txy).toBe('1.1 * 22 MPa');

    for (const client of [engineer, viewer, checker]) client.destroy();
    await waitForUnload(server, sheetId);
    const compacted = await readStoredSheet(server.dataSource, sheetId);
    expect(compacted.content.cells.find((cell) => cell.id === 'k2')?.expr).toBe('18 kN');
  });

  it('refuses someone who is not a member of the organization with 4404', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), users.engineer.id);
    const outsider = open(sheetId, { cookie: users.outsider.cookie });
    await refusedWith(outsider, COLLAB_CLOSE.notFound);
    expect(server.collab.openSheetIds()).not.toContain(sheetId);
  });

  it('refuses a signed-out client with 4401', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), users.engineer.id);
    const anonymous = open(sheetId, {});
    await refusedWith(anonymous, COLLAB_CLOSE.notSignedIn);
    const forged = open(sheetId, { cookie: 'sheaf.sid=s%3Anot-a-session.forged' });
    await refusedWith(forged, COLLAB_CLOSE.notSignedIn);
    expect(server.collab.openSheetIds()).not.toContain(sheetId);
  });

  it('refuses the cookie of a session that signed out, and of a user since deleted', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), users.engineer.id);
    const leaving = await signedInUser(server.server, 'leaving');
    const deleted = await signedInUser(server.server, 'deleted');
    await server.dataSource.query(`INSERT INTO memberships (organization_id, user_id, role) VALUES ($1, $2, 'engineer'), ($1, $3, 'engineer')`, [
      organization.organizationId,
      leaving.id,
      deleted.id,
    ]);
    const csrf = await fetch(`${server.url}/api/auth/csrf`, { headers: { cookie: leaving.cookie } });
    const { token } = (await csrf.json()) as { token: string };
    const response = await fetch(`${server.url}/api/auth/signout`, {
      method: 'POST',
      headers: { cookie: leaving.cookie, 'x-csrf-token': token, origin: server.url },
    });
    expect(response.status).toBe(204);
    await refusedWith(open(sheetId, { cookie: leaving.cookie }), COLLAB_CLOSE.notSignedIn);

    await server.dataSource.query(`DELETE FROM users WHERE id = $1`, [deleted.id]);
    await refusedWith(open(sheetId, { cookie: deleted.cookie }), COLLAB_CLOSE.notSignedIn);
  });

  it('answers a sheet that does not exist, or a malformed id, like a sheet of another organization', async () => {
    await refusedWith(open(randomUUID(), { cookie: users.owner.cookie }), COLLAB_CLOSE.notFound);
    await refusedWith(open('not-a-sheet-id', { cookie: users.owner.cookie }), COLLAB_CLOSE.notFound);
  });

  it('refuses a page from another origin before the handshake', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), users.engineer.id);
    const status = await upgradeStatus(`${server.collabUrl}/${sheetId}`, { cookie: users.owner.cookie, origin: 'https://evil.example' });
    expect(status).toBe(403);
    const elsewhere = await upgradeStatus(`${server.collabUrl.replace('/collab', '/not-collab')}/${sheetId}`, { cookie: users.owner.cookie });
    expect(elsewhere).toBe(404);
    // The page's own origin, and no Origin at all (not a browser), both get through.
    expect(await upgradeStatus(`${server.collabUrl}/${sheetId}`, { cookie: users.owner.cookie, origin: server.url })).toBe(101);
    expect(await upgradeStatus(`${server.collabUrl}/${sheetId}`, { cookie: users.owner.cookie })).toBe(101);
    await waitForUnload(server, sheetId);
  });

  it('marks the refusals as final for the client, and the transient codes as not', () => {
    for (const code of [COLLAB_CLOSE.badRequest, COLLAB_CLOSE.notSignedIn, COLLAB_CLOSE.forbidden, COLLAB_CLOSE.notFound]) {
      expect(isFinalCloseCode(code)).toBe(true);
    }
    for (const code of [COLLAB_CLOSE.unavailable, COLLAB_CLOSE.shuttingDown, 1000, 1006]) expect(isFinalCloseCode(code)).toBe(false);
  });
});

/** The HTTP status of a websocket upgrade attempt (101 when it succeeded; the socket is then closed). */
function upgradeStatus(url: string, headers: Record<string, string>): Promise<number> {
  return new Promise((resolve, reject) => {
    const socket = new WebSocket(url, { headers });
    socket.on('unexpected-response', (_request, response) => {
      resolve(response.statusCode ?? 0);
      socket.terminate();
    });
    socket.on('open', () => {
      resolve(101);
      socket.close();
    });
    socket.on('error', (error) => reject(error));
  });
}
