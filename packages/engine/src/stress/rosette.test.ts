import { describe, expect, it } from 'vitest';
import { caseTitle, expectAngleNear, expectNear, refCase } from '../../test/fixtures/cases';
import { normalStrainAt, principalPlaneStrains, rotatePlaneStrain } from './strainTransform';
import { reduceRosette, rosetteAngles } from './rosette';

const readingsOf = (id: string): [number, number, number] =>
  (refCase(id).inputs.readings!.value as number[]).map((v) => v * 1e-6) as [number, number, number];

describe('reduceRosette against published examples', () => {
  for (const id of ['S-01', 'S-03']) {
    const c = refCase(id);
    it(caseTitle(c), () => {
      for (const layout of [{ kind: 'delta' as const }, { kind: 'angles' as const, anglesRad: [0, Math.PI / 3, (2 * Math.PI) / 3] as const }]) {
        const r = reduceRosette(layout, readingsOf(id));
        if (!r.ok) throw new Error(r.message);
        expectNear(r.strain.ex, c.expected.ex, 'ex');
        expectNear(r.strain.ey, c.expected.ey, 'ey');
        expectNear(r.strain.gxy, c.expected.gxy, 'gxy');
        const p = principalPlaneStrains(r.strain);
        expectNear(p.e1, c.expected.e1, 'e1');
        expectNear(p.e2, c.expected.e2, 'e2');
        expectAngleNear(p.thetaE, c.expected.theta_p1, 'theta_p1');
        if (c.expected.gmax_inplane) expectNear(p.gammaMaxInPlane, c.expected.gmax_inplane, 'gamma max');
      }
    });
  }

  it('rectangular closed form equals the general solution (common practice, no source)', () => {
    const readings: [number, number, number] = [450e-6, -75e-6, 120e-6];
    const a = reduceRosette({ kind: 'rectangular' }, readings);
    const b = reduceRosette({ kind: 'angles', anglesRad: rosetteAngles({ kind: 'rectangular' }) }, readings);
    if (!a.ok || !b.ok) throw new Error('reduction failed');
    expect(b.strain.ex).toBeCloseTo(a.strain.ex, 15);
    expect(b.strain.ey).toBeCloseTo(a.strain.ey, 15);
    expect(b.strain.gxy).toBeCloseTo(a.strain.gxy, 15);
  });

  it('parallel gauges give an error value, not a number (common practice, no source)', () => {
    const r = reduceRosette({ kind: 'angles', anglesRad: [0, Math.PI / 2, Math.PI] }, [1e-4, 2e-4, 1e-4]);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/same line/);
  });
});

describe('strain transformation', () => {
  const c = refCase('S-06');
  it(caseTitle(c), () => {
    const strain = { ex: 340e-6, ey: 110e-6, gxy: 180e-6 };
    const r = rotatePlaneStrain(strain, Math.PI / 6);
    expectNear(r.ex, c.expected.ex1, 'ex1');
    expectNear(r.ey, c.expected.ey1, 'ey1');
    expectNear(r.gxy, c.expected.gx1y1, 'gx1y1');
    expectNear(normalStrainAt(strain, Math.PI / 6), c.expected.ex1, 'e(30°)');
    const p = principalPlaneStrains(strain);
    expectNear(p.e1, c.expected.e1, 'e1');
    expectNear(p.e2, c.expected.e2, 'e2');
    expectAngleNear(p.thetaE, c.expected.theta_p1, 'theta_p1');
    expectNear(p.gammaMaxInPlane, c.expected.gmax_inplane, 'gamma max');
  });
});
