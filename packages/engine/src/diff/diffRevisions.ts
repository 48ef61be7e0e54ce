import { diffCells } from './diffCells';
import { diffResults, type DiffResultsOptions } from './diffResults';
import type { InputChange, RevisionDiff, RevisionSnapshot } from './types';

/**
 * Everything that differs between two revisions of a sheet, by stable cell id: the sheet's title
 * and unit system; cells added, removed and changed (each changed input with its old and new
 * text, and whether the cell moved); every result value that moved, with its old and new value
 * formatted with units; and the check cells whose verdict crossed between pass and fail.
 *
 * Pure: same two snapshots in, same diff out, in the browser and on the server. The older
 * revision goes first; passing them the other way round describes the change backwards.
 *
 * @example
 *   const diff = diffRevisions(rev1, rev2);
 *   diff.changed   // [{ id: 'q5', inputs: [{ field: 'expr', old: '35 mm', new: '50 mm' }], ... }]
 *   diff.crossings // [{ cellName: 'vonMises', from: 'pass', to: 'fail', direction: 'pass-to-fail', ... }]
 * @public
 */
export function diffRevisions(older: RevisionSnapshot, newer: RevisionSnapshot, options: DiffResultsOptions = {}): RevisionDiff {
  const cells = diffCells(older.content.cells, newer.content.cells);
  const { results, crossings } = diffResults(older, newer, options);
  return {
    from: older.number,
    to: newer.number,
    sheet: sheetChanges(older, newer),
    added: cells.added,
    removed: cells.removed,
    changed: cells.changed,
    results,
    crossings,
  };
}

function sheetChanges(older: RevisionSnapshot, newer: RevisionSnapshot): InputChange[] {
  const changes: InputChange[] = [];
  for (const field of ['title', 'unitSystem'] as const) {
    const a = older.content[field] ?? null;
    const b = newer.content[field] ?? null;
    if (a !== b) changes.push({ field, old: a, new: b });
  }
  return changes;
}
