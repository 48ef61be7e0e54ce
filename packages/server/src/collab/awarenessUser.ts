/**
 * The `user` field of a connection's awareness state is set by the server from the signed-in
 * user, whatever the client sent, so nobody can pose as someone else in the presence list.
 */
import type { AwarenessEntry } from './messages';

/** Who is on the other end of a connection, as the rest of the room sees them. */
export interface AwarenessUser {
  id: string;
  name: string;
  /** A CSS colour for the person's caret and selection, stable per user. */
  colour: string;
}

/**
 * Caret colours, dark enough to read as text on the paper-white sheet and distinct from one
 * another; a user keeps the same one in every sheet.
 */
const CARET_COLOURS = ['#b4451f', '#1f6fb4', '#2e8540', '#8a3ab9', '#b8860b', '#c2185b', '#00838f', '#5d4037'] as const;

export function awarenessUserOf(user: { id: string; name: string }): AwarenessUser {
  let hash = 0;
  for (let index = 0; index < user.id.length; index++) hash = (hash * 31 + user.id.charCodeAt(index)) >>> 0;
  return { id: user.id, name: user.name, colour: CARET_COLOURS[hash % CARET_COLOURS.length] ?? CARET_COLOURS[0] };
}

/**
 * Rewrite the entries of an awareness update that a connection sent: keep only the client ids the
 * connection may speak for, and stamp the server's `user` on every state it sets. A state that is
 * not an object becomes `{ user }`; null (the client left) stays null.
 *
 * @param mayClaim decides whether this connection may set the state of a client id (false when
 *   another connection already owns it, or when the connection claims too many)
 */
export function stampAwarenessEntries(
  entries: readonly AwarenessEntry[],
  user: AwarenessUser,
  mayClaim: (clientId: number) => boolean,
): AwarenessEntry[] {
  const stamped: AwarenessEntry[] = [];
  for (const entry of entries) {
    if (!mayClaim(entry.clientId)) continue;
    if (entry.state === null) {
      stamped.push(entry);
      continue;
    }
    const state = typeof entry.state === 'object' && !Array.isArray(entry.state) ? entry.state : {};
    stamped.push({ ...entry, state: { ...state, user } });
  }
  return stamped;
}
