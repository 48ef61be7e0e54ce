import { useContext } from 'react';
import { SheetEditorContext, type SheetEditorContextValue } from '../sheetEditorContext';

/** The sheet editor's shared parts (document, results, presence, read-only). */
export function useSheetEditor(): SheetEditorContextValue {
  const value = useContext(SheetEditorContext);
  if (!value) throw new Error('useSheetEditor outside <SheetEditor>');
  return value;
}
