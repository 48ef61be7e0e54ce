import { describe, expect, it } from 'vitest';
import { errorOf, makeSheet, okOf } from '../test/makeSheet';

describe('stress', () => {
  it('plane state from expressions; missing 3D components are zero', () => {
    const ev = makeSheet([
      { kind: 'quantity', name: 'F', expr: '18 kN' },
      { kind: 'quantity', name: 'A', expr: '40 mm * 12 mm' },
      { kind: 'stress', name: 'S', sx: 'F / A', sy: '0 MPa', txy: '22 MPa' },
    ]);
    const s = okOf(ev, 'S');
    expect(s.values).toEqual({ sx: 37.5e6, sy: 0, txy: 22e6, sz: 0, tyz: 0, tzx: 0 });
    expect(s.state).toEqual({ sx: 37.5e6, sy: 0, txy: 22e6, sz: 0, tyz: 0, tzx: 0 });
    expect(ev.equation(s.cellId, 'US')).toContain('\\mathrm{ksi}');
  });

  it('3D state in US units', () => {
    const ev = makeSheet([{ kind: 'stress', name: 'T', sx: '10 ksi', sy: '-4 ksi', txy: '3 ksi', sz: '2 ksi', tyz: '1 ksi' }]);
    const t = okOf(ev, 'T');
    expect(t.values.sz).toBeCloseTo(2 * 6894757.293, 2);
    expect(t.values.tzx).toBe(0);
  });

  it('bad input: wrong dimension, missing field, bad expression, upstream error', () => {
    const ev = makeSheet([
      { kind: 'stress', name: 'S1', sx: '5 kN', sy: '0 MPa', txy: '0 MPa' },
      { kind: 'stress', name: 'S2', sx: '5 MPa', txy: '0 MPa' },
      { kind: 'stress', name: 'S3', sx: '5 MPa', sy: '0', txy: '0 MPa' },
      { kind: 'quantity', name: 'bad', expr: '1 +' },
      { kind: 'stress', name: 'S4', sx: 'bad', sy: '0 MPa', txy: '0 MPa' },
    ]);
    expect(errorOf(ev, 'S1')).toMatchObject({
      code: 'unit-mismatch',
      message: 'sx: expected a stress (a pressure, e.g. 120 MPa or 18 ksi), got a force',
    });
    expect(errorOf(ev, 'S2')).toMatchObject({ code: 'invalid-field', message: expect.stringMatching(/^sy: /) });
    expect(errorOf(ev, 'S3')).toMatchObject({ code: 'unit-mismatch', message: expect.stringMatching(/^sy: expected a stress.*got a plain number/) });
    expect(errorOf(ev, 'S4')).toMatchObject({ code: 'upstream', rootCellId: ev.idOf('bad') });
  });
});
