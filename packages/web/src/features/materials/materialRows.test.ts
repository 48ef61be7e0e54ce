import { describe, expect, it } from 'vitest';
import type { LibraryMaterial } from '@sheaf/engine/api';
import { filterAndSortMaterials, materialRows } from './materialRows';

const material = (id: string, category: LibraryMaterial['category'], properties: LibraryMaterial['properties'], builtin = true): LibraryMaterial => ({
  id,
  name: id.toUpperCase(),
  category,
  notes: '',
  properties,
  builtin,
  updatedAt: null,
});
const v = (value: string, source = 'Demo handbook, invented') => ({ value, basis: 'typical' as const, source });

const rows = materialRows([
  material('steel-a', 'carbon-steel', { Sy: v('36 ksi'), E: v('200 GPa') }),
  material('alu-b', 'aluminium', { Sy: v('275 MPa', 'Demo association table') }),
  material('iron-c', 'cast-iron', { Sut: v('214 MPa') }),
  material('own-d', 'carbon-steel', { Sy: v('300 MPa') }, false),
]);
const all = { text: '', category: '', origin: 'all' as const };

describe('materials table rows', () => {
  it('sorts by a value in SI whatever the unit it was written in, with materials lacking it last', () => {
    const ids = (direction: 'ascending' | 'descending') =>
      filterAndSortMaterials(rows, all, { key: 'Sy', direction }).map((r) => r.material.id);
    // 36 ksi = 248.2 MPa.
    expect(ids('ascending')).toEqual(['steel-a', 'alu-b', 'own-d', 'iron-c']);
    expect(ids('descending')).toEqual(['own-d', 'alu-b', 'steel-a', 'iron-c']);
  });

  it('sorts by name and filters by words (also in sources), category and origin', () => {
    expect(filterAndSortMaterials(rows, all, { key: 'name', direction: 'ascending' }).map((r) => r.material.id)).toEqual([
      'alu-b',
      'iron-c',
      'own-d',
      'steel-a',
    ]);
    expect(filterAndSortMaterials(rows, { ...all, text: 'association' }, { key: 'name', direction: 'ascending' }).map((r) => r.material.id)).toEqual([
      'alu-b',
    ]);
    expect(filterAndSortMaterials(rows, { ...all, category: 'carbon-steel' }, { key: 'name', direction: 'ascending' }).map((r) => r.material.id)).toEqual([
      'own-d',
      'steel-a',
    ]);
    expect(filterAndSortMaterials(rows, { ...all, origin: 'own' }, { key: 'name', direction: 'ascending' }).map((r) => r.material.id)).toEqual([
      'own-d',
    ]);
  });

  it('sorts categories in the library’s order, steels before aluminium before cast irons', () => {
    expect(filterAndSortMaterials(rows, all, { key: 'category', direction: 'ascending' }).map((r) => r.material.id)).toEqual([
      'steel-a',
      'own-d',
      'alu-b',
      'iron-c',
    ]);
  });
});
