import { formatResult, isTheoryId, THEORIES, type CellResult, type UnitSystemId } from '@sheaf/engine';
import type { SheetContentV1 } from '@sheaf/engine/api';
import { VerdictLabel } from '../../components/VerdictShape';
import { verdictOf } from '../sheet/results/verdict';

interface CheckRow {
  id: string;
  number: number;
  name: string;
  theory: string;
  factor: string;
  required: string;
  /** Point sets: how many points, how many below the required factor. */
  points: string | null;
  result: CellResult | undefined;
}

/**
 * Every check of the calculation in one table, as the last page of a hand calculation sums them
 * up: the cell, its theory, the factor of safety (for a point set the least one), the factor
 * required and the verdict as shape and word. A check issued with an error says so.
 */
export function CheckSummary({
  cells,
  results,
  system,
}: {
  cells: SheetContentV1['cells'];
  results: ReadonlyMap<string, CellResult>;
  system: UnitSystemId;
}) {
  const rows = checkRows(cells, results, system);
  if (rows.length === 0) return null;
  return (
    <section aria-labelledby="check-summary" className="mt-5 break-inside-avoid">
      <h2 id="check-summary" className="mb-1 text-[1rem]">
        Summary of checks
      </h2>
      <table className="ruled text-[0.875rem]">
        <thead>
          <tr>
            <th>Cell</th>
            <th>Check</th>
            <th>Theory</th>
            <th className="text-right">Factor of safety</th>
            <th className="text-right">Required</th>
            <th>Verdict</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => {
            const verdict = row.result?.ok ? verdictOf(row.result) : null;
            return (
              <tr key={row.id} data-check={row.name}>
                <td className="font-mono text-ink-muted">{row.number}</td>
                <td className="font-mono font-medium">
                  <a href={`#cell-${row.id}`} className="hover:underline">
                    {row.name}
                  </a>
                </td>
                <td>
                  {row.theory}
                  {row.points ? <span className="block text-[0.8125rem] text-ink-muted">{row.points}</span> : null}
                </td>
                <td className="text-right font-mono">{row.factor}</td>
                <td className="text-right font-mono">{row.required}</td>
                <td>
                  {verdict ? (
                    <VerdictLabel verdict={verdict} />
                  ) : row.result && !row.result.ok ? (
                    <span className="text-fail">Error: {row.result.error.message}</span>
                  ) : (
                    '—'
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </section>
  );
}

function checkRows(cells: SheetContentV1['cells'], results: ReadonlyMap<string, CellResult>, system: UnitSystemId): CheckRow[] {
  const rows: CheckRow[] = [];
  cells.forEach((cell, index) => {
    if (cell.kind !== 'criterion' && cell.kind !== 'pointset') return;
    const result = results.get(cell.id);
    const theory = typeof cell.theory === 'string' && isTheoryId(cell.theory) ? THEORIES[cell.theory].label : String(cell.theory ?? '—');
    const formatted = result?.ok ? formatResult(result, system) : {};
    const factorKey = cell.kind === 'pointset' ? 'minFactor' : 'factor';
    const count = result?.ok ? result.values.count : undefined;
    const failing = result?.ok ? result.values.failing : undefined;
    rows.push({
      id: cell.id,
      number: index + 1,
      name: typeof cell.name === 'string' ? cell.name : `cell ${index + 1}`,
      theory,
      factor: formatted[factorKey]?.text ?? '—',
      required: formatted.required?.text ?? '—',
      points: typeof count === 'number' ? `${count} points, ${typeof failing === 'number' ? failing : 0} below the required factor` : null,
      result,
    });
  });
  return rows;
}
