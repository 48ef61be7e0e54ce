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
    const equivalent = trescaStress(s1, s2, s3);
    return { equivalent, factor: ratioOrInfinity(strength.Sy!, equivalent), extra: {} };
  },
  envelope: (strength) => ({ theory: 'tresca', principalPlane: [mohrHexagon(strength.Sy!, strength.Sy!)] }),
};
