import { sheetCells } from '@sheaf/sheet-doc';
import { useMemo, useSyncExternalStore } from 'react';
import * as Y from 'yjs';

/**
 * The Y.Text of a cell's field, or null when the field is missing or not text. Follows the
 * cell's map, so a field that is added, removed or replaced gives the new text.
 */
export function useCellText(doc: Y.Doc, cellId: string, field: string): Y.Text | null {
  const store = useMemo(() => cellTextStore(doc, cellId, field), [doc, cellId, field]);
  return useSyncExternalStore(store.subscribe, store.getSnapshot);
}

function cellTextStore(doc: Y.Doc, cellId: string, field: string) {
  const read = (): Y.Text | null => {
    const value = sheetCells(doc).get(cellId)?.get(field);
    return value instanceof Y.Text ? value : null;
  };
  return {
    subscribe(listener: () => void) {
      // The cell's map can appear later (a cell arriving from someone else), so listen on the doc.
      doc.on('afterTransaction', listener);
      return () => doc.off('afterTransaction', listener);
    },
    getSnapshot: read,
  };
}
