import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { COLLAB_CLOSE } from '../../src/collab/closeCodes';
import { cellText, sheetContentFromDoc } from '../../src/collab/sheetDoc';
import {
  apiRequest,
  connectClient,
  createOrganizationWith,
  createSheetWith,
  lugSheet,
  readStoredSheet,
  signedInUser,
  startCollabTestServer,
  waitFor,
  type CollabTestServer,
  type CollabUser,
  type TestClient,
  type TestOrganization,
} from './collabHarness';

/**
 * The check workflow seen from co-editing: a sheet in check is read-only for everyone at the
 * collab layer; approval issues the live content; the first live edit of an approved sheet starts
 * its next revision as a draft.
 */
let server: CollabTestServer;
let organization: TestOrganization;
const users = {} as Record<'owner' | 'engineer' | 'checker', CollabUser>;
const clients: TestClient[] = [];

beforeAll(async () => {
  server = await startCollabTestServer();
  // Nothing is compacted unless a room unloads: approval must read the live document.
  server.collab.configure({ compactAfterUpdates: 1_000_000, compactAfterIdleMs: 3_600_000 });
  for (const role of ['owner', 'engineer', 'checker'] as const) users[role] = await signedInUser(server.server, role);
  organization = await createOrganizationWith(
    server.dataSource,
    (['owner', 'engineer', 'checker'] as const).map((role) => ({ user: users[role], role })),
  );
}, 60_000);

afterAll(async () => {
  for (const client of clients) client.destroy();
  await server?.close();
});

function open(sheetId: string, user: CollabUser): TestClient {
  const client = connectClient(server, sheetId, { cookie: user.cookie });
  clients.push(client);
  return client;
}

function setForce(client: TestClient, expr: string): void {
  const text = cellText(client.doc, 'k2', 'expr');
  if (text === undefined) throw new Error('cell k2 has no expr');
  client.doc.transact(() => {
    text.delete(0, text.length);
    text.insert(0, expr);
  });
}

const forceOf = (client: TestClient) => cellText(client.doc, 'k2', 'expr')?.toString();

async function statusOf(sheetId: string): Promise<string> {
  const [row] = await server.dataSource.query(`SELECT status FROM sheets WHERE id = $1`, [sheetId]);
  return row.status as string;
}

describe('a sheet in check', () => {
  it('is read-only for everyone while in check, and editable again once returned', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), users.engineer.id);
    const writer = open(sheetId, users.engineer);
    const watcher = open(sheetId, users.owner);
    await Promise.all([writer.synced(), watcher.synced()]);

    setForce(writer, '20 kN');
    await waitFor('the owner to see the edit', () => forceOf(watcher) === '20 kN');

    const submitted = await apiRequest(server, users.engineer, 'POST', `/api/sheets/${sheetId}/submit`, { checkerUserId: users.checker.id });
    expect(submitted.status).toBe(200);
    // Writers are told the status changed; their editors reconnect and find the sheet read-only.
    await waitFor('the writer to be closed with statusChanged', () => writer.closes.some((c) => c.code === COLLAB_CLOSE.statusChanged));
    await waitFor('the writer to be back', () => writer.provider.wsconnected && writer.provider.synced);
    const logBefore = (await readStoredSheet(server.dataSource, sheetId)).logRows;
    const dropsBefore = server.collab.metrics.readOnlyUpdatesDropped;

    setForce(writer, '99 kN');
    await waitFor('the server to drop the edit', () => server.collab.metrics.readOnlyUpdatesDropped > dropsBefore);
    await new Promise((resolve) => setTimeout(resolve, 200));
    expect(forceOf(watcher)).toBe('20 kN');
    expect((await readStoredSheet(server.dataSource, sheetId)).logRows).toBe(logBefore);
    expect((await server.collab.liveContent(sheetId))?.cells.find((c) => c.id === 'k2')?.expr).toBe('20 kN');

    // The refused edit lives on only in that client's copy: its editor reloads the sheet (see
    // COLLAB_CLOSE.statusChanged), which this client does by going away.
    writer.destroy();
    const returned = await apiRequest(server, users.checker, 'POST', `/api/sheets/${sheetId}/return`, { message: 'Use the factored load.' });
    expect(returned.status).toBe(200);
    // A fresh connection after the return writes again.
    const again = open(sheetId, users.engineer);
    await again.synced();
    expect(forceOf(again)).toBe('20 kN');
    setForce(again, '27 kN');
    await waitFor('the owner to see the edit after the return', () => forceOf(watcher) === '27 kN');
  });

  it('refuses at the log an edit that races the submission, and tells its sender', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), users.engineer.id);
    const writer = open(sheetId, users.engineer);
    const watcher = open(sheetId, users.owner);
    await Promise.all([writer.synced(), watcher.synced()]);
    // The status changed in the database but the room has not heard yet (another process, say).
    await server.dataSource.query(`UPDATE sheets SET status = 'in-check' WHERE id = $1`, [sheetId]);
    const logBefore = (await readStoredSheet(server.dataSource, sheetId)).logRows;
    setForce(writer, '31 kN');
    await waitFor('the sender to be closed with statusChanged', () => writer.closes.some((c) => c.code === COLLAB_CLOSE.statusChanged));
    expect(forceOf(watcher)).toBe('18 kN');
    expect((await readStoredSheet(server.dataSource, sheetId)).logRows).toBe(logBefore);
    expect((await server.collab.loadedRoom(sheetId))?.isLocked).toBe(true);
  });
});

describe('approval and the next revision', () => {
  it('issues the live content, then the first live edit starts the next revision as a draft', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), users.engineer.id);
    const writer = open(sheetId, users.engineer);
    await writer.synced();
    setForce(writer, '24 kN');
    await waitFor('the edit to be stored', async () => (await readStoredSheet(server.dataSource, sheetId)).logRows > 0);
    // Not compacted: the stored content still says 18 kN.
    const [stored] = await server.dataSource.query(`SELECT content FROM sheets WHERE id = $1`, [sheetId]);
    expect(stored.content.cells[1].expr).toBe('18 kN');

    expect((await apiRequest(server, users.engineer, 'POST', `/api/sheets/${sheetId}/submit`, { checkerUserId: users.checker.id })).status).toBe(200);
    const approved = await apiRequest(server, users.checker, 'POST', `/api/sheets/${sheetId}/approve`, {});
    expect(approved.status).toBe(201);
    const revision = (await apiRequest(server, users.checker, 'GET', `/api/sheets/${sheetId}/revisions/1`)).body as {
      revision: { content: { cells: Array<{ id: string; expr?: string }> }; results: { cells: Record<string, { values?: Record<string, number> }> } };
    };
    expect(revision.revision.content.cells[1]).toEqual({ id: 'k2', kind: 'quantity', name: 'F', expr: '24 kN' });
    expect(revision.revision.results.cells.F?.values?.value).toBe(24_000);
    // The writer was closed when the sheet went into check (and again at approval if it was back
    // by then). Connected to the unlocked room it sends its past deletions again, which is no
    // edit: the sheet stays approved.
    await waitFor('the writer to be back after approval', async () => {
      const room = await server.collab.loadedRoom(sheetId);
      return room !== undefined && !room.isLocked && writer.provider.wsconnected && writer.provider.synced;
    });
    await new Promise((resolve) => setTimeout(resolve, 300));
    await (await server.collab.loadedRoom(sheetId))?.flush();
    expect(await statusOf(sheetId)).toBe('approved');
    setForce(writer, '26 kN');
    await waitFor('the sheet to be a draft again', async () => (await statusOf(sheetId)) === 'draft');
    const [event] = await server.dataSource.query(
      `SELECT actor_user_id, details FROM audit_events WHERE action = 'sheet.reopened' AND details ->> 'sheetId' = $1`,
      [sheetId],
    );
    expect(event).toEqual({ actor_user_id: users.engineer.id, details: { sheetId, from: 'approved', to: 'draft', revision: 2 } });
    // Revision 1 keeps what was approved.
    const again = (await apiRequest(server, users.checker, 'GET', `/api/sheets/${sheetId}/revisions/1`)).body as typeof revision;
    expect(again.revision.content.cells[1]?.expr).toBe('24 kN');
    expect(sheetContentFromDoc(writer.doc).cells[1]?.expr).toBe('26 kN');
  });
});
