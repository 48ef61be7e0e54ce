import { describe, expect, it } from 'vitest';
import { caseTitle, expectNear, refCase } from '../../test/fixtures/cases';
import { errorOf, makeSheet, num, okOf } from '../test/makeSheet';

const f = ['F-03', 'F-04'].map(refCase);

describe('pointset', () => {
  it(`inline rows in kpsi, von Mises: ${f.map(caseTitle).join('; ')}`, () => {
    const rows = f.map((c) => [c.inputs.sx!.value as number, c.inputs.sy!.value as number, c.inputs.txy!.value as number]);
    const ev = makeSheet([
      {
        kind: 'pointset', name: 'PS', source: { rows }, columns: { sx: 0, sy: 1, txy: 2 }, unit: 'kpsi',
        theory: 'von-mises', strength: { Sy: `${f[0]!.inputs.Sy!.value} ${f[0]!.inputs.Sy!.unit}` }, required: '1.5', perRow: true,
      },
    ]);
    const r = okOf(ev, 'PS');
    expect(r.values.count).toBe(2);
    expectNear(num(r, 'minFactor'), f[0]!.expected.n_DE, 'min factor = case (c)');
    expect(r.values.worstRow).toBe(0);
    expect(r.values.failing).toBe(1);
    expect(r.values.pass).toBe(false);
    const factors = r.values.factors as number[];
    expectNear(factors[1]!, f[1]!.expected.n_DE, 'case (d)');
    expect(ev.equation(r.cellId, 'SI')).toContain('\\text{row } 0');
  });

  it('3D columns in another order, and an all-unbounded set', () => {
    const ev = makeSheet([
      { kind: 'pointset', name: 'A', source: { rows: [[1, 2, 3, 0.5, 0.2, 0.1, 9]] }, columns: { sx: 0, sy: 1, sz: 2, txy: 3, tyz: 4, tzx: 5 }, theory: 'tresca', strength: { Sy: '250 MPa' } },
      { kind: 'pointset', name: 'B', source: { rows: [[-5, -5, 0, 0, 0, 0]] }, columns: { sx: 0, sy: 1, sz: 1, txy: 2, tyz: 3, tzx: 4 }, theory: 'von-mises', strength: { Sy: '250 MPa' } },
      { kind: 'pointset', name: 'C', source: { rows: [] }, columns: { sx: 0, sy: 1, txy: 2 }, theory: 'von-mises', strength: { Sy: '250 MPa' } },
    ]);
    expect(num(okOf(ev, 'A'), 'minFactor')).toBeGreaterThan(50);
    expect(okOf(ev, 'B').values).toMatchObject({ minFactor: null, unbounded: true, failing: 0 });
    expect(okOf(ev, 'C').values).toMatchObject({ count: 0, minFactor: null, worstRow: -1 });
  });

  it('bad input: upload sources, named columns on inline rows, a bad row, a bad unit', () => {
    const base = { kind: 'pointset', columns: { sx: 0, sy: 1, txy: 2 }, theory: 'von-mises', strength: { Sy: '250 MPa' } };
    const ev = makeSheet([
      { ...base, name: 'U', source: { upload: 'u-123' } },
      { ...base, name: 'N', source: { rows: [[1, 2, 3]] }, columns: { sx: 'S11', sy: 1, txy: 2 } },
      { ...base, name: 'R', source: { rows: [[1, 2, 3], [1, 2]] } },
      { ...base, name: 'V', source: { rows: [[1, 2, 3]] }, unit: 'mm' },
      { ...base, name: 'W', source: { rows: [[1, 2, 3]] }, unit: '2 MPa' },
      { ...base, name: 'X', source: { rows: 'a,b,c' } },
    ]);
    expect(errorOf(ev, 'U')).toMatchObject({ code: 'not-supported', message: expect.stringMatching(/^source: uploads are not read/) });
    expect(errorOf(ev, 'N')).toMatchObject({ code: 'invalid-field', message: 'columns.sx: inline rows need a column index (0-based), not a name' });
    expect(errorOf(ev, 'R')).toMatchObject({ code: 'invalid-field', message: 'source.rows[1][2] (txy): is missing' });
    expect(errorOf(ev, 'V')).toMatchObject({ code: 'unit-mismatch', message: expect.stringMatching(/^unit: expected a stress.*got a length/) });
    expect(errorOf(ev, 'W')).toMatchObject({ code: 'invalid-field', message: expect.stringMatching(/^unit: give a pressure unit/) });
    expect(errorOf(ev, 'X')).toMatchObject({ code: 'invalid-field', message: expect.stringMatching(/^source\.rows: /) });
  });
});
