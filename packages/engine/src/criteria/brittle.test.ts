import { describe, expect, it } from 'vitest';
import { caseTitle, expectNear, refCase, si } from '../../test/fixtures/cases';
import { checkCriterion } from './checkCriterion';
import type { TheoryId } from './types';

const plane = (sx: number, sy: number, txy: number) => ({ sx, sy, txy, sz: 0, tyz: 0, tzx: 0 });

function factor(theory: TheoryId, state: ReturnType<typeof plane>, strength: Record<string, number>): number {
  const r = checkCriterion(theory, state, strength);
  if (!r.ok) throw new Error(`${r.problem.key} ${r.problem.message}`);
  return r.check.factor;
}

describe('brittle theories against published examples', () => {
  for (const id of ['F-07', 'F-09']) {
    const c = refCase(id);
    it(caseTitle(c), () => {
      const state = plane(si(c.inputs.sx), si(c.inputs.sy), si(c.inputs.txy));
      const strength = { Sut: si(c.inputs.Sut), Suc: si(c.inputs.Suc) };
      const r = checkCriterion('max-normal', state, strength);
      if (!r.ok) throw new Error('check failed');
      expectNear(r.check.principal[0], c.expected.sA, 'sA');
      expectNear(r.check.principal[2], c.expected.sB, 'sB');
      expectNear(r.check.factor, c.expected.n_MNS, 'n_MNS');
      expectNear(factor('coulomb-mohr', state, strength), c.expected.n_BCM, 'n_BCM');
      expectNear(factor('modified-mohr', state, strength), c.expected.n_MM, 'n_MM');
    });
  }

  const w = refCase('F-11');
  it(caseTitle(w), () => {
    // Stresses per unit force F: the factor at F = 1 lbf is the force at failure, in lbf.
    const F = si({ value: 1, unit: 'lbf' });
    const d = si(w.inputs.d);
    const sx = (32 * F * si(w.inputs.M_per_F)) / (Math.PI * d ** 3);
    const tau = (16 * F * si(w.inputs.T_per_F)) / (Math.PI * d ** 3);
    expectNear(sx / F, w.expected.sx_per_F, 'sx per F');
    expectNear(tau / F, w.expected.tau_per_F, 'tau per F');
    const state = plane(sx, 0, tau);
    const principal = checkCriterion('max-normal', state, { Sut: 1, Suc: 1 });
    if (!principal.ok) throw new Error('check failed');
    expectNear(principal.check.principal[0] / F, w.expected.sA_per_F, 'sA per F');
    expectNear(principal.check.principal[2] / F, w.expected.sB_per_F, 'sB per F');
    const lbf = (n: number) => n * F;
    expectNear(lbf(factor('von-mises', state, { Sy: si(w.inputs.Sy) })), w.expected.F_DE, 'F_DE');
    expectNear(lbf(factor('tresca', state, { Sy: si(w.inputs.Sy) })), w.expected.F_MSS, 'F_MSS');
    const iron = { Sut: si(w.inputs.Sut), Suc: si(w.inputs.Suc) };
    expectNear(lbf(factor('coulomb-mohr', state, iron)), w.expected.F_BCM, 'F_BCM');
    expectNear(lbf(factor('modified-mohr', state, iron)), w.expected.F_MM, 'F_MM');
  });
});

describe('brittle theories by quadrant (Shigley 9th ed. Eqs. 5-28, 5-31, 5-32 case by case; from memory)', () => {
  const strength = { Sut: 30e6, Suc: 90e6 };
  it('both tensile: all three give Sut / sA', () => {
    const s = plane(20e6, 10e6, 0);
    for (const t of ['max-normal', 'coulomb-mohr', 'modified-mohr'] as const) expect(factor(t, s, strength)).toBeCloseTo(1.5, 12);
  });
  it('both compressive: all three give -Suc / sB', () => {
    const s = plane(-20e6, -60e6, 0);
    for (const t of ['max-normal', 'coulomb-mohr', 'modified-mohr'] as const) expect(factor(t, s, strength)).toBeCloseTo(1.5, 12);
  });
  it('mixed with |sB| > sA: modified Mohr uses its sloped line', () => {
    const s = plane(10e6, -40e6, 0);
    const expected = 1 / ((60e6 * 10e6) / (90e6 * 30e6) + 40e6 / 90e6);
    expect(factor('modified-mohr', s, strength)).toBeCloseTo(expected, 12);
    expect(factor('coulomb-mohr', s, strength)).toBeCloseTo(1 / (10 / 30 + 40 / 90), 12);
    expect(factor('max-normal', s, strength)).toBeCloseTo(2.25, 12);
  });
  it('no stress: no finite factor', () => {
    for (const t of ['max-normal', 'coulomb-mohr', 'modified-mohr'] as const) expect(factor(t, plane(0, 0, 0), strength)).toBe(Infinity);
  });
  it('strength problems are named: missing Suc, negative Sut, Suc below Sut for modified Mohr', () => {
    const s = plane(1e6, 0, 0);
    const a = checkCriterion('coulomb-mohr', s, { Sut: 30e6 });
    expect(!a.ok && a.problem).toEqual({ key: 'Suc', message: 'is missing' });
    const b = checkCriterion('max-normal', s, { Sut: -30e6, Suc: 90e6 });
    expect(!b.ok && b.problem.key).toBe('Sut');
    const c = checkCriterion('modified-mohr', s, { Sut: 90e6, Suc: 30e6 });
    expect(!c.ok && c.problem.message).toMatch(/at least Sut/);
    const d = checkCriterion('max-normal', s, { Sut: 30e6, Suc: -90e6 });
    expect(!d.ok && d.problem.message).toMatch(/positive magnitude/);
  });
});
