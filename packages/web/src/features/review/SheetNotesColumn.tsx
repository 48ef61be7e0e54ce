import { useMemo, type RefObject } from 'react';
import type { SheetDetail } from '../../api/types';
import { NotesRail } from './NotesRail';
import { useCellsInPage } from './useCellsInPage';

/**
 * The notes rail of the live sheet page: it follows the cells shown under `cellsRef` (the live
 * editor's cards), falling back to the cells of the sheet as last saved.
 */
export function SheetNotesColumn({ sheet, cellsRef }: { sheet: SheetDetail; cellsRef: RefObject<HTMLElement | null> }) {
  const saved = useMemo(
    () => ({
      ids: sheet.content.cells.map((cell) => cell.id),
      labels: Object.fromEntries(
        sheet.content.cells.map((cell, index) => [cell.id, typeof cell.name === 'string' && cell.name ? `${index + 1}. ${cell.name}` : `${index + 1}. ${cell.kind}`]),
      ),
    }),
    [sheet.content.cells],
  );
  const cells = useCellsInPage(cellsRef, saved);
  return <NotesRail sheetId={sheet.id} cellIds={cells.ids} cellLabels={cells.labels} cellsRef={cellsRef} />;
}
