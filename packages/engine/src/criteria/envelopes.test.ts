/**
 * Envelope geometry against the factors: on the sA–sB plot the proportional load line of a plane
 * state must meet each theory's outline at factor × (p1, p2). The intersection is found here by a
 * plain ray-segment computation, independent of the theories' formulas (common practice, no source).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { principalPlaneStresses } from '../stress/principalPlane';
import { checkCriterion } from './checkCriterion';
import { planeLoadLine } from './loadLine';
import { THEORIES } from './theories';
import type { PrincipalPoint, TheoryId } from './types';

/** Smallest t > 0 with t·(x, y) on the polyline. */
function rayHit(points: readonly PrincipalPoint[], x: number, y: number): number {
  let best = Infinity;
  for (let i = 0; i + 1 < points.length; i++) {
    const a = points[i]!;
    const b = points[i + 1]!;
    const ex = b.sA - a.sA;
    const ey = b.sB - a.sB;
    const det = x * -ey - y * -ex;
    if (det === 0) continue;
    const t = (a.sA * -ey - a.sB * -ex) / det;
    const u = (x * a.sB - y * a.sA) / det;
    if (t > 0 && u >= -1e-12 && u <= 1 + 1e-12) best = Math.min(best, t);
  }
  return best;
}

const strengths: Record<TheoryId, Record<string, number>> = {
  'von-mises': { Sy: 250e6 },
  tresca: { Sy: 250e6 },
  'max-normal': { Sut: 180e6, Suc: 600e6 },
  'coulomb-mohr': { Sut: 180e6, Suc: 600e6 },
  'modified-mohr': { Sut: 180e6, Suc: 600e6 },
  'mohr-coulomb': { c: 30e6, phi: 0.6 },
};

const stress = fc.double({ min: -400e6, max: 400e6, noNaN: true, noDefaultInfinity: true });

describe('envelopes meet the load line at the factor', () => {
  for (const id of Object.keys(THEORIES) as TheoryId[]) {
    it(`${id}: outline closed, and the load line crosses it at the factor`, () => {
      const envelope = THEORIES[id].envelope(strengths[id]!, { segments: 4000 });
      const outline = envelope.principalPlane[0]!;
      expect(outline[0]).toEqual(outline[outline.length - 1]);
      fc.assert(
        fc.property(stress, stress, stress, (sx, sy, txy) => {
          const state = { sx, sy, txy, sz: 0, tyz: 0, tzx: 0 };
          const p = principalPlaneStresses(state);
          fc.pre(Math.hypot(p.p1, p.p2) > 1e3);
          const r = checkCriterion(id, state, strengths[id]!);
          if (!r.ok) throw new Error(r.problem.message);
          // Mohr-Coulomb's `factor` is strength reduction; the load line belongs to loadFactor.
          const along = id === 'mohr-coulomb' ? r.check.extra.loadFactor! : r.check.factor;
          const hit = rayHit(outline, p.p1, p.p2);
          if (!Number.isFinite(along)) expect(hit).toBe(Infinity);
          else expect(Math.abs(hit - along) / along).toBeLessThan(id === 'von-mises' ? 1e-6 : 1e-9);
          const line = planeLoadLine(state, r.check.factor);
          expect(line?.point).toEqual({ sA: p.p1, sB: p.p2 });
        }),
        { numRuns: 300 },
      );
    });
  }

  it('mohr-coulomb draws its Mohr-plane envelope with both branches through the apex', () => {
    const e = THEORIES['mohr-coulomb'].envelope({ c: 20e3, phi: Math.PI / 6 }, { extent: 500e3 });
    const [upper, lower] = e.mohrPlane!;
    expect(upper!.from.sigma).toBeCloseTo(20e3 / Math.tan(Math.PI / 6), 6);
    expect(upper!.from.tau).toBeCloseTo(0, 6);
    expect(upper!.to).toEqual({ sigma: -500e3, tau: 20e3 + 500e3 * Math.tan(Math.PI / 6) });
    expect(lower!.to.tau).toBe(-upper!.to.tau);
    expect(THEORIES['mohr-coulomb'].envelope({ c: 0, phi: 0.5 }).principalPlane).toEqual([]);
  });

  it('a 3D state has no point on the sA–sB plot', () => {
    expect(planeLoadLine({ sx: 1, sy: 2, sz: 3, txy: 0, tyz: 1, tzx: 0 }, 2)).toBeNull();
    expect(planeLoadLine({ sx: 1, sy: 2, sz: 0, txy: 0, tyz: 0, tzx: 0 }, Infinity)?.onEnvelope).toBeNull();
  });
});
