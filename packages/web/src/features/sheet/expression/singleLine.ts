import { EditorState, type Extension } from '@codemirror/state';
import { keymap } from '@codemirror/view';
import { ySyncAnnotation } from 'y-codemirror.next';

/**
 * An expression is one line: Enter does nothing and a typed or pasted line break becomes a
 * space. Changes arriving from the shared text are never touched, or the editor would drift
 * from the document.
 */
export function singleLine(): Extension {
  return [
    keymap.of([{ key: 'Enter', run: () => true }]),
    EditorState.transactionFilter.of((tr) => {
      if (!tr.docChanged || tr.annotation(ySyncAnnotation) !== undefined) return tr;
      if (tr.newDoc.lines === 1) return tr;
      const changes: { from: number; to: number; insert: string }[] = [];
      let offset = 0;
      let cursor = 0;
      tr.changes.iterChanges((fromA, toA, _fromB, _toB, inserted) => {
        const insert = inserted.toString().replace(/\r\n|\r|\n/g, ' ');
        changes.push({ from: fromA, to: toA, insert });
        cursor = fromA + offset + insert.length;
        offset += insert.length - (toA - fromA);
      });
      return { changes, selection: { anchor: cursor }, scrollIntoView: true };
    }),
  ];
}
