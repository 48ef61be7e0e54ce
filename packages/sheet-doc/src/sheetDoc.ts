/**
 * The Yjs document layout of a sheet, and conversion to and from the sheet file format v1.
 *
 * This module imports nothing but `yjs`, so the web app can use the very same code (it is meant
 * to move to a shared place unchanged). Layout (see README.md beside this file):
 *
 * - `meta`  Y.Map: `title`, `unitSystem` and any other top-level field of the file, as plain values
 * - `order` Y.Array<string>: the cell ids, top to bottom
 * - `cells` Y.Map<Y.Map>: cell id -> the cell's fields. `kind` is a plain string; every other
 *   string field (`expr`, `sx`, `text`, `name`, `theory`, ...) is a Y.Text so two people can edit
 *   it character by character; nested objects, arrays, numbers and booleans (`strength`,
 *   `material`, `columns`, `rows`, ...) are plain JSON values, replaced whole.
 */
import * as Y from 'yjs';

export const SHEET_FORMAT = 'sheaf-sheet';
export const SHEET_FORMAT_VERSION = 1;

/** A cell of the sheet file format: `id`, `kind` and the kind's own fields. */
export interface SheetFileCell {
  id: string;
  kind: string;
  [field: string]: unknown;
}

/** A sheet in the sheet file format, version 1 (structurally the engine's `SheetContentV1`). */
export interface SheetFileContent {
  format: typeof SHEET_FORMAT;
  version: typeof SHEET_FORMAT_VERSION;
  title?: string;
  unitSystem?: string;
  cells: SheetFileCell[];
  [field: string]: unknown;
}

/** The fields of one cell in the document: `kind` plain, strings as Y.Text, the rest plain JSON. */
export type CellFields = Y.Map<unknown>;

export const META_KEY = 'meta';
export const ORDER_KEY = 'order';
export const CELLS_KEY = 'cells';

/**
 * Client id used only while building a document from a file. Two builds of the same content give
 * byte-identical updates, so if two loads ever race, merging their results duplicates nothing.
 * The finished document is handed out under a fresh random client id, so no edit reuses it.
 */
const BUILD_CLIENT_ID = 1;

/** Fields of the file's top level that the layout stores structurally rather than in `meta`. */
const STRUCTURAL_TOP_LEVEL = new Set(['format', 'version', 'cells']);

/** Fields written first, in this order, in every cell of a file; the rest follow sorted by name. */
const LEADING_CELL_FIELDS = ['id', 'kind', 'name'];

export function sheetMeta(doc: Y.Doc): Y.Map<unknown> {
  return doc.getMap(META_KEY);
}

export function sheetOrder(doc: Y.Doc): Y.Array<string> {
  return doc.getArray<string>(ORDER_KEY);
}

export function sheetCells(doc: Y.Doc): Y.Map<CellFields> {
  return doc.getMap<CellFields>(CELLS_KEY);
}

/**
 * Build the fields map of one cell, not yet attached to a document. `id` is not stored in it:
 * the key in `cells` is the id, so the two can never disagree.
 */
export function createCellFields(cell: SheetFileCell): CellFields {
  const fields = new Y.Map<unknown>();
  for (const [field, value] of Object.entries(cell)) {
    if (field === 'id' || value === undefined) continue;
    if (field === 'kind') fields.set('kind', value);
    else if (typeof value === 'string') fields.set(field, new Y.Text(value));
    else fields.set(field, cloneJson(value));
  }
  return fields;
}

/**
 * A new Y.Doc holding `content` in the layout above. Deterministic: the same content always gives
 * the same document update (see BUILD_CLIENT_ID).
 */
export function docFromSheetContent(content: SheetFileContent): Y.Doc {
  const build = new Y.Doc();
  build.clientID = BUILD_CLIENT_ID;
  build.transact(() => {
    const meta = sheetMeta(build);
    for (const field of Object.keys(content).sort()) {
      const value = content[field];
      if (STRUCTURAL_TOP_LEVEL.has(field) || value === undefined) continue;
      meta.set(field, cloneJson(value));
    }
    const order = sheetOrder(build);
    const cells = sheetCells(build);
    for (const cell of content.cells) {
      // A file with a repeated id is invalid; keep the first so the document stays consistent.
      if (cells.has(cell.id)) continue;
      cells.set(cell.id, createCellFields(cell));
      order.push([cell.id]);
    }
  });
  const doc = new Y.Doc();
  Y.applyUpdate(doc, Y.encodeStateAsUpdate(build));
  build.destroy();
  return doc;
}

/** The cell with this id as a file cell, or undefined when the document has no usable cell there. */
export function cellFromDoc(doc: Y.Doc, id: string): SheetFileCell | undefined {
  const fields = sheetCells(doc).get(id);
  if (!(fields instanceof Y.Map)) return undefined;
  const kind = fields.get('kind');
  if (typeof kind !== 'string' || kind.length === 0) return undefined;
  const rest = new Map<string, unknown>();
  for (const [field, value] of fields.entries()) {
    if (field === 'kind' || field === 'id' || value === undefined) continue;
    rest.set(field, jsonFromShared(value));
  }
  const cell: SheetFileCell = { id, kind };
  for (const field of LEADING_CELL_FIELDS) {
    if (rest.has(field)) cell[field] = rest.get(field);
  }
  for (const field of [...rest.keys()].sort()) {
    if (!LEADING_CELL_FIELDS.includes(field)) cell[field] = rest.get(field);
  }
  return cell;
}

/**
 * The document as a sheet file, format v1. Written deterministically (fields in a fixed order), so
 * equal documents give byte-equal JSON.
 *
 * Concurrent edits can leave the shared structures slightly out of step, and the reading is
 * forgiving about it: an id listed twice in `order` (two people moved the same cell) counts once,
 * at its first place; an id in `order` with no cell (one person deleted the cell while another
 * moved it) is skipped; a cell missing from `order` is kept, after the ordered cells, by id; a
 * cell without a `kind` is skipped.
 */
export function sheetContentFromDoc(doc: Y.Doc): SheetFileContent {
  const meta = sheetMeta(doc);
  const topLevel: Record<string, unknown> = {};
  for (const field of [...meta.keys()].sort()) {
    if (STRUCTURAL_TOP_LEVEL.has(field)) continue;
    const value = meta.get(field);
    if (value !== undefined) topLevel[field] = jsonFromShared(value);
  }
  const cells: SheetFileCell[] = [];
  const placed = new Set<string>();
  const place = (id: string): void => {
    if (placed.has(id)) return;
    const cell = cellFromDoc(doc, id);
    if (cell === undefined) return;
    placed.add(id);
    cells.push(cell);
  };
  for (const id of sheetOrder(doc).toArray()) {
    if (typeof id === 'string') place(id);
  }
  for (const id of [...sheetCells(doc).keys()].sort()) place(id);
  return { format: SHEET_FORMAT, version: SHEET_FORMAT_VERSION, ...topLevel, cells };
}

/** Insert a cell at `index` of the order (clamped to the ends), in one transaction. */
export function insertCell(doc: Y.Doc, index: number, cell: SheetFileCell): void {
  doc.transact(() => {
    const order = sheetOrder(doc);
    const cells = sheetCells(doc);
    if (cells.has(cell.id)) throw new Error(`insertCell: the sheet already has a cell with id "${cell.id}"`);
    cells.set(cell.id, createCellFields(cell));
    order.insert(Math.max(0, Math.min(index, order.length)), [cell.id]);
  });
}

/** Remove a cell from the order and the cells map, in one transaction. Unknown ids are ignored. */
export function removeCell(doc: Y.Doc, id: string): void {
  doc.transact(() => {
    removeFromOrder(sheetOrder(doc), id);
    sheetCells(doc).delete(id);
  });
}

/** Move a cell to `index` of the order (the index it will have afterwards, clamped). */
export function moveCell(doc: Y.Doc, id: string, index: number): void {
  doc.transact(() => {
    const order = sheetOrder(doc);
    if (!removeFromOrder(order, id)) return;
    order.insert(Math.max(0, Math.min(index, order.length)), [id]);
  });
}

/** The Y.Text of a cell's string field, or undefined when the cell or the field is not text. */
export function cellText(doc: Y.Doc, id: string, field: string): Y.Text | undefined {
  const value = sheetCells(doc).get(id)?.get(field);
  return value instanceof Y.Text ? value : undefined;
}

function removeFromOrder(order: Y.Array<string>, id: string): boolean {
  let removed = false;
  // From the end, so deleting does not shift the indexes still to visit.
  const ids = order.toArray();
  for (let index = ids.length - 1; index >= 0; index--) {
    if (ids[index] === id) {
      order.delete(index, 1);
      removed = true;
    }
  }
  return removed;
}

function jsonFromShared(value: unknown): unknown {
  if (value instanceof Y.Text) return value.toString();
  if (value instanceof Y.AbstractType) return value.toJSON();
  return cloneJson(value);
}

function cloneJson(value: unknown): unknown {
  return value === null || typeof value !== 'object' ? value : JSON.parse(JSON.stringify(value));
}
