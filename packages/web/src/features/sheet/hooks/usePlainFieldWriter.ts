import { sheetCells } from '@sheaf/sheet-doc';
import { useEffect, useMemo, useRef } from 'react';
import * as Y from 'yjs';
import type { PlainUndo } from '../expression/ExpressionEditor';

/**
 * Writing one plain (non-text) field of a cell, e.g. the `strength` object, with an undo of
 * this person's own writes to it: a Y.UndoManager on the cell's map that tracks only this
 * writer's transactions, made on the first write and dropped on unmount.
 */
export function usePlainFieldWriter(doc: Y.Doc, cellId: string): { write: (change: (fields: Y.Map<unknown>) => void) => void; undo: PlainUndo } {
  const manager = useRef<Y.UndoManager | null>(null);
  const origin = useMemo(() => ({ writer: cellId }), [cellId]);
  useEffect(
    () => () => {
      manager.current?.destroy();
      manager.current = null;
    },
    [doc, cellId],
  );
  return useMemo(() => {
    const ensure = (fields: Y.Map<unknown>) => {
      if (!manager.current) {
        manager.current = new Y.UndoManager(fields, { trackedOrigins: new Set([origin]), captureTimeout: 600 });
      }
    };
    return {
      write(change) {
        const fields = sheetCells(doc).get(cellId);
        if (!fields) return;
        ensure(fields);
        doc.transact(() => change(fields), origin);
      },
      undo: {
        undo: () => manager.current?.undo(),
        redo: () => manager.current?.redo(),
      },
    };
  }, [doc, cellId, origin]);
}
