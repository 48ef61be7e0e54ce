import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as Y from 'yjs';
import { cellText, insertCell, sheetContentFromDoc, sheetMeta, type SheetFileContent } from '../../src/collab/sheetDoc';
import {
  apiRequest,
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
let engineers: CollabUser[];
const clients: TestClient[] = [];

beforeAll(async () => {
  server = await startCollabTestServer();
  // Automatic compaction would fold the log away under the "before compaction" checks; the
  // tests compact on purpose (last client leaves, or compactNow).
  server.collab.configure({ compactAfterUpdates: 1_000_000, compactAfterIdleMs: 3_600_000 });
  engineers = [];
  for (let index = 1; index <= 20; index++) engineers.push(await signedInUser(server.server, `engineer${index}`));
  organization = await createOrganizationWith(
    server.dataSource,
    engineers.map((user) => ({ user, role: 'engineer' as const })),
  );
}, 60_000);

afterAll(async () => {
  for (const client of clients) client.destroy();
  await server?.close();
});

function open(sheetId: string, user: CollabUser, options: { connect?: boolean } = {}): TestClient {
  const client = connectClient(server, sheetId, { cookie: user.cookie, ...options });
  clients.push(client);
  return client;
}

function contentOf(client: TestClient): SheetFileContent {
  return sheetContentFromDoc(client.doc);
}

function expressionOf(client: TestClient, cellId: string, field: string): string {
  return cellText(client.doc, cellId, field)?.toString() ?? '<missing>';
}

describe('co-editing a sheet', () => {
  it('gives a new client the sheet built from its stored content', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), engineers[0]!.id);
    const client = open(sheetId, engineers[0]!);
    await client.synced();
    expect(contentOf(client)).toEqual(lugSheet());
    const stored = await readStoredSheet(server.dataSource, sheetId);
    expect(stored.hasState).toBe(true);
    expect(stored.logRows).toBe(0);
    client.destroy();
    await waitForUnload(server, sheetId);
  });

  it('merges two people typing in the same expression at once, and stores what they see', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), engineers[0]!.id);
    const [ada, ben] = [open(sheetId, engineers[0]!), open(sheetId, engineers[1]!)];
    await Promise.all([ada.synced(), ben.synced()]);

    // Both type at once, each into the same expression, character by character.
    const adaText = cellText(ada.doc, 'k3', 'expr')!;
    const benText = cellText(ben.doc, 'k3', 'expr')!;
    const prefix = '2 * ';
    const suffix = ' - 3 mm^2';
    for (let index = 0; index < Math.max(prefix.length, suffix.length); index++) {
      if (index < prefix.length) adaText.insert(index, prefix[index]!);
      if (index < suffix.length) benText.insert(benText.length, suffix[index]!);
    }
    cellText(ben.doc, 'k2', 'expr')!.delete(0, 2);
    cellText(ben.doc, 'k2', 'expr')!.insert(0, '24');

    const expected = '2 * 40 mm * 12 mm - 3 mm^2';
    await waitFor('both copies to converge', () => expressionOf(ada, 'k3', 'expr') === expected && expressionOf(ada, 'k2', 'expr') === '24 kN' && expressionOf(ben, 'k3', 'expr') === expected);
    expect(contentOf(ben)).toEqual(contentOf(ada));

    // Straight from the log, before any compaction: state + rows give what both hold.
    await server.collab.loadedRoom(sheetId).then((room) => room?.flush());
    const fromLog = await readStoredSheet(server.dataSource, sheetId);
    expect(fromLog.logRows).toBeGreaterThan(0);
    expect(sheetContentFromDoc(fromLog.doc)).toEqual(contentOf(ada));
    expect(Y.encodeStateVector(fromLog.doc)).toEqual(Y.encodeStateVector(ada.doc));
    // sheets.content is not refreshed until compaction.
    expect(fromLog.content.cells.find((cell) => cell.id === 'k3')?.expr).toBe('40 mm * 12 mm');

    // After the last client leaves: compacted into yjs_state and content, the log emptied.
    const held = contentOf(ada);
    const heldState = Y.encodeStateAsUpdate(ada.doc);
    ada.destroy();
    ben.destroy();
    await waitForUnload(server, sheetId);
    const compacted = await readStoredSheet(server.dataSource, sheetId);
    expect(compacted.logRows).toBe(0);
    expect(sheetContentFromDoc(compacted.doc)).toEqual(held);
    expect(compacted.content).toEqual(held);
    const reference = new Y.Doc();
    Y.applyUpdate(reference, heldState);
    expect(includesAll(compacted.doc, reference)).toBe(true);
    expect(includesAll(reference, compacted.doc)).toBe(true);
  });

  it('keeps twenty clients in step while they all edit at once', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), engineers[0]!.id);
    const crowd = engineers.map((user) => open(sheetId, user));
    await Promise.all(crowd.map((client) => client.synced()));

    // Everyone adds a cell of their own and types into the shared note, in interleaved rounds.
    for (const [index, client] of crowd.entries()) {
      insertCell(client.doc, 1 + index, { id: `p${index}`, kind: 'quantity', name: `P${index}`, expr: '' });
    }
    for (let round = 0; round < 5; round++) {
      for (const [index, client] of crowd.entries()) {
        cellText(client.doc, `p${index}`, 'expr')!.insert(round, String(round));
        cellText(client.doc, 'k1', 'text')!.insert(0, String.fromCharCode(97 + (index % 26)));
      }
      await new Promise((resolve) => setTimeout(resolve, 5));
    }

    const reference = crowd[0]!;
    await waitFor(
      'twenty copies to converge',
      () => {
        const want = JSON.stringify(contentOf(reference));
        return contentOf(reference).cells.length === 25 && crowd.every((client) => JSON.stringify(contentOf(client)) === want);
      },
      30_000,
    );
    const content = contentOf(reference);
    expect(content.cells.map((cell) => cell.id).filter((id) => id.startsWith('p'))).toHaveLength(20);
    for (let index = 0; index < 20; index++) {
      expect(content.cells.find((cell) => cell.id === `p${index}`)?.expr).toBe('01234');
    }
    expect(String(content.cells.find((cell) => cell.id === 'k1')?.text)).toHaveLength('Load case LC2'.length + 100);

    await server.collab.loadedRoom(sheetId).then((room) => room?.flush());
    const fromLog = await readStoredSheet(server.dataSource, sheetId);
    expect(sheetContentFromDoc(fromLog.doc)).toEqual(content);

    // A compaction while everyone is still connected changes nothing they see.
    await server.collab.loadedRoom(sheetId).then((room) => room?.compactNow());
    const compacted = await readStoredSheet(server.dataSource, sheetId);
    expect(compacted.logRows).toBe(0);
    expect(compacted.content).toEqual(content);
    for (const client of crowd) client.destroy();
    await waitForUnload(server, sheetId);
  }, 60_000);

  it('merges the edits of a client that went offline, edited and came back', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), engineers[0]!.id);
    const [ada, ben] = [open(sheetId, engineers[0]!), open(sheetId, engineers[1]!)];
    await Promise.all([ada.synced(), ben.synced()]);

    ben.provider.disconnect();
    await waitFor('the server to see ben leave', async () => (await server.collab.loadedRoom(sheetId))?.connectionCount === 1);
    cellText(ben.doc, 'k4', 'txy')!.delete(0, 2);
    cellText(ben.doc, 'k4', 'txy')!.insert(0, '35');
    insertCell(ben.doc, 5, { id: 'k8', kind: 'principal', name: 'P', of: 'S' });
    cellText(ada.doc, 'k2', 'expr')!.insert(0, '1.25 * ');
    await waitFor('ada\'s edit to be stored', async () => (await readStoredSheet(server.dataSource, sheetId)).logRows > 0);
    expect(expressionOf(ben, 'k2', 'expr')).toBe('18 kN');

    ben.provider.connect();
    await waitFor(
      'the offline edits to merge both ways',
      () =>
        expressionOf(ada, 'k4', 'txy') === '35 MPa' &&
        expressionOf(ben, 'k2', 'expr') === '1.25 * 18 kN' &&
        contentOf(ada).cells.some((cell) => cell.id === 'k8'),
    );
    expect(contentOf(ben)).toEqual(contentOf(ada));
    ada.destroy();
    ben.destroy();
    await waitForUnload(server, sheetId);
    expect((await readStoredSheet(server.dataSource, sheetId)).content.cells.map((cell) => cell.id)).toEqual(['k1', 'k2', 'k3', 'k4', 'k7', 'k8']);
  });

  it('sets the presence user on the server, whatever the client claims', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), engineers[0]!.id);
    const [ada, ben] = [open(sheetId, engineers[0]!), open(sheetId, engineers[1]!)];
    await Promise.all([ada.synced(), ben.synced()]);
    ada.provider.awareness.setLocalState({ user: { id: engineers[1]!.id, name: 'Not Ada', colour: '#000000' }, cell: 'k3' });
    await waitFor('ben to see ada', () => ben.provider.awareness.getStates().get(ada.doc.clientID)?.cell === 'k3');
    expect(ben.provider.awareness.getStates().get(ada.doc.clientID)?.user).toEqual({
      id: engineers[0]!.id,
      name: engineers[0]!.name,
      colour: expect.stringMatching(/^#[0-9a-f]{6}$/),
    });
    ada.destroy();
    await waitFor('ada to leave ben\'s presence list', () => !ben.provider.awareness.getStates().has(ada.doc.clientID));
    ben.destroy();
    await waitForUnload(server, sheetId);
  });
});

describe('the server editing a sheet', () => {
  it('brings the document\'s title in line with a rename through the API', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), engineers[0]!.id);
    const ada = open(sheetId, engineers[0]!);
    await ada.synced();
    const renamed = await apiRequest(server, engineers[0]!, 'PATCH', `/api/sheets/${sheetId}`, { title: 'Lifting lug, revised weld' });
    expect(renamed.status).toBe(200);
    // A title typed into the document does not win over the title block either.
    sheetMeta(ada.doc).set('title', 'typed in the document');
    await waitFor('the typed title to be stored', async () => (await readStoredSheet(server.dataSource, sheetId)).logRows > 0);
    await server.collab.loadedRoom(sheetId).then((room) => room?.compactNow());
    await waitFor('the title to follow the rename', () => sheetMeta(ada.doc).get('title') === 'Lifting lug, revised weld');
    ada.destroy();
    await waitForUnload(server, sheetId);
    const stored = await readStoredSheet(server.dataSource, sheetId);
    expect(stored.content.title).toBe('Lifting lug, revised weld');
    expect(sheetMeta(stored.doc).get('title')).toBe('Lifting lug, revised weld');

    // Renamed while nobody has it open: the next load fixes the document at once.
    expect((await apiRequest(server, engineers[1]!, 'PATCH', `/api/sheets/${sheetId}`, { title: 'Lifting lug, final' })).status).toBe(200);
    const ben = open(sheetId, engineers[1]!);
    await waitFor('the loaded title to follow', () => sheetMeta(ben.doc).get('title') === 'Lifting lug, final');
    ben.destroy();
    await waitForUnload(server, sheetId);
    expect((await readStoredSheet(server.dataSource, sheetId)).content.title).toBe('Lifting lug, final');
  });

  it('stores and relays a server edit, whether or not anyone has the sheet open', async () => {
    const sheetId = await createSheetWith(server.dataSource, organization, lugSheet(), engineers[0]!.id);
    const ada = open(sheetId, engineers[0]!);
    await ada.synced();
    await server.collab.editSheet(sheetId, (doc) => insertCell(doc, 0, { id: 'n0', kind: 'note', text: 'Imported from the test rig' }), engineers[2]!.id);
    await waitFor('the server edit to reach the client', () => cellText(ada.doc, 'n0', 'text')?.toString() === 'Imported from the test rig');
    const rows = (await server.dataSource.query(`SELECT user_id FROM sheet_updates WHERE sheet_id = $1`, [sheetId])) as Array<{ user_id: string | null }>;
    expect(rows).toEqual([{ user_id: engineers[2]!.id }]);
    ada.destroy();
    await waitForUnload(server, sheetId);

    await server.collab.editSheet(sheetId, (doc) => insertCell(doc, 99, { id: 'n9', kind: 'note', text: 'appended' }), null);
    await waitForUnload(server, sheetId);
    const stored = await readStoredSheet(server.dataSource, sheetId);
    expect(stored.logRows).toBe(0);
    expect(stored.content.cells.map((cell) => cell.id)).toEqual(['n0', 'k1', 'k2', 'k3', 'k4', 'k7', 'n9']);
  });
});
