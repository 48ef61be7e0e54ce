import { cellFromDoc, type SheetFileCell } from '@sheaf/sheet-doc';
import { useCallback } from 'react';
import type * as Y from 'yjs';
import { useDocSnapshot } from './useDocSnapshot';

/**
 * A cell's fields as plain JSON (Y.Text fields as strings), re-read after every change to the
 * document; undefined once the cell is gone. Editors bind to the Y.Text itself; this is for the
 * choices, references and optional fields a view shows around them.
 */
export function useCellFields(doc: Y.Doc, cellId: string): SheetFileCell | undefined {
  const read = useCallback((d: Y.Doc) => cellFromDoc(d, cellId), [cellId]);
  return useDocSnapshot(doc, read, undefined);
}
