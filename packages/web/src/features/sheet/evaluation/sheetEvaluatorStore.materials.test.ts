import { materialsLookupOf, type CellOk } from '@sheaf/engine';
import { docFromSheetContent, type SheetFileContent } from '@sheaf/sheet-doc';
import { describe, expect, it, vi } from 'vitest';
import { createSheetEvaluatorStore } from './sheetEvaluatorStore';

const content: SheetFileContent = {
  format: 'sheaf-sheet',
  version: 1,
  title: 'Hoist shaft',
  unitSystem: 'SI',
  cells: [
    { id: 'k1', kind: 'stress', name: 'S', sx: '100 MPa', sy: '0 MPa', txy: '0 MPa' },
    { id: 'k2', kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', material: 'shaft-steel-demo' },
    { id: 'k3', kind: 'quantity', name: 'n', expr: 'C.factor' },
  ],
};

const library = (sy: string) =>
  materialsLookupOf([{ id: 'shaft-steel-demo', name: 'Shaft steel (demo)', properties: { Sy: { value: sy, basis: 'minimum', source: 'Demo certificate, invented' } } }]);

describe('the sheet evaluator store with a materials library', () => {
  it('reports an unknown material until the library arrives, then evaluates the cell and its dependents and tells their listeners', () => {
    const store = createSheetEvaluatorStore(docFromSheetContent(content));
    expect(store.result('k2')?.ok).toBe(false);
    const heard = vi.fn();
    const detach = store.subscribeCell('k3', heard);

    store.setMaterials(library('300 MPa'));
    // Uniaxial 100 MPa against Sy = 300 MPa: factor 3 (common practice, no source).
    expect((store.result('k2') as CellOk).values.factor).toBeCloseTo(3, 12);
    expect((store.result('k3') as CellOk).values.value).toBeCloseTo(3, 12);
    expect(store.lastEvaluated()).toEqual(['k2', 'k3']);
    expect(heard).toHaveBeenCalledTimes(1);

    const version = store.version();
    const same = library('250 MPa');
    store.setMaterials(same);
    expect((store.result('k2') as CellOk).values.factor).toBeCloseTo(2.5, 12);
    store.setMaterials(same);
    expect(store.version()).toBe(version + 1);
    detach();
  });
});
