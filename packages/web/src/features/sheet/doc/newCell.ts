import { STATE_KINDS, type KindId, type UnitSystemId } from '@sheaf/engine';
import { sheetCells, type SheetFileCell } from '@sheaf/sheet-doc';
import * as Y from 'yjs';

/** The name a new cell of each kind starts from; a number is added when it is taken. */
export const NAME_STEMS: Readonly<Record<Exclude<KindId, 'note'>, string>> = {
  quantity: 'q',
  stress: 'S',
  rosette: 'G',
  rotate: 'R',
  principal: 'P',
  criterion: 'C',
  pointset: 'Pts',
};

const ID_ALPHABET = 'abcdefghijklmnopqrstuvwxyz0123456789';

/**
 * A fresh cell id: `c` and ten random characters, checked against the ids in the document.
 * Ids are stable for the life of the cell (notes and diffs refer to them), so they are never
 * derived from the position or the name.
 */
export function freshCellId(taken: (id: string) => boolean, random: () => number = Math.random): string {
  for (;;) {
    let id = 'c';
    for (let i = 0; i < 10; i++) id += ID_ALPHABET[Math.floor(random() * ID_ALPHABET.length)];
    if (!taken(id)) return id;
  }
}

/**
 * A name no other cell has: the stem itself when free (unless it needs a number, like `q`), else
 * the stem with the first free number from 2 (1 for stems that always carry one). A name that
 * already ends in digits (`S2`) counts on from its stem.
 * @example uniqueName('S', new Set(['S'])) // 'S2'
 * @example uniqueName('S2', new Set(['S', 'S2'])) // 'S3'
 * @example uniqueName('q', new Set()) // 'q1'
 */
export function uniqueName(wanted: string, taken: ReadonlySet<string>): string {
  const stem = wanted.replace(/\d+$/, '') || wanted;
  const numbered = stem.length === 1 && stem === stem.toLowerCase();
  if (!numbered && !taken.has(wanted)) return wanted;
  for (let n = numbered ? 1 : 2; ; n++) {
    const candidate = `${stem}${n}`;
    if (!taken.has(candidate)) return candidate;
  }
}

/** The names cells of the document hold now. */
export function cellNames(doc: Y.Doc): Set<string> {
  const names = new Set<string>();
  sheetCells(doc).forEach((fields) => {
    const name = fields.get('name');
    const text = name instanceof Y.Text ? name.toString() : typeof name === 'string' ? name : null;
    if (text) names.add(text);
  });
  return names;
}

/** The name of the last cell holding a stress state above `index` in `ids`, if any. */
export function nearestStateAbove(doc: Y.Doc, ids: readonly string[], index: number): string | null {
  const cells = sheetCells(doc);
  for (let i = Math.min(index, ids.length) - 1; i >= 0; i--) {
    const fields = cells.get(ids[i]!);
    const kind = fields?.get('kind');
    if (typeof kind === 'string' && (STATE_KINDS as readonly string[]).includes(kind)) {
      const name = fields?.get('name');
      if (name instanceof Y.Text && name.length > 0) return name.toString();
    }
  }
  return null;
}

/**
 * A new cell of a kind with starting fields. Stresses start at zero in the sheet's unit; the
 * values only a person can know (strengths, E, ν) start empty, so the cell says plainly which
 * field still needs a value instead of carrying a made-up number.
 */
export function newCellOf(
  kind: KindId,
  context: { id: string; name: string; of: string | null; system: UnitSystemId },
): SheetFileCell {
  const { id, name, system } = context;
  const of = context.of ?? 'S';
  const stress = system === 'US' ? '0 ksi' : '0 MPa';
  switch (kind) {
    case 'note':
      return { id, kind, text: '' };
    case 'quantity':
      return { id, kind, name, expr: '' };
    case 'stress':
      return { id, kind, name, sx: stress, sy: stress, txy: stress };
    case 'rosette':
      return { id, kind, name, layout: 'rectangular', ea: '0', eb: '0', ec: '0', E: '', nu: '' };
    case 'rotate':
      return { id, kind, name, of, angle: '30 deg' };
    case 'principal':
      return { id, kind, name, of };
    case 'criterion':
      return { id, kind, name, of, theory: 'von-mises', strength: { Sy: '' }, required: '1.5' };
    case 'pointset':
      return {
        id,
        kind,
        name,
        source: { rows: [[0, 0, 0]] },
        columns: { sx: 0, sy: 1, txy: 2 },
        unit: system === 'US' ? 'ksi' : 'MPa',
        theory: 'von-mises',
        strength: { Sy: '' },
        required: '1.5',
      };
  }
}
