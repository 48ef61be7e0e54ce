import { StateEffect, StateField, type Extension, type Range } from '@codemirror/state';
import { Decoration, EditorView, type DecorationSet } from '@codemirror/view';
import { cellReferences, unknownNames } from './unknownNames';

/** Tell an editor which cell names the sheet has now (they change as people type). */
export const setCellNames = StateEffect.define<ReadonlySet<string>>();

const unknownMark = (name: string) =>
  Decoration.mark({
    class: 'cm-unknown-name',
    attributes: { title: `No cell is named ${name}, and it is not a unit`, 'data-unknown-name': name },
  });
const referenceMark = Decoration.mark({ class: 'cm-cell-ref' });

function decorate(text: string, names: ReadonlySet<string>): DecorationSet {
  const marks: Range<Decoration>[] = [];
  for (const range of unknownNames(text, names)) marks.push(unknownMark(range.name).range(range.from, range.to));
  for (const range of cellReferences(text, names)) marks.push(referenceMark.range(range.from, range.to));
  return Decoration.set(marks, true);
}

/**
 * Marks in an expression editor: names no cell has (wavy underline, with a title saying so) and
 * names of cells (set in the reference style). Recomputed when the text or the names change;
 * the marking follows the engine's rule (see `unknownNames`).
 */
export function nameHighlight(initialNames: ReadonlySet<string>): Extension {
  const field = StateField.define<{ names: ReadonlySet<string>; marks: DecorationSet }>({
    create: (state) => ({ names: initialNames, marks: decorate(state.doc.toString(), initialNames) }),
    update(value, tr) {
      let names = value.names;
      for (const effect of tr.effects) if (effect.is(setCellNames)) names = effect.value;
      if (!tr.docChanged && names === value.names) return value;
      return { names, marks: decorate(tr.newDoc.toString(), names) };
    },
    provide: (f) => EditorView.decorations.from(f, (value) => value.marks),
  });
  return field;
}
