import { describe, expect, it } from 'vitest';
import type { TemplateDetail } from '@sheaf/engine/api';
import { ApiError } from '../../api/ApiError';
import { checkParameterRows, parameterRows, parametersOfRows, unitOfValue } from './parameterDefinitions';
import { checkParameterForm, rangeText, serverParameterErrors } from './parameterForm';

const content = {
  format: 'sheaf-sheet' as const,
  version: 1 as const,
  cells: [
    { id: 'q1', kind: 'quantity', name: 'p', expr: '20 MPa' },
    { id: 'q2', kind: 'quantity', name: 'r', expr: '60 mm' },
    { id: 'q3', kind: 'quantity', name: 't', expr: '6 mm' },
    { id: 'q4', kind: 'quantity', name: 's_hoop', expr: 'p * r / t' },
    { id: 's1', kind: 'stress', name: 'S', sx: 's_hoop', sy: '0 MPa', txy: '0 MPa' },
  ],
};
const template = {
  content,
  parameters: [
    { cellId: 'q1', name: 'p', label: 'Internal pressure', unit: 'MPa', min: '0 MPa' },
    { cellId: 'q2', name: 'r', label: 'Inside radius', unit: 'mm' },
    { cellId: 'q3', name: 't', label: 'Wall thickness', unit: 'mm', min: '0.1 mm', max: 'r / 10' },
  ],
} as unknown as Pick<TemplateDetail, 'content' | 'parameters'>;

describe('the new-sheet parameter form', () => {
  it('places each problem beside its parameter, in the words of the engine', () => {
    const errors = checkParameterForm(template, { p: '20 kN', r: '60 mm', t: '7' });
    expect(errors.form).toEqual([]);
    expect(errors.byName).toEqual({
      p: expect.stringMatching(/^Internal pressure: expected a stress .* got a force/),
      t: 'Wall thickness must be at most 6 mm (got 7 mm)',
    });
    expect(checkParameterForm(template, { p: '20', r: '60 mm', t: '6 mm' })).toEqual({ byName: {}, form: [] });
  });

  it('places the server’s answer the same way', () => {
    const error = new ApiError(400, 'invalid-field', 'body.parameters.t: Wall thickness must be at most 6 mm (got 7 mm)', [
      { field: 'body.parameters.t', message: 'body.parameters.t: Wall thickness must be at most 6 mm (got 7 mm)' },
      { field: 'body.parameters.q', message: 'body.parameters.q: not a parameter of this template' },
    ]);
    expect(serverParameterErrors(error)).toEqual({
      byName: { t: 'Wall thickness must be at most 6 mm (got 7 mm)', q: 'not a parameter of this template' },
      form: [],
    });
  });

  it('writes a range in words', () => {
    expect(rangeText(template.parameters[2]!)).toBe('0.1 mm to r / 10');
    expect(rangeText(template.parameters[0]!)).toBe('at least 0 MPa');
    expect(rangeText(template.parameters[1]!)).toBe('');
  });
});

describe('the save-as-template parameter definitions', () => {
  it('offers quantity cells with the unit of their value, and formulas unchosen', () => {
    expect(unitOfValue('20 MPa')).toBe('MPa');
    expect(unitOfValue('0.33')).toBe('');
    expect(unitOfValue('18 kN/m^3')).toBe('kN/m^3');
    expect(unitOfValue('p * r / t')).toBeNull();
    const rows = parameterRows(content.cells);
    expect(rows.map((r) => [r.name, r.unit, r.chosen])).toEqual([
      ['p', 'MPa', false],
      ['r', 'mm', false],
      ['t', 'mm', false],
      ['s_hoop', '', false],
    ]);
  });

  it('turns chosen rows into parameters and names the cell of a bad definition', () => {
    const rows = parameterRows(content.cells).map((r) => (r.name === 't' ? { ...r, chosen: true, max: '5 MPa' } : r.name === 'p' ? { ...r, chosen: true, label: 'Pressure' } : r));
    expect(parametersOfRows(rows)).toEqual([
      { cellId: 'q1', name: 'p', label: 'Pressure', unit: 'MPa' },
      { cellId: 'q3', name: 't', label: 't', unit: 'mm', max: '5 MPa' },
    ]);
    const problems = checkParameterRows(content, rows);
    expect(Object.keys(problems.byCell)).toEqual(['q3']);
    expect(problems.byCell.q3).toMatch(/expected a length/);
  });
});
