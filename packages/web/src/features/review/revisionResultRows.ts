import { createEvaluator, formatResult, machineCellsById, type CellOk, type MachineOutput } from '@sheaf/engine';
import type { RevisionDetail } from '@sheaf/engine/api';

/** One cell's stored results, ready to show. */
export interface StoredCellResult {
  /** The cell's error as issued, if it had one. */
  error: string | null;
  rows: { key: string; text: string }[];
  /** The check's verdict as issued (criterion and point-set cells). */
  verdict: 'pass' | 'fail' | null;
}

/**
 * The results a revision was issued with (computed by the server at approval), by cell id,
 * written in the revision's unit system. The content is evaluated here only to learn what each
 * value measures (a stress, a length, a ratio); the numbers shown are the stored ones.
 */
export function revisionResultRows(revision: Pick<RevisionDetail, 'content' | 'results'>): Map<string, StoredCellResult> {
  const cells = revision.content.cells;
  const system = revision.content.unitSystem === 'US' ? 'US' : 'SI';
  const measures = new Map<string, CellOk['measures']>();
  for (const [id, result] of createEvaluator({ cells }).results) if (result.ok) measures.set(id, result.measures);
  const out = new Map<string, StoredCellResult>();
  for (const [id, stored] of machineCellsById(cells, revision.results as MachineOutput)) {
    if (stored.error || !stored.values) {
      out.set(id, { error: stored.error ? `${stored.error.code}: ${stored.error.message}` : 'no result', rows: [], verdict: null });
      continue;
    }
    const shaped = { ok: true, cellId: id, kind: 'quantity', values: stored.values, measures: measures.get(id) ?? {} } as CellOk;
    const formatted = formatResult(shaped, system);
    const rows = Object.entries(formatted)
      .filter(([key]) => key !== 'unbounded' && key !== 'pass')
      .map(([key, value]) => ({ key, text: value.text }));
    const pass = stored.values.pass;
    out.set(id, { error: null, rows, verdict: typeof pass === 'boolean' ? (pass ? 'pass' : 'fail') : null });
  }
  return out;
}
