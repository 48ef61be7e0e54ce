import type * as Y from 'yjs';
import { orderedCellIds } from '../doc/cellOrder';
import { useDocSnapshot } from './useDocSnapshot';

const none: string[] = [];

/** The ids of the sheet's cells, top to bottom, as everyone in the sheet sees them now. */
export function useCellOrder(doc: Y.Doc | null): string[] {
  return useDocSnapshot(doc, orderedCellIds, none);
}
