import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { sheetJsonSchemaText } from './jsonSchema';
import { readSheet } from './readSheet';
import { writeSheet } from './writeSheet';

/** The example of the format contract (sheet-format.md). */
const contract = {
  format: 'sheaf-sheet',
  version: 1,
  title: 'Lifting lug, weld toe',
  unitSystem: 'SI',
  cells: [
    { id: 'k1', kind: 'note', text: 'Load case LC2, $F = 18\\,kN$ at 30°' },
    { id: 'k2', kind: 'quantity', name: 'F', expr: '18 kN' },
    { id: 'k3', kind: 'quantity', name: 'A', expr: '40 mm * 12 mm' },
    { id: 'k4', kind: 'stress', name: 'S', sx: 'F / A', sy: '0 MPa', txy: '22 MPa' },
    { id: 'k5', kind: 'rotate', name: 'R', of: 'S', angle: '30 deg' },
    { id: 'k6', kind: 'principal', name: 'P', of: 'S' },
    { id: 'k7', kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
  ],
};

const errorsOf = (input: unknown): readonly string[] => {
  const r = readSheet(input);
  if (r.ok) throw new Error('expected the sheet to be invalid');
  return r.errors;
};
const withCell = (index: number, cell: unknown) => ({ ...contract, cells: contract.cells.map((c, i) => (i === index ? cell : c)) });

describe('readSheet', () => {
  it('reads the contract example, as text or data', () => {
    const fromText = readSheet(JSON.stringify(contract));
    expect(fromText.ok).toBe(true);
    expect(readSheet(contract)).toEqual(fromText);
  });

  it('fills in title and unit system when absent', () => {
    const r = readSheet({ format: 'sheaf-sheet', version: 1, cells: [] });
    expect(r).toEqual({ ok: true, sheet: { format: 'sheaf-sheet', version: 1, title: '', unitSystem: 'SI', cells: [] } });
  });

  it('errors name the JSON path', () => {
    expect(errorsOf(withCell(3, { ...contract.cells[3], sx: 37.5 }))).toEqual(['cells[3].sx: must be a string (an expression such as "120 MPa")']);
    expect(errorsOf(withCell(0, { id: 'k1', kind: 'beam' }))[0]).toMatch(/^cells\[0\]\.kind: /);
    expect(errorsOf(withCell(1, { ...contract.cells[1], unit: 'kN' }))).toEqual(['cells[1]: unknown field "unit"']);
    expect(errorsOf(withCell(2, { ...contract.cells[2], id: 'k1' }))).toEqual(['cells[2].id: duplicate id "k1" (also cells[0])']);
    expect(errorsOf(withCell(6, { ...contract.cells[6], strength: { Sy: '250 MPa' }, material: 'a36' }))).toEqual([
      'cells[6].material: give either strength or material, not both',
    ]);
    expect(errorsOf(withCell(6, { ...contract.cells[6], strength: { Sy: '250 MPa', Sz: '1' } }))).toEqual(['cells[6].strength: unknown field "Sz"']);
    expect(errorsOf(withCell(4, { ...contract.cells[4], name: '2R' }))[0]).toMatch(/^cells\[4\]\.name: must start with a letter/);
    expect(errorsOf({ ...contract, unitSystem: 'imperial' })).toEqual(['unitSystem: must be "SI" or "US"']);
    expect(errorsOf({ ...contract, cells: 'none' })).toEqual(['cells: must be an array of cells']);
  });

  it('refuses other files and newer versions with a clear message', () => {
    expect(errorsOf({ ...contract, version: 2 })).toEqual(['version: 2 is newer than this engine reads (1)']);
    expect(errorsOf({ ...contract, version: 0 })).toEqual(['version: must be 1']);
    expect(errorsOf({ ...contract, format: 'other' })).toEqual(['format: must be "sheaf-sheet"']);
    expect(errorsOf('[1, 2]')).toEqual(['the file must hold a JSON object (a sheet)']);
    expect(errorsOf('{"format": ')[0]).toMatch(/^JSON: /);
  });
});

describe('writeSheet', () => {
  it('writes fields in the format order and reads back to the same sheet', () => {
    const r = readSheet(contract);
    if (!r.ok) throw new Error(r.errors.join('\n'));
    const text = writeSheet(r.sheet);
    expect(text.endsWith('\n')).toBe(true);
    expect(JSON.parse(text)).toEqual(contract);
    expect(Object.keys(JSON.parse(text).cells[6])).toEqual(['id', 'kind', 'name', 'of', 'theory', 'strength', 'required']);
    const again = readSheet(text);
    expect(again).toEqual(r);
    if (again.ok) expect(writeSheet(again.sheet)).toBe(text);
  });

  it('round-trips generated sheets of quantity and stress cells', () => {
    const expr = fc.constantFrom('1 MPa', '2 kN / (3 mm^2)', 'A * 2', '30 deg', 'x');
    const cell = fc.oneof(
      fc.record({ kind: fc.constant('quantity'), name: fc.constantFrom('A', 'B', 'sigma_1'), expr }),
      fc.record({ kind: fc.constant('stress'), name: fc.constantFrom('S', 'T'), sx: expr, sy: expr, txy: expr }, { requiredKeys: ['kind', 'name', 'sx', 'sy', 'txy'] }),
      fc.record({ kind: fc.constant('note'), text: fc.string() }),
    );
    fc.assert(
      fc.property(fc.array(cell, { maxLength: 8 }), fc.constantFrom('SI', 'US'), (cells, unitSystem) => {
        const sheet = { format: 'sheaf-sheet', version: 1, title: 'T', unitSystem, cells: cells.map((c, i) => ({ id: `k${i}`, ...c })) };
        const r = readSheet(sheet);
        if (!r.ok) throw new Error(r.errors.join('\n'));
        expect(readSheet(writeSheet(r.sheet))).toEqual(r);
      }),
    );
  });
});

describe('JSON Schema', () => {
  it('the committed docs/sheet-format.schema.json equals the one generated from the engine (npm run schema -w @sheaf/engine)', () => {
    const here = dirname(fileURLToPath(import.meta.url));
    const committed = readFileSync(resolve(here, '../../../../docs/sheet-format.schema.json'), 'utf8');
    expect(committed).toBe(sheetJsonSchemaText());
  });

  it('describes every kind and the top level', () => {
    const schema = JSON.parse(sheetJsonSchemaText());
    expect(schema.required).toEqual(['format', 'version', 'cells']);
    const kinds = schema.$defs.SheafCell.oneOf.map((c: { properties: { kind: { const: string } } }) => c.properties.kind.const);
    expect(kinds).toEqual(['note', 'quantity', 'stress', 'rosette', 'rotate', 'principal', 'criterion', 'pointset']);
  });
});
