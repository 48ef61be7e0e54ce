import { useMemo, useSyncExternalStore } from 'react';
import { createSheetConnection, type SheetConnection } from './createSheetConnection';
import { sheetConnectionStore, type SheetDocHandle } from './sheetConnectionStore';

/**
 * The live Yjs document of a sheet and the state of its connection. Opens `/collab/:sheetId`
 * while the component is mounted and closes it, with this client's presence, afterwards.
 * `connect` opens the connection; tests pass their own.
 */
export function useSheetDoc(
  sheetId: string,
  connect: (sheetId: string) => SheetConnection = createSheetConnection,
): SheetDocHandle {
  const store = useMemo(() => sheetConnectionStore(sheetId, connect), [sheetId, connect]);
  return useSyncExternalStore(store.subscribe, store.getSnapshot);
}
