import type { CellResult } from '@sheaf/engine';
import { useCallback, useSyncExternalStore } from 'react';
import type { SheetEvaluatorStore } from '../evaluation/sheetEvaluatorStore';

/** The live result of one cell; the component re-renders only when this cell is re-evaluated. */
export function useCellResult(store: SheetEvaluatorStore, cellId: string): CellResult | undefined {
  const subscribe = useCallback(
    (listener: () => void) => store.subscribeCell(cellId, listener),
    [store, cellId],
  );
  const getSnapshot = useCallback(() => store.result(cellId), [store, cellId]);
  return useSyncExternalStore(subscribe, getSnapshot);
}
