import type { Awareness } from 'y-protocols/awareness';

/**
 * The awareness as y-codemirror.next reads it. The server stamps `user.colour`; the editor's
 * remote carets read `user.color` and `user.colorLight`, so states are handed over with those
 * added. Everything else passes straight through to the real awareness.
 */
export function editorAwareness(awareness: Awareness) {
  return {
    get doc() {
      return awareness.doc;
    },
    get clientID() {
      return awareness.clientID;
    },
    getLocalState: () => awareness.getLocalState(),
    setLocalStateField: (field: string, value: unknown) => awareness.setLocalStateField(field, value),
    getStates: () => {
      const states = new Map<number, Record<string, unknown>>();
      awareness.getStates().forEach((state, clientId) => {
        const user = (state as { user?: { name?: string; colour?: string } }).user;
        const colour = user?.colour;
        states.set(
          clientId,
          colour ? { ...state, user: { ...user, color: colour, colorLight: `${colour}33` } } : state,
        );
      });
      return states;
    },
    on: (event: 'change' | 'update', listener: (...args: never[]) => void) =>
      awareness.on(event, listener as never),
    off: (event: 'change' | 'update', listener: (...args: never[]) => void) =>
      awareness.off(event, listener as never),
  };
}
