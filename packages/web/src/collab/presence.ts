import type { Awareness } from 'y-protocols/awareness';

/** The `user` field the server stamps on every awareness state (see the collab README). */
export interface PresenceUser {
  id: string;
  name: string;
  colour: string;
}

/** One other open copy of the sheet: who, in which colour, and which cell they are in. */
export interface PresencePeer {
  clientId: number;
  user: PresenceUser;
  /** Id of the cell they are editing (awareness field `cell`), or null. */
  cell: string | null;
}

/** The awareness field that says which cell a person is working in. */
export const CELL_FIELD = 'cell';

/** Colour for a peer whose state arrived without the server's stamp (should not happen). */
const FALLBACK_COLOUR = '#57544c';

function userOf(value: unknown): PresenceUser | null {
  if (typeof value !== 'object' || value === null) return null;
  const { id, name, colour } = value as Record<string, unknown>;
  if (typeof id !== 'string' || typeof name !== 'string') return null;
  return { id, name, colour: typeof colour === 'string' ? colour : FALLBACK_COLOUR };
}

/**
 * The other clients in the sheet, from the awareness states: everyone but this client, and only
 * states the server stamped with a user. Ordered by name, then client id, so the bar is stable.
 */
export function peersOf(awareness: Pick<Awareness, 'getStates' | 'clientID'>): PresencePeer[] {
  const peers: PresencePeer[] = [];
  awareness.getStates().forEach((state, clientId) => {
    if (clientId === awareness.clientID) return;
    const user = userOf((state as Record<string, unknown>).user);
    if (!user) return;
    const cell = (state as Record<string, unknown>)[CELL_FIELD];
    peers.push({ clientId, user, cell: typeof cell === 'string' ? cell : null });
  });
  return peers.sort((a, b) => a.user.name.localeCompare(b.user.name) || a.clientId - b.clientId);
}

/** Peers grouped per person (one person may have the sheet open twice). */
export function peopleOf(peers: readonly PresencePeer[]): { user: PresenceUser; copies: number; cells: string[] }[] {
  const byUser = new Map<string, { user: PresenceUser; copies: number; cells: string[] }>();
  for (const peer of peers) {
    const entry = byUser.get(peer.user.id) ?? { user: peer.user, copies: 0, cells: [] };
    entry.copies += 1;
    if (peer.cell) entry.cells.push(peer.cell);
    byUser.set(peer.user.id, entry);
  }
  return [...byUser.values()];
}
