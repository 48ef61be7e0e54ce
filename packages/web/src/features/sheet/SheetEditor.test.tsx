import { docFromSheetContent, sheetContentFromDoc, type SheetFileContent } from '@sheaf/sheet-doc';
import { act, fireEvent, render, screen, within } from '@testing-library/react';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { flushQueuedEditors } from './expression/editorQueue';
import { SheetEditor } from './SheetEditor';
import { deferSelectionChange } from './testing/deferSelectionChange';

let restoreSelectionChange: () => void;
beforeAll(() => {
  restoreSelectionChange = deferSelectionChange();
});
afterAll(() => restoreSelectionChange());

// The lifting-lug sheet of docs/sheet-format.md (our own demo numbers).
function lug(): SheetFileContent {
  return {
    format: 'sheaf-sheet',
    version: 1,
    title: 'Lifting lug, weld toe',
    unitSystem: 'SI',
    cells: [
      { id: 'k1', kind: 'note', text: 'Load case **LC2**, $F = 18\\,kN$' },
      { id: 'k2', kind: 'quantity', name: 'load', expr: '18 kN' },
      { id: 'k3', kind: 'quantity', name: 'area', expr: '40 mm * 12 mm' },
      { id: 'k4', kind: 'stress', name: 'S', sx: 'load / area', sy: '0 MPa', txy: '22 MPa' },
      { id: 'k7', kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
    ],
  };
}

function renderEditor(readOnly: boolean, content = lug()) {
  const doc = docFromSheetContent(content);
  const view = render(<SheetEditor doc={doc} awareness={null} readOnly={readOnly} selfName="Eamon Reyes" fileStem="GBL-001" />);
  return { doc, ...view };
}

const ids = (doc: ReturnType<typeof docFromSheetContent>) => sheetContentFromDoc(doc).cells.map((c) => c.id);
const cellItem = (id: string) => document.getElementById(`cell-${id}`)!;

describe('SheetEditor', () => {
  it('shows every cell in order with its live result, equation and verdict', () => {
    renderEditor(false);
    const items = within(screen.getByRole('region', { name: 'Cells' })).getAllByRole('listitem');
    expect(items.map((item) => item.getAttribute('data-cell-id'))).toEqual(['k1', 'k2', 'k3', 'k4', 'k7']);
    expect(cellItem('k1').querySelector('strong')?.textContent).toBe('LC2');
    const stress = cellItem('k4').querySelector('dl[aria-label="Results of S"]')!;
    expect(stress.querySelector('[data-value="sx"] [data-number]')?.textContent).toBe('37.5');
    expect(cellItem('k4').querySelector('.equation .katex')).not.toBeNull();
    expect(cellItem('k7').querySelector('[data-verdict]')?.getAttribute('data-verdict')).toBe('pass');
    expect(within(cellItem('k7').querySelector<HTMLElement>('[data-verdict]')!).getByText('Pass')).toBeTruthy();
  });

  it('gives writers the controls to add, move, duplicate and delete cells', () => {
    renderEditor(false);
    expect(screen.getByRole('button', { name: /Add cell/ })).toBeTruthy();
    expect(within(cellItem('k4')).getByRole('button', { name: 'Delete S' })).toBeTruthy();
    expect(within(cellItem('k4')).getByRole('button', { name: 'Duplicate S' })).toBeTruthy();
    expect(within(cellItem('k4')).getByRole('button', { name: /Drag to move S/ })).toBeTruthy();
    // Fields show their text at once; their editors are built a few per frame.
    expect(cellItem('k4').querySelector('[data-field="sx"] [data-static-field]')?.textContent).toBe('load / area');
    act(() => flushQueuedEditors());
    const sx = cellItem('k4').querySelector('[data-field="sx"] .cm-content');
    expect(sx?.getAttribute('contenteditable')).toBe('true');
    expect(sx?.getAttribute('aria-label')).toBe('normal stress on the x face, S');
    expect(cellItem('k4').querySelector('[data-field="sx"] [data-static-field]')).toBeNull();
  });

  it('hides every control and makes every field read-only for checkers and viewers', () => {
    renderEditor(true);
    const region = screen.getByRole('region', { name: 'Cells' });
    expect(within(region).queryByRole('button', { name: /Add cell|Delete|Duplicate|Move|Drag|Insert below|Edit note/ })).toBeNull();
    act(() => flushQueuedEditors());
    // Nothing to edit, so no editor is built: each field is its text, marked read-only.
    expect(region.querySelector('.cm-content')).toBeNull();
    const fields = [...region.querySelectorAll('[data-static-field]')];
    expect(fields.length).toBeGreaterThan(5);
    for (const field of fields) {
      expect(field.getAttribute('aria-readonly')).toBe('true');
      expect(field.getAttribute('contenteditable')).toBeNull();
    }
    for (const select of region.querySelectorAll('select')) expect((select as HTMLSelectElement).disabled).toBe(true);
  });

  it('adds a cell of the kind chosen from the menu, with a fresh id and a free name', () => {
    const { doc } = renderEditor(false);
    fireEvent.click(screen.getByRole('button', { name: /Add cell/ }));
    const menu = screen.getByRole('menu', { name: 'Add cell' });
    expect(within(menu).getAllByRole('menuitem').map((item) => item.getAttribute('data-kind'))).toEqual([
      'note',
      'quantity',
      'stress',
      'rosette',
      'rotate',
      'principal',
      'criterion',
      'pointset',
    ]);
    fireEvent.click(within(menu).getByRole('menuitem', { name: /Principal stresses/ }));
    const cells = sheetContentFromDoc(doc).cells;
    expect(cells).toHaveLength(6);
    expect(cells[5]).toMatchObject({ kind: 'principal', name: 'P', of: 'S' });
    const added = cellItem(cells[5]!.id);
    expect(added.querySelector('dl[aria-label="Results of P"] [data-value="p1"]')).not.toBeNull();
  });

  it('moves a focused cell with Alt+Arrow keys and with its buttons', () => {
    const { doc } = renderEditor(false);
    fireEvent.keyDown(cellItem('k3'), { key: 'ArrowUp', altKey: true });
    expect(ids(doc)).toEqual(['k1', 'k3', 'k2', 'k4', 'k7']);
    fireEvent.click(within(cellItem('k4')).getByRole('button', { name: 'Move S down' }));
    expect(ids(doc)).toEqual(['k1', 'k3', 'k2', 'k7', 'k4']);
    expect((within(cellItem('k4')).getByRole('button', { name: 'Move S down' }) as HTMLButtonElement).disabled).toBe(true);
  });

  it('duplicates a cell under a new name, and deletes one with an undo', () => {
    const { doc } = renderEditor(false);
    fireEvent.click(within(cellItem('k4')).getByRole('button', { name: 'Duplicate S' }));
    const copy = sheetContentFromDoc(doc).cells[4]!;
    expect(copy).toMatchObject({ kind: 'stress', name: 'S2', sx: 'load / area' });
    expect(copy.id).not.toBe('k4');

    fireEvent.click(within(cellItem('k2')).getByRole('button', { name: 'Delete load' }));
    expect(ids(doc)).not.toContain('k2');
    // S now names a cell that is gone: the error names the field and the missing name.
    expect(cellItem('k4').querySelector('[data-error-message]')?.textContent).toBe('sx: no cell named "load"');
    act(() => {
      fireEvent.click(screen.getByRole('button', { name: 'Undo' }));
    });
    expect(ids(doc)).toEqual(['k1', 'k2', 'k3', 'k4', copy.id, 'k7']);
    expect(cellItem('k4').querySelector('[data-value="sx"] [data-number]')?.textContent).toBe('37.5');
  });

  it('shows the results again in the unit system chosen for the sheet', () => {
    const { doc } = renderEditor(false);
    fireEvent.change(screen.getByLabelText('Units'), { target: { value: 'US' } });
    expect(sheetContentFromDoc(doc).unitSystem).toBe('US');
    // 37.5 MPa / 6.894757 MPa per ksi = 5.4389 ksi.
    const sx = cellItem('k4').querySelector('[data-value="sx"]')!;
    expect(sx.querySelector('[data-number]')?.textContent).toBe('5.4389');
    expect(sx.textContent).toContain('ksi');
  });
});
