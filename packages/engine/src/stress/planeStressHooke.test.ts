import { describe, expect, it } from 'vitest';
import { caseTitle, expectNear, refCase, si } from '../../test/fixtures/cases';
import { planeStressFromStrain, shearModulus, strainFromPlaneStress } from './planeStressHooke';
import { principalPlaneStresses } from './principalPlane';
import { principalPlaneStrains } from './strainTransform';

describe('plane-stress Hooke law', () => {
  const c = refCase('S-04');
  it(caseTitle(c), () => {
    const strain = { ex: si(c.inputs.ex), ey: si(c.inputs.ey), gxy: si(c.inputs.gxy) };
    const E = si(c.inputs.E);
    const nu = si(c.inputs.nu);
    const s = planeStressFromStrain(strain, E, nu);
    expectNear(s.sx, c.expected.sx, 'sx');
    expectNear(s.sy, c.expected.sy, 'sy');
    expectNear(s.txy, c.expected.txy, 'txy');
    expectNear(shearModulus(E, nu), c.expected.G, 'G');
    const e = principalPlaneStrains(strain);
    expectNear(e.e1, c.expected.e1, 'e1');
    expectNear(e.e2, c.expected.e2, 'e2');
    expectNear(e.thetaE, c.expected.theta_p1, 'theta_p1');
    const p = principalPlaneStresses(s);
    expectNear(p.p1, c.expected.s1, 's1');
    expectNear(p.p2, c.expected.s2, 's2');
  });

  const g = refCase('C-15');
  it(caseTitle(g), () => {
    expectNear(shearModulus(si(g.inputs.E), si(g.inputs.nu)), g.expected.G, 'G');
  });

  it('strainFromPlaneStress inverts planeStressFromStrain (common practice, no source)', () => {
    const strain = { ex: 400e-6, ey: -120e-6, gxy: 250e-6 };
    const back = strainFromPlaneStress(planeStressFromStrain(strain, 200e9, 0.3), 200e9, 0.3);
    expect(back.ex).toBeCloseTo(strain.ex, 15);
    expect(back.ey).toBeCloseTo(strain.ey, 15);
    expect(back.gxy).toBeCloseTo(strain.gxy, 15);
    expect(back.ez).toBeCloseTo((-0.3 / 0.7) * (strain.ex + strain.ey), 15);
  });
});
