/**
 * Who is asking to co-edit which sheet, decided on the websocket upgrade request: express-session
 * and passport do not run on upgrades, so the session is read here by hand and passport's session
 * middleware run on it; then the permission table decides the role exactly as it does for
 * `/api/sheets/:sheetId`.
 */
import { ServerResponse, type IncomingMessage } from 'node:http';
import type { Request, RequestHandler, Response } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import { canEditSheet, decideAccess } from '../auth/permissions';
import { awarenessUserOf } from './awarenessUser';
import { COLLAB_CLOSE, type CollabCloseCode } from './closeCodes';
import { readSession, type SessionSource } from './readSession';
import type { ConnectionIdentity } from './SheetRoom';

/** The path of the endpoint: `/collab/<sheet id>` (the y-websocket client appends the room name). */
const COLLAB_PATH = /^\/collab\/([^/]+)\/?$/;

const SheetIdSchema = z.uuid();

/** The decision on an upgrade request. */
export type UpgradeDecision =
  | { kind: 'accept'; sheetId: string; identity: ConnectionIdentity }
  /** Refused before the handshake with an HTTP status (the path or the origin is wrong). */
  | { kind: 'reject-http'; status: 403 | 404; reason: string }
  /** Refused after the handshake with a close code the client can read. */
  | { kind: 'reject-close'; code: CollabCloseCode };

export interface UpgradeAuthorizerDeps {
  dataSource: DataSource;
  /** Where the app's sessions are: the same store, cookie name and secret. */
  session: SessionSource;
  /** Passport's session middleware of the app's authenticator (`authenticator.session()`). */
  passportSession: RequestHandler;
  /** Origins browsers may open the websocket from. */
  isAllowedOrigin: (origin: string) => boolean;
}

/** The sheet id of a collab path, or null when the path is not the collab endpoint. */
export function collabSheetIdOf(url: string | undefined): string | null {
  const pathname = new URL(url ?? '/', 'http://collab.invalid').pathname;
  const match = COLLAB_PATH.exec(pathname);
  if (match === null || match[1] === undefined) return null;
  try {
    return decodeURIComponent(match[1]);
  } catch {
    return null;
  }
}

/**
 * Origins allowed to open the websocket: the public URL's, and outside production any page served
 * from this machine (localhost, 127.0.0.1, [::1] on any port: the dev server and tests).
 */
export function originChecker(publicUrl: string | undefined, production: boolean): (origin: string) => boolean {
  const publicOrigin = publicUrl === undefined ? null : new URL(publicUrl).origin;
  return (origin) => {
    if (origin === publicOrigin) return true;
    if (production) return false;
    try {
      const { protocol, hostname } = new URL(origin);
      return (protocol === 'http:' || protocol === 'https:') && ['localhost', '127.0.0.1', '[::1]'].includes(hostname);
    } catch {
      return false;
    }
  };
}

/** Decide an upgrade request. Never throws for a bad request; a database failure rejects. */
export async function authorizeUpgrade(request: IncomingMessage, deps: UpgradeAuthorizerDeps): Promise<UpgradeDecision> {
  const sheetId = collabSheetIdOf(request.url);
  if (sheetId === null) return { kind: 'reject-http', status: 404, reason: 'no such endpoint' };
  // Browsers always send Origin on websockets; a page from another site must not ride on the
  // user's cookie. No Origin at all means no browser page, and the session is still required.
  const origin = request.headers.origin;
  if (origin !== undefined && !deps.isAllowedOrigin(origin)) {
    return { kind: 'reject-http', status: 403, reason: 'origin not allowed' };
  }

  const user = await signedInUser(request, deps);
  if (user === null) return { kind: 'reject-close', code: COLLAB_CLOSE.notSignedIn };

  const target = SheetIdSchema.safeParse(sheetId).success ? await sheetOrganization(deps.dataSource, sheetId) : null;
  const decision = await decideAccess(deps.dataSource, user.id, 'sheet.read', target, 'sheet');
  if (!decision.ok) {
    const status = decision.error.status;
    const code = status === 401 ? COLLAB_CLOSE.notSignedIn : status === 403 ? COLLAB_CLOSE.forbidden : COLLAB_CLOSE.notFound;
    return { kind: 'reject-close', code };
  }
  return {
    kind: 'accept',
    sheetId,
    identity: { user: awarenessUserOf(user), writable: canEditSheet(decision.grant.role) },
  };
}

/**
 * Loads the request's session, then runs passport's session middleware on it (the app's
 * deserializeUser: a deleted user is no user); the signed-in user or null. Nothing is saved: the
 * session is only read.
 */
async function signedInUser(request: IncomingMessage, deps: UpgradeAuthorizerDeps): Promise<Express.User | null> {
  const session = await readSession(request, deps.session);
  if (session === null) return null;
  const req = request as Request;
  req.session = session as Request['session'];
  // Passport may set headers on it but nothing is ever written: the answer is a websocket.
  const res = new ServerResponse(request) as unknown as Response;
  await runMiddleware(deps.passportSession, req, res);
  return req.user ?? null;
}

function runMiddleware(middleware: RequestHandler, req: Request, res: Response): Promise<void> {
  return new Promise((resolve, reject) => {
    const result = middleware(req, res, (error?: unknown) => {
      if (error) reject(error instanceof Error ? error : new Error(String(error)));
      else resolve();
    }) as unknown;
    if (result instanceof Promise) result.catch(reject);
  });
}

/** The organization of a sheet, read without its content or state (which can be large). */
async function sheetOrganization(dataSource: DataSource, sheetId: string): Promise<{ organizationId: string } | null> {
  const rows: Array<{ organization_id: string }> = await dataSource.query(
    `SELECT organization_id FROM sheets WHERE id = $1`,
    [sheetId],
  );
  const row = rows[0];
  return row === undefined ? null : { organizationId: row.organization_id };
}
