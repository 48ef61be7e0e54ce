import { describe, expect, it } from 'vitest';
import * as Y from 'yjs';
import {
  cellText,
  docFromSheetContent,
  insertCell,
  moveCell,
  removeCell,
  sheetCells,
  sheetContentFromDoc,
  sheetMeta,
  sheetOrder,
  type SheetFileContent,
} from './sheetDoc';

/** A sheet that uses every kind of the format and every kind of field value. */
function everyKindSheet(): SheetFileContent {
  return {
    format: 'sheaf-sheet',
    version: 1,
    title: 'Hoist drive shaft, keyway section',
    unitSystem: 'SI',
    cells: [
      { id: 'n1', kind: 'note', text: 'Shaft at the keyway, load case $LC3$: bending + torsion' },
      { id: 'q1', kind: 'quantity', name: 'M', expr: '410 N m' },
      { id: 'q2', kind: 'quantity', name: 'T', expr: '260 N m' },
      { id: 'q3', kind: 'quantity', name: 'd', expr: '32 mm' },
      { id: 's1', kind: 'stress', name: 'S', sx: '32 M / (pi d^3)', sy: '0 MPa', txy: '16 T / (pi d^3)' },
      {
        id: 's2',
        kind: 'stress',
        name: 'S3',
        sx: '80 MPa',
        sy: '-20 MPa',
        txy: '15 MPa',
        sz: '5 MPa',
        tyz: '0 MPa',
        tzx: '-7 MPa',
      },
      { id: 'r1', kind: 'rosette', name: 'G', layout: 'delta', ea: '410e-6', eb: '-120e-6', ec: '95e-6', E: '70 GPa', nu: '0.33' },
      { id: 'r2', kind: 'rosette', name: 'G2', layout: { angles: ['0 deg', '30 deg', '100 deg'] }, ea: '1e-4', eb: '2e-4', ec: '3e-4', E: '200 GPa', nu: '0.3' },
      { id: 't1', kind: 'rotate', name: 'R', of: 'S', angle: '-22.5 deg' },
      { id: 'p1', kind: 'principal', name: 'P', of: 'S' },
      { id: 'c1', kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', strength: { Sy: '355 MPa' }, required: '1.8' },
      { id: 'c2', kind: 'criterion', name: 'C2', of: 'S', theory: 'coulomb-mohr', material: 'gray-iron-class-30', required: 2 },
      {
        id: 'ps',
        kind: 'pointset',
        name: 'Pts',
        source: { rows: [{ sx: 10, sy: 2, txy: 1 }, { sx: -4, sy: 0, txy: 3.5 }] },
        columns: { sx: 'sx', sy: 'sy', txy: 'txy', unit: 'MPa' },
        theory: 'tresca',
        strength: { Sy: '250 MPa' },
        enabled: true,
        weight: null,
      },
    ],
  };
}

describe('docFromSheetContent and sheetContentFromDoc', () => {
  it('round-trip a sheet with every kind of cell and field', () => {
    const sheet = everyKindSheet();
    expect(sheetContentFromDoc(docFromSheetContent(sheet))).toEqual(sheet);
  });

  it('round-trip through an encoded update, as a remote copy receives it', () => {
    const sheet = everyKindSheet();
    const remote = new Y.Doc();
    Y.applyUpdate(remote, Y.encodeStateAsUpdate(docFromSheetContent(sheet)));
    expect(sheetContentFromDoc(remote)).toEqual(sheet);
  });

  it('round-trip an empty sheet and keep unknown top-level fields in meta', () => {
    const sheet: SheetFileContent = { format: 'sheaf-sheet', version: 1, cells: [], project: { calcNumber: 'LL-104' } };
    const doc = docFromSheetContent(sheet);
    expect(sheetMeta(doc).toJSON()).toEqual({ project: { calcNumber: 'LL-104' } });
    expect(sheetContentFromDoc(doc)).toEqual(sheet);
  });

  it('lay the document out as meta, order and cells, with string fields as Y.Text', () => {
    const doc = docFromSheetContent(everyKindSheet());
    expect(sheetMeta(doc).toJSON()).toEqual({ title: 'Hoist drive shaft, keyway section', unitSystem: 'SI' });
    expect(sheetOrder(doc).toArray()).toEqual(['n1', 'q1', 'q2', 'q3', 's1', 's2', 'r1', 'r2', 't1', 'p1', 'c1', 'c2', 'ps']);
    const criterion = sheetCells(doc).get('c1');
    expect(criterion?.get('kind')).toBe('criterion');
    expect(criterion?.get('id')).toBeUndefined();
    for (const field of ['name', 'of', 'theory', 'required']) expect(criterion?.get(field)).toBeInstanceOf(Y.Text);
    expect(criterion?.get('strength')).toEqual({ Sy: '355 MPa' });
    expect(sheetCells(doc).get('c2')?.get('required')).toBe(2);
    expect(cellText(doc, 's1', 'txy')?.toString()).toBe('16 T / (pi d^3)');
    expect(cellText(doc, 'c1', 'strength')).toBeUndefined();
  });

  it('write cells with id, kind and name first and the other fields sorted, whatever the input order', () => {
    const doc = docFromSheetContent({
      format: 'sheaf-sheet',
      version: 1,
      cells: [{ txy: '1 MPa', name: 'S', sy: '2 MPa', kind: 'stress', sx: '3 MPa', id: 'a' }],
    });
    const json = JSON.stringify(sheetContentFromDoc(doc));
    expect(json).toBe(
      '{"format":"sheaf-sheet","version":1,"cells":[{"id":"a","kind":"stress","name":"S","sx":"3 MPa","sy":"2 MPa","txy":"1 MPa"}]}',
    );
  });

  it('build the same update bytes from the same content, so two racing builds merge without duplicates', () => {
    const first = Y.encodeStateAsUpdate(docFromSheetContent(everyKindSheet()));
    const second = Y.encodeStateAsUpdate(docFromSheetContent(everyKindSheet()));
    expect(Array.from(first)).toEqual(Array.from(second));
    const merged = new Y.Doc();
    Y.applyUpdate(merged, first);
    Y.applyUpdate(merged, second);
    expect(sheetContentFromDoc(merged)).toEqual(everyKindSheet());
  });

  it('hand out the built document under a fresh client id, so later edits never reuse the build id', () => {
    const a = docFromSheetContent(everyKindSheet());
    const b = docFromSheetContent(everyKindSheet());
    expect(a.clientID).not.toBe(1);
    expect(a.clientID).not.toBe(b.clientID);
  });

  it('keep the first of two cells with the same id', () => {
    const doc = docFromSheetContent({
      format: 'sheaf-sheet',
      version: 1,
      cells: [
        { id: 'x', kind: 'quantity', name: 'a', expr: '1 m' },
        { id: 'x', kind: 'quantity', name: 'b', expr: '2 m' },
      ],
    });
    expect(sheetContentFromDoc(doc).cells).toEqual([{ id: 'x', kind: 'quantity', name: 'a', expr: '1 m' }]);
  });
});

describe('co-editing in the layout', () => {
  function connectedPair(content: SheetFileContent): [Y.Doc, Y.Doc] {
    const a = docFromSheetContent(content);
    const b = new Y.Doc();
    Y.applyUpdate(b, Y.encodeStateAsUpdate(a));
    return [a, b];
  }
  function exchange(a: Y.Doc, b: Y.Doc): void {
    const toB = Y.encodeStateAsUpdate(a, Y.encodeStateVector(b));
    const toA = Y.encodeStateAsUpdate(b, Y.encodeStateVector(a));
    Y.applyUpdate(b, toB);
    Y.applyUpdate(a, toA);
  }

  it('merge two people typing in the same expression character by character', () => {
    const [a, b] = connectedPair({
      format: 'sheaf-sheet',
      version: 1,
      cells: [{ id: 'q', kind: 'quantity', name: 'A', expr: '40 mm * 12 mm' }],
    });
    cellText(a, 'q', 'expr')?.insert(0, '2 * ');
    cellText(b, 'q', 'expr')?.insert('40 mm * 12 mm'.length, ' - 3 mm^2');
    exchange(a, b);
    const expected = '2 * 40 mm * 12 mm - 3 mm^2';
    expect(sheetContentFromDoc(a).cells[0]?.expr).toBe(expected);
    expect(sheetContentFromDoc(b)).toEqual(sheetContentFromDoc(a));
  });

  it('insert, move and remove cells, and merge concurrent inserts', () => {
    const [a, b] = connectedPair({
      format: 'sheaf-sheet',
      version: 1,
      cells: [
        { id: 'c1', kind: 'note', text: 'one' },
        { id: 'c2', kind: 'note', text: 'two' },
        { id: 'c3', kind: 'note', text: 'three' },
      ],
    });
    insertCell(a, 1, { id: 'qa', kind: 'quantity', name: 'a', expr: '1 m' });
    insertCell(b, 99, { id: 'qb', kind: 'quantity', name: 'b', expr: '2 m' });
    moveCell(a, 'c3', 0);
    removeCell(b, 'c2');
    exchange(a, b);
    const ids = sheetContentFromDoc(a).cells.map((cell) => cell.id);
    expect(ids).toEqual(['c3', 'c1', 'qa', 'qb']);
    expect(sheetContentFromDoc(b)).toEqual(sheetContentFromDoc(a));
    expect(() => insertCell(a, 0, { id: 'qa', kind: 'note', text: '' })).toThrow(/already has a cell/);
  });

  it('read a cell moved by two people at once in one place only', () => {
    const [a, b] = connectedPair({
      format: 'sheaf-sheet',
      version: 1,
      cells: [
        { id: 'c1', kind: 'note', text: 'one' },
        { id: 'c2', kind: 'note', text: 'two' },
        { id: 'c3', kind: 'note', text: 'three' },
      ],
    });
    moveCell(a, 'c1', 3);
    moveCell(b, 'c1', 1);
    exchange(a, b);
    expect(sheetOrder(a).toArray().filter((id) => id === 'c1')).toHaveLength(2);
    const ids = sheetContentFromDoc(a).cells.map((cell) => cell.id);
    expect(ids).toHaveLength(3);
    expect(new Set(ids)).toEqual(new Set(['c1', 'c2', 'c3']));
    expect(sheetContentFromDoc(b)).toEqual(sheetContentFromDoc(a));
  });

  it('skip an id whose cell was deleted while someone moved it, keep unordered cells, skip cells without a kind', () => {
    const [a, b] = connectedPair({
      format: 'sheaf-sheet',
      version: 1,
      cells: [
        { id: 'c1', kind: 'note', text: 'one' },
        { id: 'c2', kind: 'note', text: 'two' },
      ],
    });
    removeCell(a, 'c1');
    moveCell(b, 'c1', 2);
    exchange(a, b);
    expect(sheetOrder(a).toArray()).toContain('c1');
    expect(sheetContentFromDoc(a).cells.map((cell) => cell.id)).toEqual(['c2']);

    sheetCells(a).set('z-orphan', new Y.Map<unknown>([['kind', 'note'], ['text', new Y.Text('kept')]]));
    sheetCells(a).set('a-orphan', new Y.Map<unknown>([['kind', 'note']]));
    sheetCells(a).set('no-kind', new Y.Map<unknown>([['text', new Y.Text('lost')]]));
    expect(sheetContentFromDoc(a).cells).toEqual([
      { id: 'c2', kind: 'note', text: 'two' },
      { id: 'a-orphan', kind: 'note' },
      { id: 'z-orphan', kind: 'note', text: 'kept' },
    ]);
  });
});
