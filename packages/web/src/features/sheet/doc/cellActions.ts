import type { KindId, UnitSystemId } from '@sheaf/engine';
import {
  cellFromDoc,
  insertCell,
  moveCell,
  removeCell,
  sheetCells,
  sheetMeta,
  sheetOrder,
  type SheetFileCell,
} from '@sheaf/sheet-doc';
import * as Y from 'yjs';
import { orderedCellIds, targetIndexForMove } from './cellOrder';
import { cellNames, freshCellId, NAME_STEMS, nearestStateAbove, newCellOf, uniqueName } from './newCell';

/**
 * Origin of the transactions that add, remove, duplicate and move cells, so the sheet's own
 * undo (Y.UndoManager tracking this origin only) undoes this person's structural changes and
 * nobody else's.
 */
export const STRUCTURE_ORIGIN = { name: 'sheet-structure' } as const;

function unitSystemOf(doc: Y.Doc): UnitSystemId {
  return sheetMeta(doc).get('unitSystem') === 'US' ? 'US' : 'SI';
}

/** Add a new cell of `kind` at `index` of the visible order; returns its id. */
export function addCell(doc: Y.Doc, kind: KindId, index: number): string {
  const ids = orderedCellIds(doc);
  const cells = sheetCells(doc);
  const id = freshCellId((candidate) => cells.has(candidate));
  const name = kind === 'note' ? '' : uniqueName(NAME_STEMS[kind], cellNames(doc));
  const cell = newCellOf(kind, {
    id,
    name,
    of: nearestStateAbove(doc, ids, index),
    system: unitSystemOf(doc),
  });
  doc.transact(() => insertCell(doc, orderIndexFor(doc, ids, index), cell), STRUCTURE_ORIGIN);
  return id;
}

/**
 * Copy a cell just below itself, with a fresh id and a unique name (`S` → `S2`); null when the
 * cell is gone.
 */
export function duplicateCell(doc: Y.Doc, id: string): string | null {
  const source = cellFromDoc(doc, id);
  if (!source) return null;
  const ids = orderedCellIds(doc);
  const cells = sheetCells(doc);
  const copyId = freshCellId((candidate) => cells.has(candidate));
  const copy: SheetFileCell = { ...structuredClone(source), id: copyId };
  if (typeof source.name === 'string' && source.name !== '') {
    copy.name = uniqueName(source.name, cellNames(doc));
  }
  const below = ids.indexOf(id) + 1;
  doc.transact(() => insertCell(doc, orderIndexFor(doc, ids, below), copy), STRUCTURE_ORIGIN);
  return copyId;
}

/** Delete a cell (the sheet's undo brings it back). */
export function deleteCell(doc: Y.Doc, id: string): void {
  doc.transact(() => removeCell(doc, id), STRUCTURE_ORIGIN);
}

/** Move a cell `delta` places up (negative) or down among the visible cells; false at an end. */
export function moveCellBy(doc: Y.Doc, id: string, delta: number): boolean {
  const ids = orderedCellIds(doc);
  const to = targetIndexForMove(ids, id, delta);
  if (to === null) return false;
  moveCellTo(doc, id, to);
  return true;
}

/** Move a cell so it is at visible position `to` (0-based) afterwards. */
export function moveCellTo(doc: Y.Doc, id: string, to: number): void {
  const ids = orderedCellIds(doc);
  const from = ids.indexOf(id);
  if (from < 0 || from === to) return;
  const without = ids.filter((other) => other !== id);
  const clamped = Math.max(0, Math.min(to, without.length));
  doc.transact(() => {
    // A cell listed only as an orphan (not in `order`) joins the order where it was dropped.
    const orderIndex = orderIndexFor(doc, without, clamped, id);
    moveCell(doc, id, orderIndex);
    if (!sheetOrderHas(doc, id)) insertIntoOrder(doc, id, orderIndex);
  }, STRUCTURE_ORIGIN);
}

/**
 * The index in the raw `order` array that puts a cell at visible position `index`: just after
 * the visible cell before it. Raw `order` may hold duplicates and stale ids the reader skips, so
 * visible positions and array indexes can differ.
 */
function orderIndexFor(doc: Y.Doc, visible: readonly string[], index: number, moving?: string): number {
  const order = sheetOrder(doc).toArray().filter((entry) => entry !== moving);
  if (index <= 0) {
    const first = visible[0];
    const at = first === undefined ? -1 : order.indexOf(first);
    return at < 0 ? 0 : at;
  }
  const before = visible[Math.min(index, visible.length) - 1];
  const at = before === undefined ? -1 : order.indexOf(before);
  return at < 0 ? order.length : at + 1;
}

function sheetOrderHas(doc: Y.Doc, id: string): boolean {
  return sheetOrder(doc).toArray().includes(id);
}

function insertIntoOrder(doc: Y.Doc, id: string, index: number): void {
  const order = sheetOrder(doc);
  order.insert(Math.max(0, Math.min(index, order.length)), [id]);
}
