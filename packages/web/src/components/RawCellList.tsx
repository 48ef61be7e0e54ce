import type { SheetCell } from '../api/types';

/**
 * The cells of a sheet exactly as stored in the file (format v1): kind, name, and each field's
 * raw text. Nothing is evaluated here; the sheet editor, a later piece of work, replaces this
 * list with live cells.
 */
export function RawCellList({ cells }: { cells: SheetCell[] }) {
  if (cells.length === 0) {
    return <p className="py-4 text-ink-muted">This sheet has no cells yet.</p>;
  }
  return (
    <ol className="divide-y divide-paper-line border-y border-paper-line">
      {cells.map((cell, index) => (
        <li key={cell.id} className="grid grid-cols-[2.5rem_1fr] gap-x-3 py-2">
          <span className="pt-0.5 text-right font-mono text-[0.8125rem] text-ink-faint">
            {index + 1}
          </span>
          <div className="min-w-0">
            <p className="flex flex-wrap items-baseline gap-x-2">
              <span className="rounded-[2px] border border-paper-rule px-1.5 text-[0.75rem] tracking-[0.04em] text-ink-muted uppercase">
                {cell.kind}
              </span>
              {typeof cell.name === 'string' && cell.name ? (
                <span className="font-mono font-medium">{cell.name}</span>
              ) : null}
              <span className="font-mono text-[0.75rem] text-ink-faint">id {cell.id}</span>
            </p>
            <dl className="mt-1 grid grid-cols-[max-content_1fr] gap-x-3 font-mono text-[0.8125rem]">
              {fieldsOf(cell).map(([field, value]) => (
                <div key={field} className="contents">
                  <dt className="text-ink-muted">{field}</dt>
                  <dd className="break-words whitespace-pre-wrap">{value}</dd>
                </div>
              ))}
            </dl>
          </div>
        </li>
      ))}
    </ol>
  );
}

/** The kind-specific fields of a cell, each as raw text (objects as compact JSON). */
function fieldsOf(cell: SheetCell): [string, string][] {
  return Object.entries(cell)
    .filter(([field]) => field !== 'id' && field !== 'kind' && field !== 'name')
    .map(([field, value]) => [field, typeof value === 'string' ? value : JSON.stringify(value)]);
}
