import { useMemo } from 'react';
import type * as Y from 'yjs';
import {
  createSheetEvaluatorStore,
  type SheetEvaluatorStore,
} from '../evaluation/sheetEvaluatorStore';

/**
 * The live evaluator of a sheet's document. It evaluates the whole sheet once, then follows the
 * document while anything subscribes to it (`useCellResult`, `useSheetNames`), re-evaluating
 * only the edited cells and their dependents.
 */
export function useEvaluator(doc: Y.Doc): SheetEvaluatorStore {
  return useMemo(() => createSheetEvaluatorStore(doc), [doc]);
}
