import { FieldSymbol } from '../fields/FieldSymbol';

/** How many rows a printed or issued point set lists before it summarizes the rest. */
export const LISTED_ROWS = 12;

const SYMBOLS: Record<string, [string, string]> = {
  sx: ['σ', 'x'],
  sy: ['σ', 'y'],
  txy: ['τ', 'xy'],
  sz: ['σ', 'z'],
  tyz: ['τ', 'yz'],
  tzx: ['τ', 'zx'],
};

/**
 * The rows of a point set as a document lists them: the first rows, the worst row wherever it
 * is, and how many there are in all (rows numbered from 0, as the engine's `worstRow` is), each column headed by the stress component it holds. A set
 * of thousands of points stays a few lines on paper; every row is in the sheet's content (and,
 * for an issued revision, under its content hash).
 */
export function PointRowsTable({
  rows,
  columns,
  unit,
  worstRow,
}: {
  rows: readonly (readonly number[])[];
  columns: Readonly<Record<string, unknown>>;
  unit: string;
  /** 0-based index of the row with the smallest factor, when the set evaluated. */
  worstRow: number | null;
}) {
  const width = Math.max(0, ...rows.map((row) => row.length));
  const heads = Array.from({ length: width }, (_, index) => Object.keys(SYMBOLS).find((key) => columns[key] === index) ?? null);
  const listed = rows.slice(0, LISTED_ROWS).map((row, index) => ({ row, index }));
  if (worstRow !== null && worstRow >= LISTED_ROWS && rows[worstRow]) listed.push({ row: rows[worstRow]!, index: worstRow });
  const rest = rows.length - listed.length;

  return (
    <div className="grid grid-cols-[4.5rem_minmax(0,1fr)] items-start gap-x-2" data-point-rows="">
      <span className="pt-0.5 text-right text-[0.8125rem] text-ink-muted">rows</span>
      <div className="min-w-0">
        <table className="font-mono text-[0.8125rem]" aria-label={`Points of the set, ${unit}`}>
          <thead>
            <tr className="text-ink-muted">
              <th className="pr-3 text-right font-normal">row</th>
              {heads.map((key, index) => (
                <th key={index} className="pr-3 text-right font-normal">
                  {key ? <FieldSymbol symbol={SYMBOLS[key]![0]} sub={SYMBOLS[key]![1]} /> : `column ${index + 1}`}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {listed.map(({ row, index }) => (
              <tr key={index} className={index === worstRow ? 'font-semibold' : ''} data-worst={index === worstRow ? 'true' : undefined}>
                <td className="pr-3 text-right text-ink-muted">{index}</td>
                {Array.from({ length: width }, (_, column) => (
                  <td key={column} className="pr-3 text-right">
                    {row[column] ?? ''}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        <p className="text-[0.75rem] text-ink-muted">
          {rows.length} {rows.length === 1 ? 'point' : 'points'} in {unit}
          {rest > 0 ? `; ${rest} more not listed here` : ''}
          {worstRow !== null && rows[worstRow] ? `; the worst, row ${worstRow}, in bold` : ''}.
        </p>
      </div>
    </div>
  );
}
