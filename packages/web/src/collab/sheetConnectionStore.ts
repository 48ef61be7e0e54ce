import type { Awareness } from 'y-protocols/awareness';
import type * as Y from 'yjs';
import type { ConnectionState } from './connectionState';
import type { SheetConnection } from './createSheetConnection';

/** What the sheet page sees of its live connection. */
export interface SheetDocHandle {
  /** The live document (null until the first subscriber opened the connection). */
  doc: Y.Doc | null;
  awareness: Awareness | null;
  state: ConnectionState;
  /** True once the server's copy has arrived; before that the document is empty. */
  synced: boolean;
}

const closedHandle: SheetDocHandle = {
  doc: null,
  awareness: null,
  state: { kind: 'connecting' },
  synced: false,
};

/**
 * A connection opened by its first subscriber and closed when the last one leaves — a tick
 * later, so React's mount-unmount-mount in development reuses it instead of reconnecting.
 */
export function sheetConnectionStore(
  sheetId: string,
  connect: (sheetId: string) => SheetConnection,
) {
  let connection: SheetConnection | null = null;
  let stopListening: (() => void) | null = null;
  let handle = closedHandle;
  let subscribers = 0;
  let closeTimer: ReturnType<typeof setTimeout> | undefined;
  const listeners = new Set<() => void>();

  const refresh = () => {
    if (!connection) return;
    const { state, synced } = connection.getSnapshot();
    handle = { doc: connection.doc, awareness: connection.awareness, state, synced };
    for (const listener of listeners) listener();
  };

  return {
    subscribe(listener: () => void) {
      listeners.add(listener);
      subscribers += 1;
      clearTimeout(closeTimer);
      if (!connection) {
        connection = connect(sheetId);
        stopListening = connection.subscribe(refresh);
        refresh();
      }
      return () => {
        listeners.delete(listener);
        subscribers -= 1;
        if (subscribers > 0) return;
        closeTimer = setTimeout(() => {
          if (subscribers > 0 || !connection) return;
          stopListening?.();
          connection.destroy();
          connection = null;
          handle = closedHandle;
        }, 0);
      };
    },
    getSnapshot: (): SheetDocHandle => handle,
  };
}
