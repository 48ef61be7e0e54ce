import { describe, expect, it } from 'vitest';
import { caseTitle, expectAngleNear, expectNear, refCase } from '../../test/fixtures/cases';
import { errorOf, makeSheet, num, okOf } from '../test/makeSheet';

describe('rosette', () => {
  const s1 = refCase('S-01');
  it(`${caseTitle(s1)} as a delta rosette cell`, () => {
    const ev = makeSheet([{ kind: 'rosette', name: 'G', layout: 'delta', ea: '60e-6', eb: '135e-6', ec: '264e-6', E: '200 GPa', nu: '0.3' }]);
    const r = okOf(ev, 'G');
    expectNear(num(r, 'ex'), s1.expected.ex, 'ex');
    expectNear(num(r, 'ey'), s1.expected.ey, 'ey');
    expectNear(num(r, 'gxy'), s1.expected.gxy, 'gxy');
    expectNear(num(r, 'e1'), s1.expected.e1, 'e1');
    expectNear(num(r, 'e2'), s1.expected.e2, 'e2');
    expectAngleNear(num(r, 'thetaE'), s1.expected.theta_p1, 'thetaE');
  });

  const s3 = refCase('S-03');
  it(`${caseTitle(s3)} with explicit gauge angles`, () => {
    const ev = makeSheet([
      { kind: 'rosette', name: 'G', layout: 'angles', angles: ['0 deg', '60 deg', '120 deg'], ea: '800e-6', eb: '-200e-6', ec: '625e-6', E: '70 GPa', nu: '0.33' },
    ]);
    const r = okOf(ev, 'G');
    expectNear(num(r, 'ey'), s3.expected.ey, 'ey');
    expectNear(num(r, 'gxy'), s3.expected.gxy, 'gxy');
    expectNear(num(r, 'e1'), s3.expected.e1, 'e1');
    expectAngleNear(num(r, 'thetaE'), s3.expected.theta_p1, 'thetaE');
  });

  const s4 = refCase('S-04');
  it(`${caseTitle(s4)}: rectangular readings giving the published strains, then stresses`, () => {
    // Rectangular gauges reproducing ex = 770, ey = -350, gxy = 1940 µε: eb = (gxy + ea + ec)/2.
    const ev = makeSheet([
      { kind: 'rosette', name: 'G', layout: 'rectangular', ea: '770e-6', eb: '1180e-6', ec: '-350e-6', E: '70000 MPa', nu: '0.33' },
      { kind: 'principal', name: 'P', of: 'G' },
    ]);
    const r = okOf(ev, 'G');
    expect(num(r, 'ex')).toBeCloseTo(770e-6, 15);
    expect(num(r, 'ey')).toBeCloseTo(-350e-6, 15);
    expect(num(r, 'gxy')).toBeCloseTo(1940e-6, 15);
    expectNear(num(r, 'e1'), s4.expected.e1, 'e1');
    expectNear(num(r, 'e2'), s4.expected.e2, 'e2');
    expectNear(num(r, 'sx'), s4.expected.sx, 'sx');
    expectNear(num(r, 'sy'), s4.expected.sy, 'sy');
    expectNear(num(r, 'txy'), s4.expected.txy, 'txy');
    expectNear(num(okOf(ev, 'P'), 'p1'), s4.expected.s1, 's1');
    expectNear(num(okOf(ev, 'P'), 'p2'), s4.expected.s2, 's2');
    expect(ev.equation(r.cellId, 'SI')).toContain('2\\varepsilon_b - \\varepsilon_a - \\varepsilon_c');
  });

  it('bad input: E, nu, parallel gauges, strain with a unit, angles with the wrong layout', () => {
    const base = { kind: 'rosette', layout: 'rectangular', ea: '1e-4', eb: '2e-4', ec: '3e-4', E: '200 GPa', nu: '0.3' };
    const ev = makeSheet([
      { ...base, name: 'R1', E: '-200 GPa' },
      { ...base, name: 'R2', nu: '0.6' },
      { ...base, name: 'R3', layout: 'angles', angles: ['0 deg', '90 deg', '180 deg'] },
      { ...base, name: 'R4', ea: '5 MPa' },
      { ...base, name: 'R5', angles: ['0 deg', '45 deg', '90 deg'] },
      { ...base, name: 'R6', layout: 'angles' },
      { ...base, name: 'R7', E: '200' },
    ]);
    expect(errorOf(ev, 'R1')).toMatchObject({ code: 'domain', message: 'E: must be positive' });
    expect(errorOf(ev, 'R2')).toMatchObject({ code: 'domain', message: 'nu: must lie between -1 and 0.5' });
    expect(errorOf(ev, 'R3')).toMatchObject({ code: 'domain', message: expect.stringMatching(/^angles: the three gauge angles do not fix/) });
    expect(errorOf(ev, 'R4')).toMatchObject({ code: 'unit-mismatch', message: 'ea: expected a plain number, got a pressure (stress)' });
    expect(errorOf(ev, 'R5')).toMatchObject({ code: 'invalid-field', message: expect.stringMatching(/^angles: is only used with layout "angles"/) });
    expect(errorOf(ev, 'R6')).toMatchObject({ code: 'invalid-field', message: expect.stringMatching(/^angles: is needed/) });
    expect(errorOf(ev, 'R7')).toMatchObject({ code: 'unit-mismatch', message: expect.stringMatching(/^E: expected a stress/) });
  });
});
