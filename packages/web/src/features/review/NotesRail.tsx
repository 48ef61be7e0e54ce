import { useMemo, useRef, useState, type RefObject } from 'react';
import type { NoteThread } from '@sheaf/engine/api';
import { describeError } from '../../api/ApiError';
import { useNoteThreads } from '../../api/notes';
import { useReviewState } from '../../api/review';
import { SelectField } from '../../components/SelectField';
import { NoteComposer } from './NoteComposer';
import { NoteStateLabel } from './NoteStateLabel';
import { NoteThreadCard } from './NoteThreadCard';
import { useRailAlignment } from './useRailAlignment';

export interface NotesRailProps {
  sheetId: string;
  /** The sheet's cells in order (stable ids), so threads follow the cells. */
  cellIds: readonly string[];
  /** What to call each cell (its name, or "note 3"); the id otherwise. */
  cellLabels?: Readonly<Record<string, string>>;
  /** The element holding the cells (`[data-cell-id]`), to keep each group level with its cell. */
  cellsRef?: RefObject<HTMLElement | null>;
  /** Show the threads opened on this past revision, read-only. */
  revision?: number;
}

/**
 * The notes beside the sheet: threads grouped by the cell they are about, in the sheet's order
 * and level with their cells, each with its replies, state and controls; a form to write a note
 * on any cell. Notes on cells no longer in the sheet are kept at the end.
 */
export function NotesRail({ sheetId, cellIds, cellLabels = {}, cellsRef, revision }: NotesRailProps) {
  const threads = useNoteThreads(sheetId, revision);
  const review = useReviewState(sheetId);
  const [showResolved, setShowResolved] = useState(revision !== undefined);
  const [writingOn, setWritingOn] = useState<string | null>(null);
  const [newCell, setNewCell] = useState('');
  const rail = useRef<HTMLDivElement>(null);
  const fallbackCells = useRef<HTMLElement>(null);
  const readOnly = revision !== undefined;
  const canCreate = !readOnly && review.data?.can.createNotes === true;
  const canResolve = !readOnly && review.data?.can.resolveNotes === true;

  const groups = useMemo(() => groupByCell(threads.data ?? [], cellIds, showResolved), [threads.data, cellIds, showResolved]);
  const withComposer = writingOn !== null && !groups.some((g) => g.cellId === writingOn) ? insertGroup(groups, writingOn, cellIds) : groups;
  useRailAlignment(rail, cellsRef ?? fallbackCells, `${withComposer.map((g) => `${g.cellId}:${g.threads.length}`).join()}|${writingOn}`);

  const label = (cellId: string) => cellLabels[cellId] ?? cellId;
  const all = threads.data ?? [];
  const open = all.filter((t) => t.status === 'open').length;
  const resolved = all.length - open;

  return (
    <aside aria-label={readOnly ? `Notes made on revision ${revision}` : 'Notes'} className="min-w-0 text-[0.8125rem]">
      <div className="mb-2 flex flex-wrap items-baseline justify-between gap-2 border-b border-paper-rule pb-1">
        <h2 className="text-[0.9375rem]">{readOnly ? `Notes on revision ${revision}` : 'Notes'}</h2>
        <span className="flex flex-wrap gap-3">
          {open > 0 ? <NoteStateLabel state="open" count={open} /> : <span className="text-ink-muted">no open notes</span>}
          {resolved > 0 ? (
            <label className="inline-flex items-center gap-1 text-ink-muted">
              <input type="checkbox" checked={showResolved} onChange={(event) => setShowResolved(event.target.checked)} />
              show {resolved} resolved
            </label>
          ) : null}
        </span>
      </div>
      {threads.isError ? (
        <p role="alert" className="text-fail">
          Could not load the notes: {describeError(threads.error)}
        </p>
      ) : null}
      {canCreate && cellIds.length > 0 ? (
        <form
          className="mb-3 flex items-end gap-2"
          onSubmit={(event) => {
            event.preventDefault();
            if (newCell) setWritingOn(newCell);
          }}
        >
          <SelectField label="Write a note on" name="cellId" value={newCell} onChange={(event) => setNewCell(event.target.value)} className="min-w-0 flex-1">
            <option value="">Choose a cell…</option>
            {cellIds.map((id) => (
              <option key={id} value={id}>
                {label(id)}
              </option>
            ))}
          </SelectField>
          <button type="submit" className="btn" disabled={!newCell}>
            Write
          </button>
        </form>
      ) : null}
      {threads.data && withComposer.length === 0 ? (
        <p className="text-ink-muted">{readOnly ? 'No notes were made on this revision.' : open === 0 && resolved > 0 ? 'Every note is resolved.' : 'No notes yet.'}</p>
      ) : null}
      <div ref={rail}>
        {withComposer.map((group) => (
          <section
            key={group.cellId}
            id={`notes-${group.cellId}`}
            tabIndex={-1}
            data-rail-cell={group.cellId}
            aria-label={`Notes on ${label(group.cellId)}`}
            className="mt-3 first:mt-0"
          >
            <h3 className="mb-1 flex items-baseline gap-2 text-[0.75rem] font-medium tracking-[0.04em] text-ink-muted uppercase">
              <span>{group.known ? label(group.cellId) : `${label(group.cellId)} (no longer in the sheet)`}</span>
            </h3>
            <div className="grid gap-2">
              {group.threads.map((thread) => (
                <NoteThreadCard key={thread.id} sheetId={sheetId} thread={thread} canReply={canCreate} canResolve={canResolve} />
              ))}
            </div>
            {canCreate && group.known ? (
              writingOn === group.cellId ? (
                <NoteComposer sheetId={sheetId} cellId={group.cellId} label={`New note on ${label(group.cellId)}`} onDone={() => setWritingOn(null)} autoFocus />
              ) : (
                <button type="button" className="mt-1 text-[0.8125rem] underline" onClick={() => setWritingOn(group.cellId)}>
                  Add a note on {label(group.cellId)}
                </button>
              )
            ) : null}
          </section>
        ))}
      </div>
    </aside>
  );
}

interface CellGroup {
  cellId: string;
  /** False for a cell that is no longer in the sheet. */
  known: boolean;
  threads: NoteThread[];
}

function groupByCell(threads: readonly NoteThread[], cellIds: readonly string[], showResolved: boolean): CellGroup[] {
  const shown = threads.filter((t) => showResolved || t.status === 'open');
  const byCell = new Map<string, NoteThread[]>();
  for (const thread of shown) byCell.set(thread.cellId, [...(byCell.get(thread.cellId) ?? []), thread]);
  const inSheet = cellIds.filter((id) => byCell.has(id)).map((id) => ({ cellId: id, known: true, threads: byCell.get(id) ?? [] }));
  const gone = [...byCell.keys()].filter((id) => !cellIds.includes(id)).sort().map((id) => ({ cellId: id, known: false, threads: byCell.get(id) ?? [] }));
  return [...inSheet, ...gone];
}

/** The groups with an empty one for `cellId` at its place in the sheet's order (for a first note). */
function insertGroup(groups: readonly CellGroup[], cellId: string, cellIds: readonly string[]): CellGroup[] {
  const order = new Map(cellIds.map((id, index) => [id, index]));
  const at = order.get(cellId) ?? Number.MAX_SAFE_INTEGER;
  const index = groups.findIndex((g) => (order.get(g.cellId) ?? Number.MAX_SAFE_INTEGER) > at);
  const group = { cellId, known: true, threads: [] };
  return index < 0 ? [...groups, group] : [...groups.slice(0, index), group, ...groups.slice(index)];
}
