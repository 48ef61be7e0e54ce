import type { CompletionSheet } from '../expression/expressionCompletion';
import type { SheetEvaluatorStore } from './sheetEvaluatorStore';

/** Completion's live view of the sheet, read from the evaluator when completion runs. */
export function completionSheetOf(store: SheetEvaluatorStore): CompletionSheet {
  return {
    names: () => store.names(),
    kindOf: (name) => store.summary().find((cell) => cell.name === name)?.kind,
    valuesOf(name) {
      const id = store.evaluator.idOf(name);
      const result = id === undefined ? undefined : store.result(id);
      if (!result?.ok || result.kind === 'quantity') return [];
      return Object.keys(result.values).filter((key) => typeof result.values[key] === 'number');
    },
  };
}
