import { sheetCells, sheetOrder } from '@sheaf/sheet-doc';
import * as Y from 'yjs';

/**
 * The ids of the cells, top to bottom, read the way `sheetContentFromDoc` reads them, so the
 * editor shows exactly what an export would hold: an id listed twice in `order` (two people
 * moved the same cell) counts at its first place; an id without a cell, or a cell without a
 * `kind`, is skipped; a cell missing from `order` follows the ordered ones, by id.
 */
export function orderedCellIds(doc: Y.Doc): string[] {
  const cells = sheetCells(doc);
  const ids: string[] = [];
  const placed = new Set<string>();
  const place = (id: unknown) => {
    if (typeof id !== 'string' || placed.has(id)) return;
    const fields = cells.get(id);
    if (!(fields instanceof Y.Map)) return;
    const kind = fields.get('kind');
    if (typeof kind !== 'string' || kind === '') return;
    placed.add(id);
    ids.push(id);
  };
  for (const id of sheetOrder(doc).toArray()) place(id);
  for (const id of [...cells.keys()].sort()) place(id);
  return ids;
}

/**
 * Where a cell lands in `order` when it moves `delta` places among the visible cells (the
 * index to pass to `moveCell`), or null when it cannot move that way.
 */
export function targetIndexForMove(ids: readonly string[], id: string, delta: number): number | null {
  const from = ids.indexOf(id);
  if (from < 0) return null;
  const to = from + delta;
  if (to < 0 || to >= ids.length || to === from) return null;
  return to;
}
