import { mohrHexagon, positiveStrength, ratioOrInfinity } from './outlines';
import type { FailureTheory } from './types';

/**
 * Brittle Coulomb-Mohr theory (Shigley's Mechanical Engineering Design, 9th ed., Sec. 5-9,
 * Eq. 5-31): fracture when s1/Sut - s3/Suc = 1/n. Written with all three principal stresses
 * (the out-of-plane 0 of a plane state included) this single line covers Shigley's three
 * plane-stress cases: both tensile n = Sut/sA, mixed 1/n = sA/Sut - sB/Suc, both compressive
 * n = -Suc/sB. Equivalent stress (referred to tension): σ_CM = s1 - (Sut/Suc) s3, n = Sut / σ_CM.
 * Envelope: the hexagon through (Sut, 0), (Sut, Sut), (0, Sut), (-Suc, 0), (-Suc, -Suc), (0, -Suc).
 *
 * @example coulombMohrTheory.assess([16e6, 0, -4e6], { Sut: 30e6, Suc: 100e6 }).factor // ≈ 1.744
 * @public
 */
export const coulombMohrTheory: FailureTheory = {
  id: 'coulomb-mohr',
  label: 'Coulomb-Mohr (brittle)',
  needs: ['Sut', 'Suc'],
  validate: (strength) => positiveStrength('Sut', strength.Sut) ?? positiveStrength('Suc', strength.Suc),
  assess([s1, s2, s3], strength) {
    const equivalent = s1 - (strength.Sut! / strength.Suc!) * s3;
    return { equivalent, factor: coulombMohrTheory.factorKernel(strength)(s1, s2, s3), extra: {} };
  },
  factorKernel(strength) {
    const sut = strength.Sut!;
    const k = sut / strength.Suc!;
    return (s1, _s2, s3) => ratioOrInfinity(sut, s1 - k * s3);
  },
  envelope: (strength) => ({
    theory: 'coulomb-mohr',
    principalPlane: [mohrHexagon(strength.Sut!, strength.Suc!)],
  }),
};
