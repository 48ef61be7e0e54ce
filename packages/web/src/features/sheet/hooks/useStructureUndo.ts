import { sheetCells, sheetOrder } from '@sheaf/sheet-doc';
import { useCallback, useEffect, useRef } from 'react';
import * as Y from 'yjs';
import { STRUCTURE_ORIGIN } from '../doc/cellActions';

/**
 * Undo for this person's structural changes (cells added, duplicated, moved, deleted) — never
 * anybody else's, and never typing (each field has its own undo).
 */
export function useStructureUndo(doc: Y.Doc): { undo(): boolean } {
  const manager = useRef<Y.UndoManager | null>(null);
  useEffect(() => {
    const created = new Y.UndoManager([sheetOrder(doc), sheetCells(doc)], {
      trackedOrigins: new Set([STRUCTURE_ORIGIN]),
      captureTimeout: 0,
    });
    manager.current = created;
    return () => {
      created.destroy();
      if (manager.current === created) manager.current = null;
    };
  }, [doc]);
  const undo = useCallback(() => manager.current?.undo() != null, []);
  return { undo };
}
