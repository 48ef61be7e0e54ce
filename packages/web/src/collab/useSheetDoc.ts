import { useEffect, useState, useSyncExternalStore } from 'react';
import type { Awareness } from 'y-protocols/awareness';
import type * as Y from 'yjs';
import type { ConnectionState } from './connectionState';
import {
  createSheetConnection,
  type ConnectionSnapshot,
  type SheetConnection,
} from './createSheetConnection';

export interface SheetDocHandle {
  /** The live document, once the connection object exists (null for the first render only). */
  doc: Y.Doc | null;
  awareness: Awareness | null;
  state: ConnectionState;
  /** True once the server's copy has arrived; before that the document is empty. */
  synced: boolean;
}

const initial: ConnectionSnapshot = { state: { kind: 'connecting' }, synced: false };
const noSubscription = () => () => {};
const initialSnapshot = () => initial;

/**
 * The live Yjs document of a sheet and the state of its connection. Opens `/collab/:sheetId`
 * when mounted (or when the id changes) and closes it, with this client's presence, on unmount.
 * `connect` is the factory, replaceable in tests.
 */
export function useSheetDoc(
  sheetId: string,
  connect: (sheetId: string) => SheetConnection = createSheetConnection,
): SheetDocHandle {
  const [connection, setConnection] = useState<SheetConnection | null>(null);
  useEffect(() => {
    const opened = connect(sheetId);
    setConnection(opened);
    return () => {
      opened.destroy();
      setConnection(null);
    };
  }, [sheetId, connect]);
  const snapshot = useSyncExternalStore(
    connection?.subscribe ?? noSubscription,
    connection?.getSnapshot ?? initialSnapshot,
  );
  return {
    doc: connection?.doc ?? null,
    awareness: connection?.awareness ?? null,
    state: snapshot.state,
    synced: snapshot.synced,
  };
}
