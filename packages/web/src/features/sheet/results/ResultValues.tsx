import { FieldSymbol } from '../fields/FieldSymbol';
import type { ResultRow } from './resultRows';

/** Result values as a compact ruled list: symbol = number unit, numbers aligned in the mono face. */
export function ResultValues({ rows, label }: { rows: readonly ResultRow[]; label: string }) {
  if (rows.length === 0) return null;
  return (
    <dl aria-label={label} className="grid grid-cols-[repeat(auto-fill,minmax(11.5rem,1fr))] gap-x-4 gap-y-0.5 print:grid-cols-[repeat(auto-fill,minmax(9.5rem,1fr))]">
      {rows.map((row) => (
        <div key={row.key} className="flex items-baseline gap-1.5 border-b border-paper-line py-0.5" data-value={row.key}>
          <dt className="min-w-[4.5rem] shrink-0 text-right text-ink-muted" title={row.meaning}>
            <FieldSymbol symbol={row.symbol} sub={row.sub} />
          </dt>
          <dd className="m-0 font-mono whitespace-nowrap">
            <span aria-hidden="true" className="text-ink-faint">
              ={' '}
            </span>
            <span data-number>{row.number}</span>
            {row.unit ? <span className="ml-1 text-ink-muted">{row.unit}</span> : null}
          </dd>
        </div>
      ))}
    </dl>
  );
}
