import { trescaStress } from '../stress/tresca';
import { mohrHexagon, positiveStrength, ratioOrInfinity } from './outlines';
import type { FailureTheory } from './types';

/**
 * Maximum-shear-stress (Tresca) theory for ductile materials (Shigley's Mechanical Engineering
 * Design, 9th ed., Sec. 5-4, Eq. 5-3, from memory): yielding when s1 - s3 = Sy, so the
 * equivalent stress is s1 - s3 (the absolute maximum shear doubled; for a plane state the
 * out-of-plane 0 takes part) and n = Sy / (s1 - s3). Envelope: the hexagon through (±Sy, 0),
 * (0, ±Sy) and (Sy, Sy), (-Sy, -Sy).
 *
 * @example trescaTheory.assess([85e6, 0, -45e6], { Sy: 250e6 }).factor // ≈ 1.923
 * @public
 */
export const trescaTheory: FailureTheory = {
  id: 'tresca',
  label: 'Tresca (maximum shear stress)',
  needs: ['Sy'],
  validate: (strength) => positiveStrength('Sy', strength.Sy),
  assess([s1, s2, s3], strength) {
    return { equivalent: trescaStress(s1, s2, s3), factor: trescaTheory.factorKernel(strength)(s1, s2, s3), extra: {} };
  },
  factorKernel(strength) {
    const Sy = strength.Sy!;
    // Sorted input: s1 - s3 is the largest difference.
    return (s1, _s2, s3) => ratioOrInfinity(Sy, s1 - s3);
  },
  envelope: (strength) => ({ theory: 'tresca', principalPlane: [mohrHexagon(strength.Sy!, strength.Sy!)] }),
};
