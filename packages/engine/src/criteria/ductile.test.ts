import { describe, expect, it } from 'vitest';
import { caseTitle, expectNear, refCase, si } from '../../test/fixtures/cases';
import { principalPlaneStresses } from '../stress/principalPlane';
import { checkCriterion } from './checkCriterion';
import { trescaTheory } from './tresca';
import { vonMisesTheory } from './vonMises';

const plane = (sx: number, sy: number, txy: number) => ({ sx, sy, txy, sz: 0, tyz: 0, tzx: 0 });

function check(theory: 'von-mises' | 'tresca', state: ReturnType<typeof plane>, Sy: number, required = 1) {
  const r = checkCriterion(theory, state, { Sy }, required);
  if (!r.ok) throw new Error(r.problem.message);
  return r.check;
}

describe('von Mises and Tresca factors against published examples', () => {
  for (const id of ['F-01', 'F-03', 'F-04', 'F-06']) {
    const c = refCase(id);
    it(caseTitle(c), () => {
      const state = plane(si(c.inputs.sx), si(c.inputs.sy), si(c.inputs.txy));
      const Sy = si(c.inputs.Sy);
      const de = check('von-mises', state, Sy);
      const mss = check('tresca', state, Sy);
      expectNear(de.principal[0], c.expected.s1, 's1');
      expectNear(de.principal[2], c.expected.s3, 's3');
      expectNear(de.equivalent!, c.expected.von_mises, 'von Mises');
      expectNear(mss.equivalent!, c.expected.tresca_equiv, 'Tresca equivalent');
      expectNear(de.factor, c.expected.n_DE, 'n_DE');
      expectNear(mss.factor, c.expected.n_MSS, 'n_MSS');
    });
  }

  const shaft = refCase('C-14');
  it(caseTitle(shaft), () => {
    // Solid shaft at the surface: sigma = P/A + 32M/(π d³), tau = 16T/(π d³).
    const d = si(shaft.inputs.d);
    const sx = si(shaft.inputs.P) / ((Math.PI * d * d) / 4) + (32 * si(shaft.inputs.M)) / (Math.PI * d ** 3);
    const tau = (16 * si(shaft.inputs.T)) / (Math.PI * d ** 3);
    expectNear(sx, shaft.expected.sx, 'sx');
    expectNear(tau, shaft.expected.tau, 'tau');
    const state = plane(sx, 0, tau);
    const p = principalPlaneStresses(state);
    expectNear(p.p1, shaft.expected.s1, 's1');
    expectNear(p.p2, shaft.expected.s2, 's2');
    expectNear(p.tauMaxInPlane, shaft.expected.tau_max_inplane, 'tau max in-plane');
    const de = check('von-mises', state, si(shaft.inputs.Sy));
    expectNear(de.equivalent!, shaft.expected.von_mises, 'von Mises');
    expectNear(de.factor, shaft.expected.n_DE, 'n_DE');
    expectNear(check('tresca', state, si(shaft.inputs.Sy)).factor, shaft.expected.n_MSS, 'n_MSS');
  });

  const tube = refCase('V-07');
  it(caseTitle(tube), () => {
    // Tube at the wall's top: sigma = P/A + M c / I, tau = T c / J (exact section properties).
    const ro = si(tube.inputs.do) / 2;
    const ri = si(tube.inputs.di) / 2;
    const A = Math.PI * (ro ** 2 - ri ** 2);
    const I = (Math.PI / 4) * (ro ** 4 - ri ** 4);
    const sx = si(tube.inputs.P) / A + (si(tube.inputs.F) * si(tube.inputs.arm) * ro) / I;
    const tau = (si(tube.inputs.T) * ro) / (2 * I);
    expectNear(sx, tube.expected.sx, 'sx');
    expectNear(tau, tube.expected.tau, 'tau');
    const de = check('von-mises', plane(sx, 0, tau), si(tube.inputs.Sy));
    expectNear(de.equivalent!, tube.expected.von_mises, 'von Mises');
    expectNear(de.factor, tube.expected.n_DE, 'n_DE');
  });

  const shear = refCase('C-07');
  it(`${caseTitle(shear)}: pure shear yields at Sy/√3 (von Mises) and Sy/2 (Tresca)`, () => {
    const Sy = si(shear.inputs.Sy);
    const tau = 1e6;
    const de = check('von-mises', plane(0, 0, tau), Sy);
    const mss = check('tresca', plane(0, 0, tau), Sy);
    expectNear(de.factor * tau, shear.expected.Ssy_vonMises, 'Ssy von Mises');
    expectNear(mss.factor * tau, shear.expected.Ssy_Tresca, 'Ssy Tresca');
    expectNear((de.factor * tau) / Sy, shear.expected.ratio_vonMises, 'ratio');
  });

  const uni = refCase('C-02');
  it(`${caseTitle(uni)}: both equivalents equal the uniaxial stress`, () => {
    const state = plane(si(uni.inputs.sx), 0, 0);
    expectNear(check('von-mises', state, 250e6).equivalent!, uni.expected.von_mises_plane, 'von Mises');
    expectNear(check('tresca', state, 250e6).equivalent!, uni.expected.tresca_equiv, 'Tresca');
  });

  const same = refCase('C-09');
  it(`${caseTitle(same)}: Tresca takes the out-of-plane zero`, () => {
    const state = plane(si(same.inputs.sx), si(same.inputs.sy), 0);
    expectNear(check('tresca', state, 250e6).equivalent! / 2, same.expected.tau_abs_max, 'tau abs max');
  });
});

describe('factor, margin and pass (common practice, no source)', () => {
  it('margin = factor / required - 1 and pass = factor >= required', () => {
    const state = plane(80e6, -40e6, 25e6);
    const ok = check('von-mises', state, 250e6, 1.5);
    expect(ok.margin).toBeCloseTo(ok.factor / 1.5 - 1, 12);
    expect(ok.pass).toBe(true);
    const fail = check('von-mises', state, 250e6, 2.5);
    expect(fail.pass).toBe(false);
    expect(fail.margin).toBeLessThan(0);
  });

  it('a hydrostatic state has no finite von Mises or Tresca factor', () => {
    const state = { sx: -50e6, sy: -50e6, sz: -50e6, txy: 0, tyz: 0, tzx: 0 };
    const de = check('von-mises', state, 250e6, 2);
    expect(de.factor).toBe(Infinity);
    expect(de.margin).toBe(Infinity);
    expect(de.pass).toBe(true);
    expect(check('tresca', state, 250e6).factor).toBe(Infinity);
  });

  it('bad strengths and required factors are named', () => {
    const state = plane(1e6, 0, 0);
    const r1 = checkCriterion('von-mises', state, {});
    expect(r1).toEqual({ ok: false, problem: { key: 'Sy', message: 'is missing' } });
    const r2 = checkCriterion('tresca', state, { Sy: -5 });
    expect(!r2.ok && r2.problem.key).toBe('Sy');
    const r3 = checkCriterion('von-mises', state, { Sy: 250e6 }, 0);
    expect(!r3.ok && r3.problem.key).toBe('required');
    expect(vonMisesTheory.needs).toEqual(['Sy']);
    expect(trescaTheory.needs).toEqual(['Sy']);
  });
});
