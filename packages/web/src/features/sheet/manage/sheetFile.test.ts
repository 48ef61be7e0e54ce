import { readSheet } from '@sheaf/engine';
import { docFromSheetContent, sheetCells, sheetMeta, type SheetFileContent } from '@sheaf/sheet-doc';
import { describe, expect, it } from 'vitest';
import * as Y from 'yjs';
import { readSheetFile, sheetFileFromDoc, sheetFileName } from './sheetFile';

const lug: SheetFileContent = {
  format: 'sheaf-sheet',
  version: 1,
  title: 'Lifting lug, weld toe',
  unitSystem: 'US',
  cells: [
    { id: 'k2', kind: 'quantity', name: 'F', expr: '18 kN' },
    { id: 'k4', kind: 'stress', name: 'S', sx: 'F / (480 mm^2)', sy: '0 MPa', txy: '22 MPa' },
    { id: 'k7', kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
  ],
};

describe('sheetFileFromDoc', () => {
  it('writes the live document as a format v1 file that reads back to the same sheet', () => {
    const doc = docFromSheetContent(lug);
    const file = sheetFileFromDoc(doc);
    if (!file.ok) throw new Error(file.errors.join('; '));
    const back = readSheet(file.text);
    expect(back.ok && back.sheet).toEqual({ ...lug, cells: lug.cells });
    expect(file.text.endsWith('\n')).toBe(true);
  });

  it('leaves out document values that are not part of the format', () => {
    const doc = docFromSheetContent(lug);
    sheetMeta(doc).set('draftNote', 'x');
    doc.getMap('display').set('shearAxis', 'clockwise-up');
    const file = sheetFileFromDoc(doc);
    expect(file.ok && JSON.parse(file.text)).not.toHaveProperty('draftNote');
  });

  it('names the field at fault while a cell is half-typed', () => {
    const doc = docFromSheetContent(lug);
    (sheetCells(doc).get('k4')!.get('name') as Y.Text).delete(0, 1);
    expect(sheetFileFromDoc(doc)).toEqual({
      ok: false,
      errors: ['cells[1].name: must start with a letter or _ and hold only letters, digits and _'],
    });
  });
});

describe('readSheetFile', () => {
  it('accepts a valid file and keeps its title', () => {
    const read = readSheetFile(JSON.stringify(lug), 'anything.sheet.json');
    expect(read).toMatchObject({ ok: true, title: 'Lifting lug, weld toe' });
  });

  it('takes the file name as title when the sheet has none', () => {
    const { title: _title, ...untitled } = lug;
    expect(readSheetFile(JSON.stringify(untitled), 'GBL-007.sheet.json')).toMatchObject({ ok: true, title: 'GBL-007' });
  });

  it('lists each problem with its JSON path', () => {
    const bad = {
      ...lug,
      cells: [
        { id: 'k2', kind: 'quantity', name: 'F', expr: 18 },
        { id: 'k4', kind: 'stress', name: '2S', sx: '1 MPa', sy: '0 MPa', txy: '0 MPa' },
        { id: 'k7', kind: 'criterion', name: 'C', of: 'S', theory: 'rankine', strength: { Sy: '250 MPa' } },
      ],
    };
    const read = readSheetFile(JSON.stringify(bad), 'bad.sheet.json');
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(read.errors).toEqual([
      'cells[0].expr: must be a string (an expression such as "120 MPa")',
      'cells[1].name: must start with a letter or _ and hold only letters, digits and _',
      'cells[2].theory: must be one of von-mises, tresca, max-normal, coulomb-mohr, modified-mohr, mohr-coulomb',
    ]);
  });

  it('says so for a file that is not JSON, not a sheet, or empty', () => {
    expect(readSheetFile('{"format":', 'x.json')).toMatchObject({ ok: false, errors: [expect.stringMatching(/^JSON: /)] });
    expect(readSheetFile('{"format":"other"}', 'x.json')).toEqual({ ok: false, errors: ['format: must be "sheaf-sheet"'] });
    expect(readSheetFile('  ', 'x.json')).toEqual({ ok: false, errors: ['the file is empty'] });
  });
});

describe('sheetFileName', () => {
  it('names the file after the calc number, made safe', () => {
    expect(sheetFileName('GBL-001')).toBe('GBL-001.sheet.json');
    expect(sheetFileName('Lug / weld: LC2?')).toBe('Lug-weld-LC2.sheet.json');
    expect(sheetFileName('')).toBe('sheet.sheet.json');
  });
});
