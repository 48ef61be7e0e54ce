import { docFromSheetContent, sheetContentFromDoc, sheetOrder, type SheetFileContent } from '@sheaf/sheet-doc';
import { describe, expect, it } from 'vitest';
import * as Y from 'yjs';
import { addCell, deleteCell, duplicateCell, moveCellBy, moveCellTo, STRUCTURE_ORIGIN } from './cellActions';
import { orderedCellIds } from './cellOrder';

function lug(): SheetFileContent {
  return {
    format: 'sheaf-sheet',
    version: 1,
    title: 'Lifting lug',
    unitSystem: 'SI',
    cells: [
      { id: 'n1', kind: 'note', text: 'LC2' },
      { id: 'q1', kind: 'quantity', name: 'F', expr: '18 kN' },
      { id: 's1', kind: 'stress', name: 'S', sx: 'F / (480 mm^2)', sy: '0 MPa', txy: '22 MPa' },
      { id: 'p1', kind: 'principal', name: 'P', of: 'S' },
    ],
  };
}

const ids = (doc: Y.Doc) => sheetContentFromDoc(doc).cells.map((c) => c.id);

describe('addCell', () => {
  it('inserts a cell of the kind at the visible position with a fresh id and a free name', () => {
    const doc = docFromSheetContent(lug());
    const id = addCell(doc, 'stress', 3);
    expect(ids(doc)).toEqual(['n1', 'q1', 's1', id, 'p1']);
    expect(id).toMatch(/^c[a-z0-9]{10}$/);
    const cell = sheetContentFromDoc(doc).cells[3];
    expect(cell).toEqual({ id, kind: 'stress', name: 'S2', sx: '0 MPa', sy: '0 MPa', txy: '0 MPa' });
  });

  it('points a new rotate, principal or criterion cell at the nearest stress state above it', () => {
    const doc = docFromSheetContent(lug());
    const rotate = addCell(doc, 'rotate', 4);
    const criterion = addCell(doc, 'criterion', 1);
    const cells = sheetContentFromDoc(doc).cells;
    expect(cells.find((c) => c.id === rotate)).toMatchObject({ name: 'R', of: 'P', angle: '30 deg' });
    // Nothing holds a state above position 1: the reference names S, the usual first state.
    expect(cells.find((c) => c.id === criterion)).toMatchObject({ name: 'C', of: 'S', strength: { Sy: '' } });
  });

  it('starts stresses in the sheet unit system and numbers quantities from q1', () => {
    const doc = docFromSheetContent({ ...lug(), unitSystem: 'US' });
    const stress = addCell(doc, 'stress', 0);
    const q = addCell(doc, 'quantity', 0);
    const cells = sheetContentFromDoc(doc).cells;
    expect(cells.find((c) => c.id === stress)).toMatchObject({ sx: '0 ksi' });
    expect(cells.find((c) => c.id === q)).toMatchObject({ name: 'q1', expr: '' });
  });
});

describe('duplicateCell', () => {
  it('copies a cell below itself with a fresh id and the next free name, fields equal', () => {
    const doc = docFromSheetContent(lug());
    const copy = duplicateCell(doc, 's1')!;
    const copy2 = duplicateCell(doc, 's1')!;
    expect(ids(doc)).toEqual(['n1', 'q1', 's1', copy2, copy, 'p1']);
    const cells = sheetContentFromDoc(doc).cells;
    expect(cells[3]).toEqual({ ...lug().cells[2], id: copy2, name: 'S3' });
    expect(cells[4]).toEqual({ ...lug().cells[2], id: copy, name: 'S2' });
    expect(new Set([copy, copy2, 's1']).size).toBe(3);
  });

  it('copies a note (no name) and answers null for a cell that is gone', () => {
    const doc = docFromSheetContent(lug());
    const copy = duplicateCell(doc, 'n1')!;
    expect(sheetContentFromDoc(doc).cells[1]).toEqual({ id: copy, kind: 'note', text: 'LC2' });
    expect(duplicateCell(doc, 'nope')).toBeNull();
  });

  it('keeps the copy independent: editing one text leaves the other alone', () => {
    const doc = docFromSheetContent(lug());
    const copy = duplicateCell(doc, 'q1')!;
    const text = doc.getMap<Y.Map<unknown>>('cells').get(copy)!.get('expr') as Y.Text;
    text.insert(0, '2 * ');
    const cells = sheetContentFromDoc(doc).cells;
    expect(cells.find((c) => c.id === 'q1')?.expr).toBe('18 kN');
    expect(cells.find((c) => c.id === copy)?.expr).toBe('2 * 18 kN');
  });
});

describe('moving and deleting', () => {
  it('moves a cell up and down by one and refuses to move past the ends', () => {
    const doc = docFromSheetContent(lug());
    expect(moveCellBy(doc, 'p1', -1)).toBe(true);
    expect(ids(doc)).toEqual(['n1', 'q1', 'p1', 's1']);
    expect(moveCellBy(doc, 'n1', -1)).toBe(false);
    expect(moveCellBy(doc, 's1', 1)).toBe(false);
    expect(moveCellBy(doc, 'n1', 1)).toBe(true);
    expect(ids(doc)).toEqual(['q1', 'n1', 'p1', 's1']);
  });

  it('moves to a visible position even when the raw order holds duplicates and stale ids', () => {
    const doc = docFromSheetContent(lug());
    sheetOrder(doc).insert(1, ['gone', 's1']);
    expect(orderedCellIds(doc)).toEqual(['n1', 's1', 'q1', 'p1']);
    moveCellTo(doc, 'p1', 0);
    expect(orderedCellIds(doc)).toEqual(['p1', 'n1', 's1', 'q1']);
    moveCellTo(doc, 's1', 3);
    expect(orderedCellIds(doc)).toEqual(['p1', 'n1', 'q1', 's1']);
    expect(sheetOrder(doc).toArray().filter((id) => id === 's1')).toHaveLength(1);
  });

  it('places an orphan cell (in cells, not in order) where it is moved to', () => {
    const doc = docFromSheetContent(lug());
    sheetOrder(doc).delete(0, 1);
    expect(orderedCellIds(doc)).toEqual(['q1', 's1', 'p1', 'n1']);
    moveCellTo(doc, 'n1', 1);
    expect(orderedCellIds(doc)).toEqual(['q1', 'n1', 's1', 'p1']);
  });

  it('deletes a cell and brings it back with an undo of structural changes only', () => {
    const doc = docFromSheetContent(lug());
    const undo = new Y.UndoManager([doc.getArray('order'), doc.getMap('cells')], {
      trackedOrigins: new Set([STRUCTURE_ORIGIN]),
      captureTimeout: 0,
    });
    deleteCell(doc, 's1');
    expect(ids(doc)).toEqual(['n1', 'q1', 'p1']);
    // Someone's typing (another origin) is not in this person's undo stack.
    (doc.getMap<Y.Map<unknown>>('cells').get('q1')!.get('expr') as Y.Text).insert(0, '2 * ');
    undo.undo();
    expect(sheetContentFromDoc(doc)).toEqual({
      ...lug(),
      cells: lug().cells.map((c) => (c.id === 'q1' ? { ...c, expr: '2 * 18 kN' } : c)),
    });
  });
});
