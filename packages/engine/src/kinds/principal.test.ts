import { describe, expect, it } from 'vitest';
import { caseTitle, expectAngleNear, expectNear, refCase } from '../../test/fixtures/cases';
import { errorOf, makeSheet, num, okOf } from '../test/makeSheet';

describe('principal', () => {
  const p = refCase('P-01');
  it(`${caseTitle(p)} as cells`, () => {
    const ev = makeSheet([
      { kind: 'stress', name: 'S', sx: '50 MPa', sy: '-10 MPa', txy: '40 MPa' },
      { kind: 'principal', name: 'P', of: 'S' },
    ]);
    const r = okOf(ev, 'P');
    expectNear(num(r, 'p1'), p.expected.s1, 'p1');
    expectNear(num(r, 'p2'), p.expected.s2, 'p2');
    expectAngleNear(num(r, 'thetaP'), p.expected.theta_p1, 'thetaP');
    expectAngleNear(num(r, 'thetaS'), p.expected.theta_s1, 'thetaS');
    expectNear(num(r, 'tauMaxInPlane'), p.expected.tau_max_inplane, 'tau max in-plane');
    expectNear(num(r, 'tauMax'), p.expected.tau_abs_max, 'tau abs max');
    expect([r.values.s1, r.values.s2, r.values.s3]).toEqual([70e6, 0, -30e6]);
    expect(num(r, 'radius13')).toBe(50e6);
    const tex = ev.equation(r.cellId, 'SI')!;
    expect(tex).toContain('\\pm');
    expect(tex).toContain('70\\,\\mathrm{MPa},\\ -30\\,\\mathrm{MPa}');
  });

  const d = refCase('D-05');
  it(`${caseTitle(d)} as cells: 3D values and no in-plane pair`, () => {
    const ev = makeSheet([
      { kind: 'stress', name: 'S', sx: '50 MPa', sy: '-20 MPa', sz: '10 MPa', txy: '30 MPa', tyz: '-10 MPa', tzx: '20 MPa' },
      { kind: 'principal', name: 'P', of: 'S' },
    ]);
    const r = okOf(ev, 'P');
    expectNear(num(r, 's1'), d.expected.s1, 's1');
    expectNear(num(r, 's2'), d.expected.s2, 's2');
    expectNear(num(r, 's3'), d.expected.s3, 's3');
    expectNear(num(r, 'I2'), d.expected.I2, 'I2');
    expectNear(num(r, 'I3'), d.expected.I3, 'I3');
    expectNear(num(r, 'vonMises'), d.expected.von_mises, 'von Mises');
    expectNear(num(r, 'tauOct'), d.expected.tau_oct, 'tau_oct');
    expect(r.values.p1).toBeUndefined();
    expect(ev.equation(r.cellId, 'SI')).toContain('I_1');
  });

  it('bad input: of a criterion, missing of, of with a bad name', () => {
    const ev = makeSheet([
      { kind: 'stress', name: 'S', sx: '50 MPa', sy: '0 MPa', txy: '0 MPa' },
      { kind: 'criterion', name: 'C', of: 'S', theory: 'tresca', strength: { Sy: '250 MPa' } },
      { kind: 'principal', name: 'P1', of: 'C' },
      { kind: 'principal', name: 'P2' },
      { kind: 'principal', name: 'P3', of: '2S' },
    ]);
    expect(errorOf(ev, 'P1')).toMatchObject({ code: 'invalid-field', message: expect.stringMatching(/^of: "C" is a criterion cell/) });
    expect(errorOf(ev, 'P2')).toMatchObject({ code: 'invalid-field', message: expect.stringMatching(/^of: /) });
    expect(errorOf(ev, 'P3')).toMatchObject({ code: 'invalid-field', message: expect.stringMatching(/^of: must start with a letter/) });
  });
});
