import { positiveStrength, ratioOrInfinity } from './outlines';
import type { FailureTheory, PrincipalPoint } from './types';

/**
 * Modified Mohr theory for brittle materials (Shigley's Mechanical Engineering Design, 9th ed.,
 * Sec. 5-9, Eq. 5-32), applied to s1 and s3 of the three principal stresses:
 *
 * - s3 >= 0 (no compression):                     n = Sut / s1
 * - s1 > 0 > s3 and |s3| <= s1:                   n = Sut / s1
 * - s1 > 0 > s3 and |s3| > s1:  1/n = (Suc - Sut) s1 / (Suc Sut) - s3 / Suc
 * - s1 <= 0 (no tension):                         n = Suc / (-s3)
 *
 * It has no single equivalent stress. It needs Suc >= Sut (the envelope would not be convex
 * otherwise). Envelope: (Sut, Sut), (Sut, -Sut), (0, -Suc), (-Suc, -Suc), (-Suc, 0),
 * (-Sut, Sut), closed.
 *
 * @example modifiedMohrTheory.assess([24.14e6, 0, -4.14e6], { Sut: 30e6, Suc: 90e6 }).factor // ≈ 1.2426
 * @public
 */
export const modifiedMohrTheory: FailureTheory = {
  id: 'modified-mohr',
  label: 'modified Mohr (brittle)',
  needs: ['Sut', 'Suc'],
  validate(strength) {
    const missing = positiveStrength('Sut', strength.Sut) ?? positiveStrength('Suc', strength.Suc);
    if (missing) return missing;
    if (strength.Suc! < strength.Sut!) {
      return { key: 'Suc', message: 'must be at least Sut for the modified Mohr theory' };
    }
    return null;
  },
  assess([s1, s2, s3], strength) {
    return { equivalent: null, factor: modifiedMohrTheory.factorKernel(strength)(s1, s2, s3), extra: {} };
  },
  factorKernel(strength) {
    const sut = strength.Sut!;
    const suc = strength.Suc!;
    const slope = (suc - sut) / (suc * sut);
    return (s1, _s2, s3) => {
      if (s1 <= 0) return ratioOrInfinity(suc, -s3);
      if (s3 >= 0 || -s3 <= s1) return sut / s1;
      return 1 / (slope * s1 - s3 / suc);
    };
  },
  envelope(strength) {
    const st = strength.Sut!;
    const sc = strength.Suc!;
    const corners: [number, number][] = [
      [st, st],
      [st, -st],
      [0, -sc],
      [-sc, -sc],
      [-sc, 0],
      [-st, st],
      [st, st],
    ];
    const outline: PrincipalPoint[] = corners.map(([sA, sB]) => ({ sA, sB }));
    return { theory: 'modified-mohr', principalPlane: [outline] };
  },
};
