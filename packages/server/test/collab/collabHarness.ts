/**
 * Builders for the co-editing tests, on top of the server test helpers: a real server on
 * 127.0.0.1 port 0 against the run's database, users signed in through the API, sheets with
 * given content, and real y-websocket clients (Node's `ws` as the WebSocket, carrying the
 * session cookie and an Origin).
 */
import type { DataSource } from 'typeorm';
import WebSocket from 'ws';
import { WebsocketProvider } from 'y-websocket';
import * as Y from 'yjs';
import type { Role } from '@sheaf/engine/api';
import type { CollabServer } from '../../src/collab/CollabServer';
import { sheetContentFromDoc, type SheetFileContent } from '../../src/collab/sheetDoc';
import { collabServerOf } from '../../src/collab/upgradeHandlers';
import type { Project } from '../../src/entities/Project';
import { insertOrganization } from '../../src/services/organizations';
import { createSheet } from '../../src/services/sheets';
import { addMember, createProjectIn, createUser } from '../helpers/fixtures';
import { startTestServer, type TestServer } from '../helpers/testServer';

// Each y-websocket provider adds a process 'exit' listener; the crowd tests open dozens.
process.setMaxListeners(200);

/** Where a client connects: the server's URL (for Origin) and its collab endpoint. */
export interface CollabEndpoint {
  /** http://host:port */
  url: string;
  /** ws://host:port/collab: the y-websocket provider appends the sheet id. */
  collabUrl: string;
}

export interface CollabTestServer extends CollabEndpoint {
  server: TestServer;
  collab: CollabServer;
  dataSource: DataSource;
  close(): Promise<void>;
}

export function collabUrlOf(url: string): string {
  return `${url.replace(/^http/, 'ws')}/collab`;
}

export async function startCollabTestServer(): Promise<CollabTestServer> {
  const server = await startTestServer();
  const collab = collabServerOf(server.server);
  if (collab === undefined) throw new Error('the server has no co-editing endpoint attached');
  return {
    server,
    url: server.url,
    collabUrl: collabUrlOf(server.url),
    collab,
    dataSource: server.deps.dataSource,
    close: () => server.close(),
  };
}

export interface CollabUser {
  id: string;
  name: string;
  /** The Cookie header of a signed-in session. */
  cookie: string;
}

/** A user created in the database and signed in through the API. */
export async function signedInUser(server: TestServer, label: string): Promise<CollabUser> {
  const user = await createUser(server.deps.dataSource, label);
  const client = server.client();
  // The session (and its CSRF token) first, so the sign-in request carries the cookie.
  await client.csrf();
  await client.signIn(user.email, user.password);
  return { id: user.id, name: user.name, cookie: client.cookieHeader() };
}

export interface TestOrganization {
  organizationId: string;
  project: Project;
}

export async function createOrganizationWith(
  dataSource: DataSource,
  members: ReadonlyArray<{ user: { id: string }; role: Role }>,
): Promise<TestOrganization> {
  const organization = await insertOrganization(dataSource.manager, `Gantry Works ${Math.random().toString(36).slice(2, 8)}`);
  for (const { user, role } of members) await addMember(dataSource, organization.id, user.id, role);
  return { organizationId: organization.id, project: await createProjectIn(dataSource, organization.id) };
}

/** A sheet with this content in the organization's project; returns its id. */
export async function createSheetWith(dataSource: DataSource, organization: TestOrganization, content: SheetFileContent, createdBy: string): Promise<string> {
  const sheet = await createSheet(dataSource, organization.project, {
    title: content.title ?? 'Untitled',
    content,
    createdByUserId: createdBy,
  });
  return sheet.id;
}

/** A JSON request to the API as `user` (with the session's CSRF token and the page's Origin). */
export async function apiRequest(
  server: CollabEndpoint,
  user: CollabUser,
  method: string,
  path: string,
  body?: unknown,
): Promise<{ status: number; body: unknown }> {
  const csrf = await fetch(`${server.url}/api/auth/csrf`, { headers: { cookie: user.cookie } });
  const { token } = (await csrf.json()) as { token: string };
  const response = await fetch(`${server.url}${path}`, {
    method,
    headers: { cookie: user.cookie, 'x-csrf-token': token, origin: server.url, 'content-type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  const text = await response.text();
  return { status: response.status, body: text ? (JSON.parse(text) as unknown) : null };
}

/** The lifting-lug sheet most tests start from. */
export function lugSheet(): SheetFileContent {
  return {
    format: 'sheaf-sheet',
    version: 1,
    title: 'Lifting lug, weld toe',
    unitSystem: 'SI',
    cells: [
      { id: 'k1', kind: 'note', text: 'Load case LC2' },
      { id: 'k2', kind: 'quantity', name: 'F', expr: '18 kN' },
      { id: 'k3', kind: 'quantity', name: 'A', expr: '40 mm * 12 mm' },
      { id: 'k4', kind: 'stress', name: 'S', sx: 'F / A', sy: '0 MPa', txy: '22 MPa' },
      { id: 'k7', kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
    ],
  };
}

export interface CloseEventSeen {
  code: number;
  reason: string;
}

export interface TestClient {
  doc: Y.Doc;
  provider: WebsocketProvider;
  /** Every close the server sent this client, in order. */
  closes: CloseEventSeen[];
  /** Resolves once the client has the server's document (it received sync step 2). */
  synced(): Promise<void>;
  destroy(): void;
}

export interface ClientOptions {
  /** The session cookie; none for a signed-out client. */
  cookie?: string;
  /** The Origin header; the server's own URL unless given (null: send none). */
  origin?: string | null;
  doc?: Y.Doc;
  connect?: boolean;
}

/** A real y-websocket client for a sheet, speaking through Node's `ws` with a cookie and an Origin. */
export function connectClient(server: CollabEndpoint, sheetId: string, options: ClientOptions = {}): TestClient {
  const headers: Record<string, string> = {};
  if (options.cookie !== undefined) headers.cookie = options.cookie;
  const origin = options.origin === undefined ? server.url : options.origin;
  if (origin !== null) headers.origin = origin;
  class CookieWebSocket extends WebSocket {
    constructor(address: string, protocols?: string | string[]) {
      super(address, protocols, { headers });
    }
  }
  const doc = options.doc ?? new Y.Doc();
  const provider = new WebsocketProvider(server.collabUrl, sheetId, doc, {
    WebSocketPolyfill: CookieWebSocket as unknown as typeof globalThis.WebSocket,
    disableBc: true,
    connect: options.connect ?? true,
    maxBackoffTime: 500,
  });
  const closes: CloseEventSeen[] = [];
  provider.on('connection-close', (event) => {
    if (event) closes.push({ code: event.code, reason: event.reason });
  });
  return {
    doc,
    provider,
    closes,
    synced: () =>
      provider.synced
        ? Promise.resolve()
        : new Promise((resolve) => {
            const onSync = (state: boolean): void => {
              if (!state) return;
              provider.off('sync', onSync);
              resolve();
            };
            provider.on('sync', onSync);
          }),
    destroy: () => {
      provider.destroy();
      doc.destroy();
    },
  };
}

/** Poll until `check` holds; fails with `what` after `timeoutMs`. */
export async function waitFor(what: string, check: () => boolean | Promise<boolean>, timeoutMs = 15_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    if (await check()) return;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
}

/** What PostgreSQL holds for a sheet: the stored state, the log rows, and content and doc built from both. */
export interface StoredSheet {
  hasState: boolean;
  logRows: number;
  /** `sheets.yjs_state` with every log row applied, in id order. */
  doc: Y.Doc;
  /** `sheets.content` as stored. */
  content: SheetFileContent;
}

export async function readStoredSheet(dataSource: DataSource, sheetId: string): Promise<StoredSheet> {
  const [sheet] = (await dataSource.query(`SELECT yjs_state, content FROM sheets WHERE id = $1`, [sheetId])) as Array<{
    yjs_state: Buffer | null;
    content: SheetFileContent;
  }>;
  if (sheet === undefined) throw new Error(`no sheet ${sheetId}`);
  const rows = (await dataSource.query(`SELECT update FROM sheet_updates WHERE sheet_id = $1 ORDER BY id`, [sheetId])) as Array<{
    update: Buffer;
  }>;
  const doc = new Y.Doc();
  if (sheet.yjs_state !== null) Y.applyUpdate(doc, sheet.yjs_state);
  for (const row of rows) Y.applyUpdate(doc, row.update);
  return { hasState: sheet.yjs_state !== null, logRows: rows.length, doc, content: sheet.content };
}

/** True when `holder` has every insertion and deletion that `other` has. */
export function includesAll(holder: Y.Doc, other: Y.Doc): boolean {
  const missing = Y.decodeUpdate(Y.diffUpdate(Y.encodeStateAsUpdate(other), Y.encodeStateVector(holder)));
  if (missing.structs.length > 0) return false;
  const merged = new Y.Doc();
  Y.applyUpdate(merged, Y.encodeStateAsUpdate(holder));
  Y.applyUpdate(merged, Y.encodeStateAsUpdate(other));
  const same = JSON.stringify(sheetContentFromDoc(merged)) === JSON.stringify(sheetContentFromDoc(holder));
  merged.destroy();
  return same;
}

/** Wait until the server has unloaded the sheet's room (after storing and compacting). */
export async function waitForUnload(server: { collab: CollabServer }, sheetId: string): Promise<void> {
  await waitFor(`the room of ${sheetId} to unload`, () => !server.collab.openSheetIds().includes(sheetId));
}
