import { useSyncExternalStore } from 'react';
import type { SheetEvaluatorStore } from '../evaluation/sheetEvaluatorStore';

/** The names of the sheet's cells, in order (a new array only when a name changes). */
export function useSheetNames(store: SheetEvaluatorStore): readonly string[] {
  return useSyncExternalStore(store.subscribe, store.names);
}
