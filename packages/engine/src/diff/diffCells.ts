import type { ChangedCell, DiffCellRef, InputChange, RevisionSnapshot } from './types';

type CellLike = RevisionSnapshot['content']['cells'][number];

/** The cell differences between two revisions, by stable cell id. @public */
export interface CellDiff {
  readonly added: readonly DiffCellRef[];
  readonly removed: readonly DiffCellRef[];
  readonly changed: readonly ChangedCell[];
}

/**
 * Compare the cells of two revisions by their stable ids: cells only in the newer one are added,
 * cells only in the older one removed, and a cell in both is changed when any input field differs
 * (`kind` and `name` included) or when it moved relative to the cells around it. Moves are found
 * with a longest common subsequence of the shared ids, so inserting a cell above others does not
 * report those others as moved.
 * @example diffCells(rev1.content.cells, rev2.content.cells).changed[0].inputs // [{ field: 'expr', old: '35 mm', new: '50 mm' }]
 * @public
 */
export function diffCells(older: readonly CellLike[], newer: readonly CellLike[]): CellDiff {
  const oldById = new Map(older.map((cell, index) => [cell.id, { cell, index }]));
  const newIds = new Set(newer.map((cell) => cell.id));
  const shared = newer.map((cell) => cell.id).filter((id) => oldById.has(id));
  const stayed = longestCommonSubsequence(
    older.map((cell) => cell.id).filter((id) => newIds.has(id)),
    shared,
  );

  const added: DiffCellRef[] = [];
  const changed: ChangedCell[] = [];
  newer.forEach((cell, index) => {
    const before = oldById.get(cell.id);
    if (before === undefined) {
      added.push(refOf(cell, index));
      return;
    }
    const inputs = inputChanges(before.cell, cell);
    const moved = !stayed.has(cell.id);
    if (inputs.length > 0 || moved) changed.push({ ...refOf(cell, index), oldIndex: before.index, inputs, moved });
  });
  const removed = older.flatMap((cell, index) => (newIds.has(cell.id) ? [] : [refOf(cell, index)]));
  return { added, removed, changed };
}

/**
 * Input fields of a cell that differ, in a stable order (`kind`, `name`, then the other fields
 * sorted; objects such as `strength` compared per member as `strength.Sy`).
 * @public
 */
export function inputChanges(older: CellLike, newer: CellLike): InputChange[] {
  const before = flattenFields(older);
  const after = flattenFields(newer);
  const fields = [...new Set([...before.keys(), ...after.keys()])].sort(compareFields);
  const changes: InputChange[] = [];
  for (const field of fields) {
    const a = before.get(field) ?? null;
    const b = after.get(field) ?? null;
    if (a !== b) changes.push({ field, old: a, new: b });
  }
  return changes;
}

function refOf(cell: CellLike, index: number): DiffCellRef {
  return {
    id: cell.id,
    kind: typeof cell.kind === 'string' ? cell.kind : '',
    name: typeof cell.name === 'string' ? cell.name : null,
    index,
  };
}

/** Field path → text as written, for every field but `id`; plain objects one level deep. */
function flattenFields(cell: CellLike): Map<string, string> {
  const out = new Map<string, string>();
  for (const [field, value] of Object.entries(cell)) {
    if (field === 'id' || value === undefined) continue;
    if (isPlainObject(value)) {
      for (const [member, inner] of Object.entries(value)) {
        if (inner !== undefined) out.set(`${field}.${member}`, textOf(inner));
      }
    } else {
      out.set(field, textOf(value));
    }
  }
  return out;
}

function textOf(value: unknown): string {
  return typeof value === 'string' ? value : JSON.stringify(value);
}

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

const FIRST_FIELDS = ['kind', 'name'];

function compareFields(a: string, b: string): number {
  const ra = FIRST_FIELDS.indexOf(a);
  const rb = FIRST_FIELDS.indexOf(b);
  if (ra !== rb) return (ra < 0 ? FIRST_FIELDS.length : ra) - (rb < 0 ? FIRST_FIELDS.length : rb);
  return a < b ? -1 : a > b ? 1 : 0;
}

/** Ids that keep their relative order from `a` to `b` (one longest common subsequence). */
function longestCommonSubsequence(a: readonly string[], b: readonly string[]): Set<string> {
  // Sheets hold at most 2000 cells: a quadratic table of lengths is small enough.
  const width = b.length + 1;
  const lengths = new Uint16Array((a.length + 1) * width);
  for (let i = a.length - 1; i >= 0; i--) {
    for (let j = b.length - 1; j >= 0; j--) {
      lengths[i * width + j] =
        a[i] === b[j]
          ? lengths[(i + 1) * width + j + 1]! + 1
          : Math.max(lengths[(i + 1) * width + j]!, lengths[i * width + j + 1]!);
    }
  }
  const kept = new Set<string>();
  let i = 0;
  let j = 0;
  while (i < a.length && j < b.length) {
    if (a[i] === b[j]) {
      kept.add(a[i]!);
      i++;
      j++;
    } else if (lengths[(i + 1) * width + j]! >= lengths[i * width + j + 1]!) {
      i++;
    } else {
      j++;
    }
  }
  return kept;
}
