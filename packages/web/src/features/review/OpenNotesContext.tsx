import { createContext, useContext, type ReactNode } from 'react';
import { CellNoteBadge } from './CellNoteBadge';
import { useOpenNotesByCell } from './useOpenNotesByCell';

const OpenNotes = createContext<ReadonlyMap<string, number> | null>(null);

/**
 * Makes the open-note counts of a sheet available to its cells, so a cell shows its badge
 * without the sheet editor knowing about notes: wrap the editor in it, and put
 * `<CellOpenNotesBadge cellId>` in the cell's header.
 */
export function OpenNotesProvider({ sheetId, children }: { sheetId: string; children: ReactNode }) {
  const counts = useOpenNotesByCell(sheetId);
  return <OpenNotes.Provider value={counts}>{children}</OpenNotes.Provider>;
}

/** The open-notes badge of one cell; nothing outside an OpenNotesProvider or with no open notes. */
export function CellOpenNotesBadge({ cellId, cellLabel }: { cellId: string; cellLabel?: string }) {
  const counts = useContext(OpenNotes);
  return <CellNoteBadge cellId={cellId} count={counts?.get(cellId) ?? 0} cellLabel={cellLabel} />;
}
