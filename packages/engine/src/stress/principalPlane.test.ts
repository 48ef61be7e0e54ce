import { describe, expect, it } from 'vitest';
import { caseTitle, expectAngleNear, expectNear, refCase, si } from '../../test/fixtures/cases';
import { foldHalfTurn, principalPlaneStresses } from './principalPlane';
import { rotatePlaneStress } from './rotatePlaneStress';
import { absoluteMaxShear } from './tresca';

const state = (id: string) => {
  const c = refCase(id);
  return { sx: si(c.inputs.sx), sy: si(c.inputs.sy), txy: si(c.inputs.txy) };
};

describe('principalPlaneStresses against published worked examples', () => {
  for (const id of ['P-01', 'P-03', 'P-05', 'P-06', 'P-08', 'T-07', 'C-01', 'C-02', 'C-09']) {
    const c = refCase(id);
    it(caseTitle(c), () => {
      const p = principalPlaneStresses(state(id));
      const e = c.expected;
      if (e.s1) expectNear(p.p1, e.s1, 's1');
      if (e.s2) expectNear(p.p2, e.s2, 's2');
      if (e.theta_p1) expectAngleNear(p.thetaP, e.theta_p1, 'theta_p1');
      if (e.tau_max_inplane) expectNear(p.tauMaxInPlane, e.tau_max_inplane, 'tau_max_inplane');
      if (e.s_avg) expectNear(p.center, e.s_avg, 's_avg');
      if (e.theta_s1) expectAngleNear(p.thetaS, e.theta_s1, 'theta_s1');
      if (e.tau_abs_max) expectNear(absoluteMaxShear(p.p1, p.p2, 0), e.tau_abs_max, 'tau_abs_max');
      expect(Object.keys(e).length).toBeGreaterThan(0);
    });
  }
});

describe('principal stresses of a lever under bending and torsion', () => {
  const c = refCase('V-04');
  it(caseTitle(c), () => {
    // Stresses at H from the lever's loads: sigma = M c / I = 32 M / (π d³), tau = T c / J = 16 T / (π d³).
    const P = si(c.inputs.P);
    const d = si(c.inputs.d);
    const sy = (32 * P * si(c.inputs.moment_arm)) / (Math.PI * d ** 3);
    const txy = (16 * P * si(c.inputs.torque_arm)) / (Math.PI * d ** 3);
    expectNear(sy, c.expected.sy, 'sy');
    expectNear(txy, c.expected.txy, 'txy');
    const p = principalPlaneStresses({ sx: 0, sy, txy });
    expectNear(p.p1, c.expected.s1, 's1');
    expectNear(p.p2, c.expected.s2, 's2');
    expectAngleNear(p.thetaP, c.expected.theta_p1, 'theta_p1');
    expectNear(p.tauMaxInPlane, c.expected.tau_max_inplane, 'tau_max_inplane');
  });
});

describe('principal stresses of a shaft in tension and torsion', () => {
  const c = refCase('V-06');
  it(caseTitle(c), () => {
    // sigma = P / A, tau = 16 T / (π d³); the sign of tau does not change p1, p2.
    const d = si(c.inputs.d);
    const sx = si(c.inputs.P) / ((Math.PI * d * d) / 4);
    const tau = (16 * si(c.inputs.T)) / (Math.PI * d ** 3);
    expectNear(sx, c.expected.sx, 'sx');
    expectNear(tau, c.expected.tau, 'tau');
    for (const txy of [tau, -tau]) {
      const p = principalPlaneStresses({ sx, sy: 0, txy });
      expectNear(p.p1, c.expected.s1, 's1');
      expectNear(p.p2, c.expected.s2, 's2');
      expectNear(p.tauMaxInPlane, c.expected.tau_max_inplane, 'tau max in-plane');
    }
  });
});

describe('principal planes', () => {
  const c = refCase('C-06');
  it(`${caseTitle(c)}: the rotation by thetaP carries p1 and no shear`, () => {
    const s = state('C-06');
    const p = principalPlaneStresses(s);
    const r = rotatePlaneStress(s, p.thetaP);
    expectNear(r.sx, c.expected.sx_at_theta_p1, 'sx at theta_p1');
    expect(Math.abs(r.txy)).toBeLessThan(1e-9 * Math.abs(p.p1));
    const r2 = rotatePlaneStress(s, p.thetaP + Math.PI / 2);
    expect(Math.abs(r2.txy)).toBeLessThan(1e-9 * Math.abs(p.p1));
    expect(r2.sx).toBeCloseTo(p.p2, 6);
  });

  it('the face at thetaS carries +tauMaxInPlane (common practice, no source)', () => {
    const s = { sx: -50e6, sy: 10e6, txy: -40e6 };
    const p = principalPlaneStresses(s);
    const r = rotatePlaneStress(s, p.thetaS);
    expect(r.txy).toBeCloseTo(p.tauMaxInPlane, 3);
    expect(r.sx).toBeCloseTo(p.center, 3);
  });

  it('thetaP stays in (-90°, 90°], including sx < sy with zero and negative-zero shear (common practice, no source)', () => {
    expect(principalPlaneStresses({ sx: 1, sy: 5, txy: 0 }).thetaP).toBe(Math.PI / 2);
    expect(principalPlaneStresses({ sx: 1, sy: 5, txy: -0 }).thetaP).toBe(Math.PI / 2);
    expect(principalPlaneStresses({ sx: 0, sy: 0, txy: 0 }).thetaP).toBe(0);
    expect(foldHalfTurn(-Math.PI / 2)).toBe(Math.PI / 2);
    expect(foldHalfTurn((3 * Math.PI) / 4)).toBeCloseTo(-Math.PI / 4, 12);
  });
});
