import {
  cellFailure,
  createEvaluator,
  machineCellsById,
  machineOutput,
  materialsLookupOf,
  type CellResult,
  type Evaluator,
  type MachineCell,
  type MachineOutput,
} from '@sheaf/engine';
import type { RevisionDetail } from '@sheaf/engine/api';
import { resultMismatches, type ResultMismatch } from './resultMismatches';

/** An issued revision's results as the document shows them, with the check that they are the issued ones. */
export interface IssuedResults {
  /** This browser's evaluation of the frozen content with the frozen materials (equations come from it). */
  readonly evaluator: Evaluator;
  /**
   * Each cell's result as shown: the values stored with the revision at approval (computed by the
   * server), on the browser's result for what they measure, its state and its check; a cell
   * issued with an error shows that error.
   */
  readonly results: ReadonlyMap<string, CellResult>;
  /** Where this browser's numbers differ from the issued ones; empty when they all agree. */
  readonly mismatches: readonly ResultMismatch[];
}

/**
 * Evaluate an issued revision again, here, with exactly what it was issued with (its content and
 * its frozen materials, never the library as it is now), and compare every value with the results
 * the server stored at approval. The stored numbers are the record: they are the ones shown. The
 * evaluation supplies what the stored output does not hold (units of each value, the stress state
 * a figure draws, the governing equation); where it disagrees with the record, `mismatches` says
 * where, so the page can refuse to pass the equations and figures off as the issued ones.
 */
export function issuedResults(revision: Pick<RevisionDetail, 'content' | 'results' | 'materials'>): IssuedResults {
  const cells = revision.content.cells;
  const materials = materialsLookupOf(Object.values(revision.materials ?? {}));
  const evaluator = createEvaluator({ cells }, { materials });
  const stored = machineCellsById(cells, revision.results as MachineOutput);
  const recomputed = machineCellsById(cells, machineOutput(cells, evaluator.results));

  const results = new Map<string, CellResult>();
  const mismatches: ResultMismatch[] = [];
  for (const cell of cells) {
    const browser = evaluator.results.get(cell.id);
    if (!browser) continue;
    const name = typeof cell.name === 'string' ? cell.name : '';
    const issued = stored.get(cell.id);
    const now = recomputed.get(cell.id);
    // Cells without a name (notes) have no stored results: there is nothing to compare.
    if (name !== '') mismatches.push(...resultMismatches(cell.id, name, issued, now));
    results.set(cell.id, shown(browser, issued));
  }
  return { evaluator, results, mismatches };
}

/** The result to show: the issued values on the browser's result, or the issued error. */
function shown(browser: CellResult, issued: MachineCell | undefined): CellResult {
  if (!issued) return browser;
  if (issued.error) {
    return cellFailure(browser.cellId, issued.kind, issued.error.code, issued.error.message, issued.error.rootCellId);
  }
  if (!browser.ok || !issued.values) return browser;
  return { ...browser, values: issued.values };
}
