/**
 * Websocket close codes of the co-editing endpoint `/collab/:sheetId`.
 *
 * The 4400-4499 range mirrors HTTP 4xx: a deliberate refusal that reconnecting cannot fix, and the
 * y-websocket client stops reconnecting on it by default. Codes outside that range (4500-4599,
 * and the standard ones) are transient: the client reconnects with backoff.
 */
export const COLLAB_CLOSE = {
  /** A message the server could not read (a client bug); reconnecting would send it again. */
  badRequest: 4400,
  /** No signed-in user on the upgrade request: sign in, then connect again. */
  notSignedIn: 4401,
  /** Signed in, but the connection is not allowed (the page's origin, or access was taken away). */
  forbidden: 4403,
  /** No such sheet, or the user is not a member of its organization (the two look the same). */
  notFound: 4404,
  /** The server could not open the sheet (the database is unreachable, say): try again later. */
  unavailable: 4500,
  /** The server is shutting down or restarting: reconnect with backoff. */
  shuttingDown: 4503,
  /**
   * The sheet's status changed (submitted for check, returned, reassigned): reconnect, and the new
   * connection is read-only or writable as the status now allows. Unsaved local edits made on a
   * sheet that went into check are not stored; the editor should reload the sheet.
   */
  statusChanged: 4509,
} as const;

export type CollabCloseCode = (typeof COLLAB_CLOSE)[keyof typeof COLLAB_CLOSE];

/** Reasons sent with each close code (at most 123 bytes, as the protocol allows). */
export const COLLAB_CLOSE_REASON: Readonly<Record<CollabCloseCode, string>> = {
  [COLLAB_CLOSE.badRequest]: 'malformed message',
  [COLLAB_CLOSE.notSignedIn]: 'not signed in',
  [COLLAB_CLOSE.forbidden]: 'forbidden',
  [COLLAB_CLOSE.notFound]: 'sheet not found',
  [COLLAB_CLOSE.unavailable]: 'sheet unavailable, try again later',
  [COLLAB_CLOSE.shuttingDown]: 'server shutting down',
  [COLLAB_CLOSE.statusChanged]: 'sheet status changed, reconnect',
};

/** True when the client should stop reconnecting after the server closed with `code`. */
export function isFinalCloseCode(code: number): boolean {
  return code >= 4400 && code < 4500;
}

/**
 * Messages of our own on the co-editing socket, beside y-websocket's (0 sync, 1 awareness, 2 auth,
 * 3 query awareness). Each is varUint-encoded: the type, then its payload.
 *
 * `saving` (payload: one `SAVING_STATE`) says whether the room can store edits. Every edit is
 * stored before anyone else sees it; while the database cannot be reached, edits wait in the
 * server's memory up to a bound, and then the room says `paused`: it is read-only for now, takes
 * no edits, and the client should stop editing and keep what it has. `resumed` follows as soon as
 * storing works again, together with a sync request, so the client sends whatever the room lacks
 * and nothing typed is lost. A client that connects while saving is paused is told at once.
 */
export const COLLAB_MESSAGE = {
  saving: 100,
} as const;

export const SAVING_STATE = {
  resumed: 0,
  paused: 1,
} as const;

export type SavingState = (typeof SAVING_STATE)[keyof typeof SAVING_STATE];
