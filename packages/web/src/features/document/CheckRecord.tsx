import type { RevisionDetail } from '@sheaf/engine/api';
import { describeError } from '../../api/ApiError';
import { useNoteThreads } from '../../api/notes';
import { NoteStateLabel } from '../review/NoteStateLabel';
import { NoteThreadCard } from '../review/NoteThreadCard';

/**
 * The record of the check: every note the checker and the preparer wrote on this revision, by the
 * cell it is about in the sheet's order, each thread with its replies and how it was resolved (by
 * whom, when), and the reason given when the revision was approved over notes still open.
 */
export function CheckRecord({ sheetId, revision }: { sheetId: string; revision: Pick<RevisionDetail, 'number' | 'content' | 'overrideReason' | 'openNotesAtApproval'> }) {
  const threads = useNoteThreads(sheetId, revision.number);
  const cells = revision.content.cells;
  const all = threads.data ?? [];
  const order = new Map(cells.map((cell, index) => [cell.id, index]));
  const byCell = new Map<string, typeof all>();
  for (const thread of all) byCell.set(thread.cellId, [...(byCell.get(thread.cellId) ?? []), thread]);
  const groups = [...byCell.entries()].sort(([a], [b]) => (order.get(a) ?? Infinity) - (order.get(b) ?? Infinity) || a.localeCompare(b));
  const open = all.filter((thread) => thread.status === 'open').length;

  return (
    <section aria-labelledby="check-record" className="mt-5">
      <h2 id="check-record" className="mb-1 flex flex-wrap items-baseline gap-x-3 text-[1rem]">
        Notes of the check
        {threads.data ? (
          <span className="text-[0.8125rem] font-normal">
            {all.length === 0 ? (
              <span className="text-ink-muted">none</span>
            ) : open > 0 ? (
              <NoteStateLabel state="open" count={open} />
            ) : (
              <NoteStateLabel state="resolved" count={all.length} />
            )}
          </span>
        ) : null}
      </h2>
      {revision.overrideReason ? (
        <p role="note" className="mb-2 border-l-2 border-low pl-2 text-[0.875rem]">
          Approved with {revision.openNotesAtApproval} {revision.openNotesAtApproval === 1 ? 'note' : 'notes'} still open, for this reason
          recorded at approval: “{revision.overrideReason}”
        </p>
      ) : null}
      {threads.isError ? (
        <p role="alert" className="text-fail">
          Could not load the notes of this revision: {describeError(threads.error)}
        </p>
      ) : null}
      {threads.isPending ? <p className="text-ink-muted">Loading the notes…</p> : null}
      {threads.data && all.length === 0 ? <p className="text-[0.875rem] text-ink-muted">No notes were written on this revision.</p> : null}
      <div className="space-y-3">
        {groups.map(([cellId, list]) => {
          const index = order.get(cellId);
          const cell = index === undefined ? undefined : cells[index];
          const name = typeof cell?.name === 'string' && cell.name ? cell.name : cell?.kind;
          const label = index === undefined ? `cell ${cellId} (not in this revision)` : `cell ${index + 1}, ${name}`;
          return (
            <section key={cellId} aria-label={`Notes on ${label}`} className="break-inside-avoid">
              <h3 className="mb-1 text-[0.8125rem] font-medium text-ink-muted">
                {index === undefined ? (
                  label
                ) : (
                  <a href={`#cell-${cellId}`} className="hover:underline">
                    Cell {index + 1} <span className="font-mono text-ink">{name}</span>
                  </a>
                )}
              </h3>
              <div className="grid gap-2 md:grid-cols-2">
                {list.map((thread) => (
                  <NoteThreadCard key={thread.id} sheetId={sheetId} thread={thread} canReply={false} canResolve={false} />
                ))}
              </div>
            </section>
          );
        })}
      </div>
    </section>
  );
}
