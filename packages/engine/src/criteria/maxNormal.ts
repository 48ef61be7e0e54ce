import { positiveStrength, ratioOrInfinity } from './outlines';
import type { FailureTheory } from './types';

/**
 * Maximum-normal-stress theory for brittle materials (Shigley's Mechanical Engineering Design,
 * 9th ed., Sec. 5-8, Eq. 5-28, from memory): fracture when s1 = Sut or s3 = -Suc, so
 * n = min(Sut / s1 for s1 > 0, Suc / (-s3) for s3 < 0). It has no single equivalent stress.
 * Envelope: the square with corners (Sut, Sut), (-Suc, Sut), (-Suc, -Suc), (Sut, -Suc).
 *
 * @example maxNormalTheory.assess([16e6, 0, -4e6], { Sut: 30e6, Suc: 100e6 }).factor // 1.875
 * @public
 */
export const maxNormalTheory: FailureTheory = {
  id: 'max-normal',
  label: 'maximum normal stress',
  needs: ['Sut', 'Suc'],
  validate: (strength) => positiveStrength('Sut', strength.Sut) ?? positiveStrength('Suc', strength.Suc),
  assess([s1, s2, s3], strength) {
    return { equivalent: null, factor: maxNormalTheory.factorKernel(strength)(s1, s2, s3), extra: {} };
  },
  factorKernel(strength) {
    const sut = strength.Sut!;
    const suc = strength.Suc!;
    return (s1, _s2, s3) => Math.min(ratioOrInfinity(sut, s1), ratioOrInfinity(suc, -s3));
  },
  envelope(strength) {
    const st = strength.Sut!;
    const sc = strength.Suc!;
    const corners: [number, number][] = [
      [st, st],
      [-sc, st],
      [-sc, -sc],
      [st, -sc],
      [st, st],
    ];
    return { theory: 'max-normal', principalPlane: [corners.map(([sA, sB]) => ({ sA, sB }))] };
  },
};
