import { useSyncExternalStore } from 'react';
import type { CellSummary, SheetEvaluatorStore } from '../evaluation/sheetEvaluatorStore';

/** Id, kind and name of every cell in order (re-renders only when one of them changes). */
export function useCellSummary(store: SheetEvaluatorStore): readonly CellSummary[] {
  return useSyncExternalStore(store.subscribe, store.summary);
}
