import { describe, expect, it } from 'vitest';
import { caseTitle, expectNear, refCase, si } from '../../test/fixtures/cases';
import { rotatePlaneStress } from './rotatePlaneStress';

const state = (id: string) => {
  const c = refCase(id);
  return { sx: si(c.inputs.sx), sy: si(c.inputs.sy), txy: si(c.inputs.txy) };
};

describe('rotatePlaneStress against published worked examples', () => {
  for (const id of ['T-01', 'T-02', 'T-04', 'T-05', 'T-07']) {
    const c = refCase(id);
    it(caseTitle(c), () => {
      const r = rotatePlaneStress(state(id), si(c.inputs.theta));
      expectNear(r.sx, c.expected.sx1, 'sx1');
      expectNear(r.sy, c.expected.sy1, 'sy1');
      expectNear(r.txy, c.expected.txy1, 'txy1');
    });
  }
});

describe('rotatePlaneStress identities', () => {
  const c = refCase('C-04');
  it(`${caseTitle(c)}: period 180°, +90° swaps sx', sy' and flips txy'`, () => {
    const s = state('C-04');
    const theta = si(c.inputs.theta);
    const a = rotatePlaneStress(s, theta);
    const b = rotatePlaneStress(s, theta + Math.PI);
    const q = rotatePlaneStress(s, theta + Math.PI / 2);
    const tol = 1e-9 * 1e6;
    expect(Math.abs(a.sx - b.sx) + Math.abs(a.sy - b.sy) + Math.abs(a.txy - b.txy)).toBeLessThan(tol);
    expect(Math.abs(q.sx - a.sy) + Math.abs(q.sy - a.sx) + Math.abs(q.txy + a.txy)).toBeLessThan(tol);
  });

  const inv = refCase('C-05');
  it(`${caseTitle(inv)}: sx' + sy' and sx' sy' - tx'y'² at every angle`, () => {
    const s = state('C-05');
    for (let deg = -180; deg <= 180; deg += 7.5) {
      const r = rotatePlaneStress(s, (deg * Math.PI) / 180);
      expectNear(r.sx + r.sy, inv.expected.I1_2d, `I1 at ${deg}°`);
      expectNear(r.sx * r.sy - r.txy * r.txy, inv.expected.I2_2d, `I2 at ${deg}°`);
    }
  });

  it('zero angle returns the state (common practice, no source)', () => {
    expect(rotatePlaneStress({ sx: 5, sy: -3, txy: 2 }, 0)).toEqual({ sx: 5, sy: -3, txy: 2 });
  });
});
