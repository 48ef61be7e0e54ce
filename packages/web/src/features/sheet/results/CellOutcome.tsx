import type { CellResult, UnitSystemId } from '@sheaf/engine';
import { useMemo } from 'react';
import { VerdictLabel } from '../../../components/VerdictShape';
import { CellErrorNotice } from './CellErrorNotice';
import { ResultValues } from './ResultValues';
import { resultRows } from './resultRows';
import { EquationView } from './EquationView';
import { verdictOf } from './verdict';

/**
 * What a cell comes to, read top to bottom: the governing equation with the numbers put in,
 * the values in the sheet's units, and for checks the verdict as shape and word. A failed cell
 * shows its error value instead.
 */
export function CellOutcome({
  result,
  equation,
  system,
  cellName,
  errorId,
  rootLabel,
  onShowRoot,
}: {
  result: CellResult | undefined;
  equation: string | null;
  system: UnitSystemId;
  cellName: string;
  errorId: string;
  rootLabel?: string;
  onShowRoot?: () => void;
}) {
  const rows = useMemo(() => (result?.ok ? resultRows(result, system, cellName || 'value') : null), [result, system, cellName]);
  if (!result) return <p className="text-ink-faint">Evaluating…</p>;
  if (!result.ok) return <CellErrorNotice error={result.error} id={errorId} rootLabel={rootLabel} onShowRoot={onShowRoot} />;
  if (result.kind === 'note') return null;
  const verdict = verdictOf(result);
  const showValues = !(result.kind === 'quantity' && equation);

  return (
    <div className="space-y-2" data-result-state="ok">
      {equation ? <EquationView latex={equation} label={`Equation of ${cellName || 'the cell'}`} /> : null}
      {rows && showValues ? <ResultValues rows={rows.primary} label={`Results of ${cellName || 'the cell'}`} /> : null}
      {rows && !showValues ? (
        <p className="sr-only" data-value="value">
          {rows.primary[0]?.number} {rows.primary[0]?.unit}
        </p>
      ) : null}
      {verdict ? (
        <p className="flex items-center gap-2" data-verdict={verdict}>
          <VerdictLabel verdict={verdict} />
        </p>
      ) : null}
      {rows && rows.more.length > 0 ? (
        <details className="text-[0.875rem]">
          <summary className="cursor-pointer text-ink-muted">All values ({rows.more.length} more)</summary>
          <div className="mt-1">
            <ResultValues rows={rows.more} label={`More results of ${cellName || 'the cell'}`} />
          </div>
        </details>
      ) : null}
    </div>
  );
}
