import type { ResultMismatch } from './resultMismatches';

/**
 * Said loudly when this browser's evaluation of an issued revision does not give the numbers that
 * were issued (a different engine version, a damaged record): which cell, which value, issued and
 * now. The values shown in the cells are the issued ones, but the equations and figures come from
 * the evaluation here, so the page must not pass for the issued calculation.
 */
export function IssuedResultsAlert({ mismatches }: { mismatches: readonly ResultMismatch[] }) {
  if (mismatches.length === 0) return null;
  const cells = [...new Set(mismatches.map((m) => m.cellName))];
  return (
    <div role="alert" className="my-3 border-[3px] border-fail bg-[#fbefec] px-3 py-2 text-ink print:bg-transparent" data-results-mismatch="">
      <p className="text-[1rem] font-semibold text-fail">
        Do not use this page as the issued calculation: its results could not be reproduced.
      </p>
      <p className="mt-1 text-[0.875rem]">
        Evaluated again here, {cells.length === 1 ? 'cell' : 'cells'} {cells.join(', ')} {cells.length === 1 ? 'gives' : 'give'} numbers
        other than those stored with the revision when it was approved. The values listed in the cells are the issued ones; the
        equations and figures beside them are computed here and may not match. Tell whoever looks after Sheaf, and read the
        issued results from the revision's record.
      </p>
      <table className="mt-2 font-mono text-[0.8125rem]">
        <thead>
          <tr className="text-left text-ink-muted">
            <th className="pr-4 font-normal">cell</th>
            <th className="pr-4 font-normal">value (SI)</th>
            <th className="pr-4 font-normal">issued</th>
            <th className="font-normal">now</th>
          </tr>
        </thead>
        <tbody>
          {mismatches.map((m) => (
            <tr key={`${m.cellId}:${m.key ?? ''}`}>
              <td className="pr-4">{m.cellName}</td>
              <td className="pr-4">{m.key ?? 'result'}</td>
              <td className="pr-4">{m.issued}</td>
              <td>{m.now}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
