import { forwardRef, useMemo } from 'react';
import type { RevisionDetail } from '@sheaf/engine/api';
import { VerdictLabel } from '../../components/VerdictShape';
import { revisionResultRows } from './revisionResultRows';
import { resultLabel } from './resultLabels';

/** Result keys worth a line in the compact view of a past revision, in this order. */
const SHOWN_KEYS = ['value', 'sx', 'sy', 'txy', 'p1', 'p2', 's1', 's2', 's3', 'thetaP', 'tauMax', 'vonMises', 'equivalent', 'factor', 'margin', 'required', 'minFactor', 'failing', 'count'];

/**
 * The cells of an issued revision, read-only: each cell's inputs as written and the results it
 * was issued with (the server's), with the verdict of each check as shape and word. Each item
 * carries `data-cell-id`, so the notes rail can sit level with it.
 */
export const RevisionCells = forwardRef<HTMLOListElement, { revision: Pick<RevisionDetail, 'content' | 'results'> }>(function RevisionCells(
  { revision },
  ref,
) {
  const results = useMemo(() => revisionResultRows(revision), [revision]);
  const cells = revision.content.cells;
  if (cells.length === 0) return <p className="py-4 text-ink-muted">This revision has no cells.</p>;
  return (
    <ol ref={ref} className="divide-y divide-paper-line border-y border-paper-line">
      {cells.map((cell, index) => {
        const result = results.get(cell.id);
        const rows = (result?.rows ?? []).filter((row) => SHOWN_KEYS.includes(row.key));
        return (
          <li key={cell.id} data-cell-id={cell.id} className="grid grid-cols-[2.5rem_1fr] gap-x-3 py-2">
            <span className="pt-0.5 text-right font-mono text-[0.8125rem] text-ink-faint">{index + 1}</span>
            <div className="min-w-0">
              <p className="flex flex-wrap items-baseline gap-x-2">
                <span className="rounded-[2px] border border-paper-rule px-1.5 text-[0.75rem] tracking-[0.04em] text-ink-muted uppercase">{cell.kind}</span>
                {typeof cell.name === 'string' && cell.name ? <span className="font-mono font-medium">{cell.name}</span> : null}
                {result?.verdict ? <VerdictLabel verdict={result.verdict} /> : null}
              </p>
              <dl className="mt-1 grid grid-cols-[max-content_1fr] gap-x-3 font-mono text-[0.8125rem]">
                {inputsOf(cell).map(([field, value]) => (
                  <div key={field} className="contents">
                    <dt className="text-ink-muted">{field}</dt>
                    <dd className="break-words whitespace-pre-wrap">{value}</dd>
                  </div>
                ))}
              </dl>
              {result?.error ? <p className="mt-1 text-[0.8125rem] text-fail">Issued with an error — {result.error}</p> : null}
              {rows.length > 0 ? (
                <dl className="mt-1 grid grid-cols-[max-content_1fr] gap-x-3 border-t border-dashed border-paper-line pt-1 text-[0.8125rem]">
                  {rows.map((row) => (
                    <div key={row.key} className="contents">
                      <dt className="text-ink-muted">
                        <span className="font-mono">{row.key}</span>
                        {resultLabel(row.key) ? <span className="ml-1">{resultLabel(row.key)}</span> : null}
                      </dt>
                      <dd className="font-mono">{row.text}</dd>
                    </div>
                  ))}
                </dl>
              ) : null}
            </div>
          </li>
        );
      })}
    </ol>
  );
});

function inputsOf(cell: { id: string; [field: string]: unknown }): [string, string][] {
  return Object.entries(cell)
    .filter(([field]) => field !== 'id' && field !== 'kind' && field !== 'name')
    .map(([field, value]) => [field, typeof value === 'string' ? value : JSON.stringify(value)]);
}
