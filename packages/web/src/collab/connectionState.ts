import { COLLAB_CLOSE, isFinalCloseCode } from '@sheaf/sheet-doc';

/**
 * Where the live connection of a sheet stands, as the editor shows it.
 *
 * - `connecting`: the first connection has not yet delivered the document.
 * - `live`: connected and in step with everyone else.
 * - `reconnecting`: the connection dropped after the document arrived; edits go on locally and
 *   merge when it returns (the provider retries with backoff).
 * - `saving-paused`: connected, but the server cannot store edits for now (its database is not
 *   reachable): the sheet is read-only until it says saving resumed; edits made before are kept
 *   here and sent again then.
 * - `signed-out`, `no-access`, `refused`: the server closed for good (a 44xx code); the provider
 *   has stopped and will not retry.
 */
export type ConnectionState =
  | { kind: 'connecting' }
  | { kind: 'live' }
  | { kind: 'reconnecting' }
  | { kind: 'saving-paused' }
  | { kind: 'signed-out' }
  | { kind: 'no-access'; code: number }
  | { kind: 'refused'; code: number; reason: string };

/** The state after the server closed the socket with `code`; null when the provider retries. */
export function stateAfterClose(code: number, reason = ''): ConnectionState | null {
  if (!isFinalCloseCode(code)) return null;
  if (code === COLLAB_CLOSE.notSignedIn) return { kind: 'signed-out' };
  if (code === COLLAB_CLOSE.forbidden || code === COLLAB_CLOSE.notFound) {
    return { kind: 'no-access', code };
  }
  return { kind: 'refused', code, reason };
}

/** The state when the provider reports a status change, given whether the document ever arrived. */
export function stateAfterStatus(
  status: 'connected' | 'disconnected' | 'connecting',
  synced: boolean,
): ConnectionState {
  if (status === 'connected' && synced) return { kind: 'live' };
  return synced ? { kind: 'reconnecting' } : { kind: 'connecting' };
}

/** True when the sheet can still change through this connection (now or after a retry). */
export function isConnectionUsable(state: ConnectionState): boolean {
  return state.kind === 'connecting' || state.kind === 'live' || state.kind === 'reconnecting';
}

export interface ConnectionNotice {
  /** `quiet` for passing states, `warn` for a connection that will come back, `stop` for the end. */
  tone: 'quiet' | 'warn' | 'stop';
  title: string;
  detail: string;
}

/**
 * What the banner above the sheet says, or null when there is nothing to say (live, with write
 * access). Read-only access is said even while live, so nobody wonders why typing does nothing.
 */
export function connectionNotice(state: ConnectionState, readOnly: boolean): ConnectionNotice | null {
  switch (state.kind) {
    case 'connecting':
      return {
        tone: 'quiet',
        title: 'Connecting…',
        detail: 'Showing the sheet as last saved; editing starts when the live copy arrives.',
      };
    case 'reconnecting':
      return {
        tone: 'warn',
        title: 'Reconnecting…',
        detail: readOnly
          ? 'The connection dropped. Changes by others will show again when it returns.'
          : 'The connection dropped. Keep working: your edits are kept here and merge when it returns.',
      };
    case 'saving-paused':
      return {
        tone: 'warn',
        title: 'Saving paused',
        detail: readOnly
          ? 'The server cannot save changes right now. Changes by others will show again when it can.'
          : 'The server cannot save changes right now, so the sheet is read-only for a moment. Your earlier edits are kept here and are sent again when saving resumes.',
      };
    case 'signed-out':
      return {
        tone: 'stop',
        title: 'Signed out',
        detail: 'Your session ended. Sign in again to go on editing; nothing typed since is sent.',
      };
    case 'no-access':
      return {
        tone: 'stop',
        title: 'No access',
        detail:
          state.code === COLLAB_CLOSE.notFound
            ? 'This sheet no longer exists, or you are no longer a member of its organization.'
            : 'The server refused the live connection to this sheet.',
      };
    case 'refused':
      return {
        tone: 'stop',
        title: 'Disconnected',
        detail: `The server closed the live connection (${state.code}${state.reason ? `: ${state.reason}` : ''}). Reload the page to try again.`,
      };
    case 'live':
      return readOnly
        ? {
            tone: 'quiet',
            title: 'Read-only',
            detail: 'Your role in this organization lets you read this sheet and follow changes live, not edit it.',
          }
        : null;
  }
}
