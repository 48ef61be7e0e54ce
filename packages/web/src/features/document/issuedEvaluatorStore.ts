import type { CellSummary, SheetEvaluatorStore } from '../sheet/evaluation/sheetEvaluatorStore';
import type { IssuedResults } from './issuedResults';

const nothing = () => {};

/**
 * The sheet editor's results store over an issued revision, which never changes: the cell views
 * read the issued results from it exactly as they read live results in the editor, so the
 * document is drawn by the same components as the live sheet. Nothing to follow, nothing to
 * re-evaluate; the equations are the engine's, from the evaluation that checked the results.
 */
export function createIssuedEvaluatorStore(issued: IssuedResults): SheetEvaluatorStore {
  const { evaluator, results } = issued;
  const summary: readonly CellSummary[] = evaluator.cells.map((cell) => {
    const { id, kind, name } = cell as { id: string; kind?: unknown; name?: unknown };
    return { id, kind: typeof kind === 'string' ? kind : '', name: typeof name === 'string' ? name : '' };
  });
  const names = summary.map((cell) => cell.name).filter((name) => name !== '');
  return {
    evaluator,
    attach: () => nothing,
    subscribe: () => nothing,
    subscribeCell: () => nothing,
    result: (cellId) => results.get(cellId),
    equation: (cellId, system) => evaluator.equation(cellId, system),
    names: () => names,
    summary: () => summary,
    version: () => 1,
    lastEvaluated: () => [],
    // The materials of an issued revision are the frozen ones it was evaluated with.
    setMaterials: nothing,
    destroy: nothing,
  };
}
