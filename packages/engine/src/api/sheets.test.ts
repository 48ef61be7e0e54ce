import { describe, expect, it } from 'vitest';
import { CreateSheetRequest, SheetContentV1, UpdateSheetRequest } from './sheets';

const lug = {
  format: 'sheaf-sheet',
  version: 1,
  title: 'Lifting lug, weld toe',
  unitSystem: 'SI',
  cells: [
    { id: 'k1', kind: 'quantity', name: 'F', expr: '18 kN' },
    { id: 'k2', kind: 'stress', name: 'S', sx: 'F / (40 mm * 12 mm)', sy: '0 MPa', txy: '22 MPa' },
  ],
};

function issuePaths(result: { success: boolean; error?: { issues: { path: PropertyKey[] }[] } }): string[] {
  return (result.error?.issues ?? []).map((issue) => issue.path.join('.'));
}

describe('SheetContentV1', () => {
  it('accepts a version 1 sheet and keeps the fields of each cell kind', () => {
    const parsed = SheetContentV1.parse(lug);
    expect(parsed.cells[1]).toEqual(lug.cells[1]);
  });

  it('rejects another format, another version, and cells without id or kind, naming each field', () => {
    const result = SheetContentV1.safeParse({
      format: 'spreadsheet',
      version: 2,
      cells: [{ kind: 'note' }, { id: 'k2' }],
    });
    expect(result.success).toBe(false);
    expect(issuePaths(result).sort()).toEqual(['cells.0.id', 'cells.1.kind', 'format', 'version']);
  });

  it('rejects duplicate cell ids at the second occurrence', () => {
    const result = SheetContentV1.safeParse({ ...lug, cells: [lug.cells[0], { ...lug.cells[1], id: 'k1' }] });
    expect(issuePaths(result)).toEqual(['cells.1.id']);
  });
});

describe('sheet requests', () => {
  it('requires a non-empty title to create a sheet', () => {
    expect(issuePaths(CreateSheetRequest.safeParse({ title: '   ' }))).toEqual(['title']);
  });

  it('refuses an update that changes nothing', () => {
    expect(UpdateSheetRequest.safeParse({}).success).toBe(false);
    expect(UpdateSheetRequest.safeParse({ title: 'Pad bearing check' }).success).toBe(true);
  });
});
