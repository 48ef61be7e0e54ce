import { describe, expect, it } from 'vitest';
import { caseTitle, expectNear, refCase, si } from '../../test/fixtures/cases';
import { checkCriterion } from './checkCriterion';
import { mohrCoulombTheory, strengthReductionFactor } from './mohrCoulomb';

/** Principal state in the engine's convention from compression-positive soil stresses. */
const soil = (major: number, minor: number) => ({ sx: -minor, sy: -major, txy: 0, sz: -minor, tyz: 0, tzx: 0 });

/**
 * Independent route to the strength-reduction factor: bisection on F with Das's failure relation
 * σ1f = σ3 tan²(45° + φF/2) + 2 cF tan(45° + φF/2), cF = c/F, tanφF = tanφ/F (compression positive).
 */
function reductionByBisection(major: number, minor: number, c: number, phi: number): number {
  const failureMajor = (F: number) => {
    const phiF = Math.atan(Math.tan(phi) / F);
    const k = Math.tan(Math.PI / 4 + phiF / 2);
    return minor * k * k + 2 * (c / F) * k;
  };
  let lo = 1e-6;
  let hi = 1e6;
  for (let i = 0; i < 200; i++) {
    const mid = Math.sqrt(lo * hi);
    if (failureMajor(mid) > major) lo = mid;
    else hi = mid;
  }
  return Math.sqrt(lo * hi);
}

describe('Mohr-Coulomb with cohesion and friction', () => {
  const c11 = refCase('C-11');
  it(caseTitle(c11), () => {
    const c = si(c11.inputs.c);
    const phi = si(c11.inputs.phi);
    const minor = si(c11.inputs.s3);
    const working = si(c11.inputs.s1_working);
    const r = checkCriterion('mohr-coulomb', soil(working, minor), { c, phi });
    if (!r.ok) throw new Error(r.problem.message);
    expectNear(r.check.extra.radiusRatio!, c11.expected.FS_radius, 'FS by circle radius');
    expect(r.check.factor).toBeCloseTo(reductionByBisection(working, minor, c, phi), 9);
    // At the published failure state both factors are 1 and the critical plane is as printed.
    const atFailure = checkCriterion('mohr-coulomb', soil(si(c11.expected.s1_failure), minor), { c, phi });
    if (!atFailure.ok) throw new Error('check failed');
    expect(atFailure.check.factor).toBeCloseTo(1, 5);
    expect(atFailure.check.extra.radiusRatio).toBeCloseTo(1, 5);
    expect(atFailure.check.extra.loadFactor).toBeGreaterThan(0);
    expectNear(atFailure.check.extra.planeAngle!, c11.expected.theta_failure_plane, 'failure plane angle');
    expectNear(-atFailure.check.extra.planeNormal!, c11.expected.sn_failure_plane, 'normal stress on the plane');
    expectNear(atFailure.check.extra.planeShear!, c11.expected.tau_failure_plane, 'shear on the plane');
  });

  const f12 = refCase('F-12');
  it(caseTitle(f12), () => {
    const minor = si(f12.inputs.s3);
    const major = minor + si(f12.inputs.deviator_at_failure);
    const phi = si(f12.expected.phi);
    const r = checkCriterion('mohr-coulomb', soil(major, minor), { c: 0, phi });
    if (!r.ok) throw new Error(r.problem.message);
    expect(r.check.factor).toBeCloseTo(1, 6);
    expectNear(r.check.extra.planeAngle!, f12.expected.theta_failure_plane, 'failure plane angle');
    expectNear(-r.check.extra.planeNormal!, f12.expected.sn_failure_plane, 'sigma on failure plane');
    expectNear(r.check.extra.planeShear!, f12.expected.tau_failure_plane, 'tau on failure plane');
  });

  it('strength reduction agrees with the bisection on Das\'s failure relation over many states (common practice, no source)', () => {
    for (const [major, minor, c, phiDeg] of [
      [300e3, 100e3, 10e3, 25],
      [180e3, 150e3, 0, 32],
      [900e3, 50e3, 40e3, 20],
      [120e3, 20e3, 15e3, 0],
    ] as const) {
      const phi = (phiDeg * Math.PI) / 180;
      const r = checkCriterion('mohr-coulomb', soil(major, minor), { c, phi });
      if (!r.ok) throw new Error(r.problem.message);
      expect(r.check.factor).toBeCloseTo(reductionByBisection(major, minor, c, phi), 8);
    }
  });

  it('pure cohesion is Tresca with Sy = 2c; tension past the apex fails for every factor (common practice, no source)', () => {
    expect(strengthReductionFactor(100e3, 50e3, 75e3, 0)).toBeCloseTo(1.5, 12);
    expect(strengthReductionFactor(-10e3, 5e3, 0, 0.5)).toBe(0);
    expect(strengthReductionFactor(100e3, 0, 0, 0.5)).toBe(Infinity);
    const uniaxialTension = checkCriterion('mohr-coulomb', { sx: 10e3, sy: 0, txy: 0, sz: 0, tyz: 0, tzx: 0 }, { c: 0, phi: 0.5 });
    expect(uniaxialTension.ok && uniaxialTension.check.pass).toBe(false);
  });

  it('names bad strengths', () => {
    expect(mohrCoulombTheory.validate({ c: 10e3 })).toEqual({ key: 'phi', message: 'is missing' });
    expect(mohrCoulombTheory.validate({ c: -1, phi: 0.5 })?.key).toBe('c');
    expect(mohrCoulombTheory.validate({ c: 1, phi: 2 })?.key).toBe('phi');
    expect(mohrCoulombTheory.validate({ c: 0, phi: 0 })?.message).toMatch(/both be zero/);
  });
});
