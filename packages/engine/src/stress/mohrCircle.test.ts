import { describe, expect, it } from 'vitest';
import { caseTitle, expectNear, refCase, si } from '../../test/fixtures/cases';
import { mohrCircles3D, planeMohrCircle } from './mohrCircle';

describe('planeMohrCircle', () => {
  const c = refCase('P-01');
  it(`${caseTitle(c)}: centre, radius, face, principal and max-shear points`, () => {
    const state = { sx: si(c.inputs.sx), sy: si(c.inputs.sy), txy: si(c.inputs.txy) };
    const m = planeMohrCircle(state, Math.PI / 6);
    expectNear(m.center, c.expected.s_avg, 'centre');
    expectNear(m.radius, c.expected.tau_max_inplane, 'radius');
    expectNear(m.principal.p1.sigma, c.expected.s1, 'p1');
    expectNear(m.principal.p2.sigma, c.expected.s2, 'p2');
    expect(m.xFace).toEqual({ sigma: 50e6, tau: 40e6 });
    expect(m.yFace).toEqual({ sigma: -10e6, tau: -40e6 });
    expect(m.maxShear.positive).toEqual({ sigma: m.center, tau: m.radius });
    // Every face point lies on the circle (common practice, no source).
    for (const p of [m.xFace, m.yFace, m.rotated!.xFace, m.rotated!.yFace]) {
      expect(Math.hypot(p.sigma - m.center, p.tau)).toBeCloseTo(m.radius, 4);
    }
    // The rotated pair is a diameter: x' and y' are opposite ends.
    expect(m.rotated!.xFace.sigma + m.rotated!.yFace.sigma).toBeCloseTo(2 * m.center, 4);
    expect(m.rotated!.xFace.tau + m.rotated!.yFace.tau).toBeCloseTo(0, 4);
  });

  const c4 = refCase('C-04');
  it(`${caseTitle(c4)}: an element turned by θ moves its point by 2θ on the circle`, () => {
    const state = { sx: si(c4.inputs.sx), sy: si(c4.inputs.sy), txy: si(c4.inputs.txy) };
    const theta = si(c4.inputs.theta);
    const m = planeMohrCircle(state, theta);
    const angleOf = (p: { sigma: number; tau: number }) => Math.atan2(p.tau, p.sigma - m.center);
    // With tau drawn upward the point turns clockwise by 2θ.
    let turned = angleOf(m.xFace) - angleOf(m.rotated!.xFace);
    if (turned < 0) turned += 2 * Math.PI;
    expectNear(turned, c4.expected.mohr_angle_at_theta, 'angle on the circle');
  });

  it('a state without shear or difference is a point circle (common practice, no source)', () => {
    const m = planeMohrCircle({ sx: 7, sy: 7, txy: 0 });
    expect(m.radius).toBe(0);
    expect(m.rotated).toBeUndefined();
  });
});

describe('mohrCircles3D', () => {
  const c = refCase('C-09');
  it(`${caseTitle(c)}: the outer circle of a plane state runs through the origin`, () => {
    const m = mohrCircles3D({ sx: si(c.inputs.sx), sy: si(c.inputs.sy), sz: 0, txy: si(c.inputs.txy), tyz: 0, tzx: 0 });
    expect(m.principal).toEqual([80e6, 30e6, 0]);
    expectNear(m.circles[0].radius, c.expected.tau_max_inplane, 'circle 1-2 radius');
    expectNear(m.circles[2].radius, c.expected.tau_abs_max, 'outer circle radius');
    expect(m.circles[2].center - m.circles[2].radius).toBe(0);
    expect(m.circles.map((k) => k.between)).toEqual([[1, 2], [2, 3], [1, 3]]);
  });

  const d = refCase('D-03');
  it(`${caseTitle(d)}: the three circles of a 3D state`, () => {
    const m = mohrCircles3D({ sx: 3e6, sy: 0, sz: 0, txy: 1e6, tyz: 2e6, tzx: 1e6 });
    expectNear(m.circles[2].radius, d.expected.tau_abs_max, 'outer radius');
    expect(m.circles[0].radius + m.circles[1].radius).toBeCloseTo(m.circles[2].radius, 3);
  });
});
