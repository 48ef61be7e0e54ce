import { describe, expect, it } from 'vitest';
import {
  applyTemplateParameters,
  checkTemplateParameters,
  defaultParameterValues,
  templateParametersSchema,
  type TemplateParameter,
} from './templateParameters';

const content = {
  format: 'sheaf-sheet',
  version: 1,
  title: 'Lug',
  cells: [
    { id: 'n1', kind: 'note', text: 'demo' },
    { id: 'q1', kind: 'quantity', name: 'F', expr: '18 kN' },
    { id: 'q2', kind: 'quantity', name: 'w', expr: '40 mm' },
    { id: 'q3', kind: 'quantity', name: 't', expr: '12 mm' },
    { id: 'q4', kind: 'quantity', name: 'A', expr: 'w * t' },
    { id: 'q5', kind: 'quantity', name: 'k', expr: '1.5' },
  ],
} as const;

const parameters: TemplateParameter[] = [
  { cellId: 'q1', name: 'F', label: 'Lug load', unit: 'kN', min: '0 kN', max: '500 kN' },
  { cellId: 'q2', name: 'w', label: 'Plate width', unit: 'mm', min: '10 mm' },
  { cellId: 'q3', name: 't', label: 'Plate thickness', unit: 'mm', min: '3 mm', max: 'w / 2' },
  { cellId: 'q5', name: 'k', label: 'Dynamic factor', unit: '', min: '1', max: '3' },
];

describe('template parameters', () => {
  it('accept the template\u2019s own values and list them as the form defaults', () => {
    expect(checkTemplateParameters(content, parameters)).toEqual([]);
    expect(defaultParameterValues(content, parameters)).toEqual({ F: '18 kN', w: '40 mm', t: '12 mm', k: '1.5' });
  });

  it('replace only the parameter cells\u2019 expr, read plain numbers in the parameter unit, and leave the template alone', () => {
    const outcome = applyTemplateParameters(content, parameters, { F: '25', w: '1.5 in', t: '10 mm', k: '2' });
    expect(outcome.ok).toBe(true);
    if (!outcome.ok) return;
    expect(outcome.content.cells.map((c) => ('expr' in c ? c.expr : null))).toEqual([null, '25 kN', '1.5 in', '10 mm', 'w * t', '2']);
    expect(outcome.exprs).toEqual({ F: '25 kN', w: '1.5 in', t: '10 mm', k: '2' });
    expect(content.cells[1]).toEqual({ id: 'q1', kind: 'quantity', name: 'F', expr: '18 kN' });
  });

  it('name the field, the label and the range for values out of range, with bounds that name other parameters', () => {
    const outcome = applyTemplateParameters(content, parameters, { F: '-2 kN', w: '20 mm', t: '11 mm', k: '5' });
    expect(outcome).toEqual({
      ok: false,
      problems: [
        { field: 'parameters.F', message: 'parameters.F: Lug load must be at least 0 kN (got -2 kN)' },
        { field: 'parameters.t', message: 'parameters.t: Plate thickness must be at most 10 mm (got 11 mm)' },
        { field: 'parameters.k', message: 'parameters.k: Dynamic factor must be at most 3 (got 5)' },
      ],
    });
  });

  it('check the dimension of each value against its unit, with the engine\u2019s words', () => {
    const outcome = applyTemplateParameters(content, parameters, { F: '18 MPa', w: '40 kN', t: '10 mm', k: '1 mm' });
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    expect(outcome.problems.map((p) => p.field)).toEqual(['parameters.F', 'parameters.w', 'parameters.k']);
    expect(outcome.problems[0]!.message).toBe('parameters.F: Lug load: expected a force (e.g. 18 kN), got a pressure (stress)');
    expect(outcome.problems[1]!.message).toBe('parameters.w: Plate width: expected a length (e.g. 12 mm), got a force');
    expect(outcome.problems[2]!.message).toBe('parameters.k: Dynamic factor: expected a plain number, got a length');
  });

  it('report missing values, bad expressions and names that are not parameters, all at once', () => {
    const outcome = applyTemplateParameters(content, parameters, { F: '', w: '40 mm +', t: 'depth / 2' });
    expect(outcome.ok).toBe(false);
    if (outcome.ok) return;
    expect(outcome.problems.map((p) => p.field)).toEqual(['parameters.F', 'parameters.k', 'parameters.w', 'parameters.t']);
    expect(outcome.problems[0]!.message).toBe('parameters.F: Lug load is required');
    expect(outcome.problems[3]!.message).toMatch(/^parameters\.t: Plate thickness: .*"depth"/);
  });

  it('find definitions that point at a missing or non-quantity cell, a wrong name or an unknown unit', () => {
    const bad: TemplateParameter[] = [
      { cellId: 'n1', name: 'x', label: 'Note', unit: 'mm' },
      { cellId: 'q2', name: 'width', label: 'Width', unit: 'mm' },
      { cellId: 'q3', name: 't', label: 'Thickness', unit: 'furlongs per fortnight' },
    ];
    expect(checkTemplateParameters(content, bad).map((p) => p.field)).toEqual([
      'parameters[0].cellId',
      'parameters[1].name',
      'parameters[2].unit',
    ]);
  });

  it('find a bound of the wrong dimension', () => {
    const bad: TemplateParameter[] = [{ cellId: 'q3', name: 't', label: 'Thickness', unit: 'mm', max: '5 MPa' }];
    expect(checkTemplateParameters(content, bad)).toEqual([
      { field: 'parameters[0].max', message: 'parameters[0].max: expected a length (e.g. 12 mm), got a pressure (stress)' },
    ]);
  });

  it('refuse a list that names a cell or a parameter twice', () => {
    const result = templateParametersSchema.safeParse([parameters[0], { ...parameters[0], name: 'G' }, { ...parameters[1], cellId: 'q9', name: 'F' }]);
    expect(result.success).toBe(false);
    expect(result.error!.issues.map((i) => i.path.join('.'))).toEqual(['1.cellId', '2.name']);
  });
});
