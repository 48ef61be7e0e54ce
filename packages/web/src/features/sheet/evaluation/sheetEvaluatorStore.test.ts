import { createEvaluator, type CellOk } from '@sheaf/engine';
import {
  cellText,
  docFromSheetContent,
  sheetCells,
  sheetContentFromDoc,
  type SheetFileContent,
} from '@sheaf/sheet-doc';
import { describe, expect, it, vi } from 'vitest';
import * as Y from 'yjs';
import { addCell, deleteCell, moveCellTo } from '../doc/cellActions';
import { createSheetEvaluatorStore } from './sheetEvaluatorStore';

// The lifting-lug sheet of docs/sheet-format.md (our own demo numbers).
function lug(): SheetFileContent {
  return {
    format: 'sheaf-sheet',
    version: 1,
    title: 'Lifting lug, weld toe',
    unitSystem: 'SI',
    cells: [
      { id: 'k1', kind: 'note', text: 'Load case LC2' },
      { id: 'k2', kind: 'quantity', name: 'F', expr: '18 kN' },
      { id: 'k3', kind: 'quantity', name: 'A', expr: '40 mm * 12 mm' },
      { id: 'k4', kind: 'stress', name: 'S', sx: 'F / A', sy: '0 MPa', txy: '22 MPa' },
      { id: 'k5', kind: 'rotate', name: 'R', of: 'S', angle: '30 deg' },
      { id: 'k6', kind: 'principal', name: 'P', of: 'S' },
      { id: 'k7', kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
    ],
  };
}

const value = (store: ReturnType<typeof createSheetEvaluatorStore>, id: string, key: string) =>
  (store.result(id) as CellOk | undefined)?.values[key];

/** The results a fresh evaluator gives for the document as it is now: the reference. */
function freshResults(doc: Y.Doc) {
  return createEvaluator({ cells: sheetContentFromDoc(doc).cells }).results;
}

describe('createSheetEvaluatorStore', () => {
  it('evaluates the sheet as the engine does', () => {
    const doc = docFromSheetContent(lug());
    const store = createSheetEvaluatorStore(doc);
    store.attach();
    expect(value(store, 'k4', 'sx')).toBeCloseTo(37.5e6, 3);
    expect([...store.evaluator.results]).toEqual([...freshResults(doc)]);
    expect(store.names()).toEqual(['F', 'A', 'S', 'R', 'P', 'C']);
  });

  it('re-evaluates only the edited cell and what depends on it, on every keystroke', () => {
    const doc = docFromSheetContent(lug());
    const store = createSheetEvaluatorStore(doc);
    store.attach();
    const seen = { k4: vi.fn(), k1: vi.fn() };
    store.subscribeCell('k4', seen.k4);
    store.subscribeCell('k1', seen.k1);

    const expr = cellText(doc, 'k2', 'expr')!;
    expr.delete(0, 2);
    expr.insert(0, '24');
    // Two transactions, two passes; each evaluated F and its dependents, never the note or A.
    expect(store.lastEvaluated()).toEqual(['k2', 'k4', 'k5', 'k6', 'k7']);
    expect(value(store, 'k4', 'sx')).toBeCloseTo(50e6, 3);
    expect(seen.k4).toHaveBeenCalledTimes(2);
    expect(seen.k1).not.toHaveBeenCalled();
    expect([...store.evaluator.results]).toEqual([...freshResults(doc)]);
  });

  it('follows edits that arrive from another copy of the document', () => {
    const doc = docFromSheetContent(lug());
    const remote = new Y.Doc();
    Y.applyUpdate(remote, Y.encodeStateAsUpdate(doc));
    const store = createSheetEvaluatorStore(doc);
    store.attach();
    cellText(remote, 'k4', 'txy')!.insert(0, '1');
    Y.applyUpdate(doc, Y.encodeStateAsUpdate(remote, Y.encodeStateVector(doc)));
    expect(value(store, 'k4', 'txy')).toBeCloseTo(122e6, 3);
    expect([...store.evaluator.results]).toEqual([...freshResults(doc)]);
  });

  it('reports an unknown name while a name is being retyped, and recovers', () => {
    const doc = docFromSheetContent(lug());
    const store = createSheetEvaluatorStore(doc);
    store.attach();
    const name = cellText(doc, 'k4', 'name')!;
    name.delete(0, 1);
    expect(store.result('k5')).toMatchObject({ ok: false, error: { code: 'unknown-name', message: 'of: no cell named "S"' } });
    expect(store.result('k4')).toMatchObject({ ok: false, error: { code: 'invalid-field' } });
    name.insert(0, 'S');
    expect(store.result('k5')?.ok).toBe(true);
    expect([...store.evaluator.results]).toEqual([...freshResults(doc)]);
  });

  it('follows cells added, moved and deleted, and field values replaced whole', () => {
    const doc = docFromSheetContent(lug());
    const store = createSheetEvaluatorStore(doc);
    store.attach();
    const q = addCell(doc, 'quantity', 1);
    cellText(doc, q, 'expr')!.insert(0, '3 kN');
    cellText(doc, 'k2', 'expr')!.insert(5, ' + q1');
    expect(value(store, 'k2', 'value')).toBeCloseTo(21e3, 6);

    moveCellTo(doc, q, 6);
    expect(store.evaluator.cells.map((c) => c.id)).toEqual(['k1', 'k2', 'k3', 'k4', 'k5', 'k6', q, 'k7']);

    sheetCells(doc).get('k7')!.set('strength', { Sy: '60 MPa' });
    expect(value(store, 'k7', 'pass')).toBe(false);

    deleteCell(doc, q);
    expect(store.result(q)).toBeUndefined();
    expect(store.result('k2')).toMatchObject({ ok: false, error: { code: 'unknown-name' } });
    expect([...store.evaluator.results]).toEqual([...freshResults(doc)]);
  });

  it('catches up with edits made while nobody was attached', () => {
    const doc = docFromSheetContent(lug());
    const store = createSheetEvaluatorStore(doc);
    const detach = store.attach();
    detach();
    cellText(doc, 'k2', 'expr')!.insert(0, '2 * ');
    moveCellTo(doc, 'k1', 3);
    expect(value(store, 'k2', 'value')).toBe(18e3);
    const listener = vi.fn();
    store.subscribe(listener);
    expect(value(store, 'k2', 'value')).toBe(36e3);
    expect(store.evaluator.cells.map((c) => c.id)).toEqual(['k2', 'k3', 'k4', 'k1', 'k5', 'k6', 'k7']);
    expect([...store.evaluator.results]).toEqual([...freshResults(doc)]);
    expect(listener).toHaveBeenCalledTimes(1);
  });

  it('gives the substituted equation in the unit system asked for, and stops after destroy', () => {
    const doc = docFromSheetContent(lug());
    const store = createSheetEvaluatorStore(doc);
    store.attach();
    expect(store.equation('k2', 'SI')).toBe('\\mathrm{F} = 18\\,\\mathrm{kN}');
    expect(store.equation('k2', 'US')).toMatch(/\\mathrm{kip}/);
    expect(store.equation('k1', 'SI')).toBeNull();
    store.destroy();
    cellText(doc, 'k2', 'expr')!.insert(0, '2 * ');
    expect(value(store, 'k2', 'value')).toBe(18e3);
  });
});
