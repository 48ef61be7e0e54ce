import { sheetCells, sheetMeta } from '@sheaf/sheet-doc';
import * as Y from 'yjs';

/**
 * Make a Y.Text hold `value` with the smallest edit (common start and end kept), so a choice
 * written by one person does not wipe out a concurrent edit elsewhere in the same text.
 */
export function replaceText(text: Y.Text, value: string): void {
  const current = text.toString();
  if (current === value) return;
  let start = 0;
  while (start < current.length && start < value.length && current[start] === value[start]) start++;
  let end = 0;
  while (
    end < current.length - start &&
    end < value.length - start &&
    current[current.length - 1 - end] === value[value.length - 1 - end]
  ) {
    end++;
  }
  const doc = text.doc;
  const apply = () => {
    text.delete(start, current.length - start - end);
    text.insert(start, value.slice(start, value.length - end));
  };
  if (doc) doc.transact(apply);
  else apply();
}

/**
 * Set a string field of a cell. The layout keeps every string field as a Y.Text, so an existing
 * text is edited in place; a missing field (or one held as another type) becomes a new Y.Text.
 */
export function setTextField(doc: Y.Doc, cellId: string, field: string, value: string): void {
  const fields = sheetCells(doc).get(cellId);
  if (!fields) return;
  const current = fields.get(field);
  if (current instanceof Y.Text) replaceText(current, value);
  else fields.set(field, new Y.Text(value));
}

/** Set a plain JSON field of a cell (objects and arrays are replaced whole, per the layout). */
export function setPlainField(doc: Y.Doc, cellId: string, field: string, value: unknown): void {
  const fields = sheetCells(doc).get(cellId);
  if (!fields) return;
  fields.set(field, JSON.parse(JSON.stringify(value)) as unknown);
}

/** Remove a field of a cell (an optional field the person took away). */
export function deleteField(doc: Y.Doc, cellId: string, ...fieldNames: string[]): void {
  const fields = sheetCells(doc).get(cellId);
  if (!fields) return;
  doc.transact(() => {
    for (const field of fieldNames) fields.delete(field);
  });
}

/** Set a top-level field of the sheet (`unitSystem`, ...), kept plain in `meta`. */
export function setMetaField(doc: Y.Doc, field: string, value: unknown): void {
  sheetMeta(doc).set(field, value);
}
