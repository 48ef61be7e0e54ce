import { vonMisesFromPrincipal } from '../stress/vonMises';
import { positiveStrength, ratioOrInfinity, vonMisesEllipse } from './outlines';
import type { FailureTheory } from './types';

/**
 * Distortion-energy (von Mises) theory for ductile materials (Shigley's Mechanical Engineering
 * Design, 9th ed., Sec. 5-5, Eqs. 5-12 and 5-19, from memory): equivalent stress
 * σ' = sqrt(½[(s1 - s2)² + (s2 - s3)² + (s3 - s1)²]); factor n = Sy / σ'. A hydrostatic state
 * has σ' = 0 and no finite factor. Envelope: the ellipse sA² - sA sB + sB² = Sy².
 *
 * @example vonMisesTheory.assess([85e6, 0, -45e6], { Sy: 250e6 }).factor // ≈ 2.186
 * @public
 */
export const vonMisesTheory: FailureTheory = {
  id: 'von-mises',
  label: 'von Mises (distortion energy)',
  needs: ['Sy'],
  validate: (strength) => positiveStrength('Sy', strength.Sy),
  assess([s1, s2, s3], strength) {
    const equivalent = vonMisesFromPrincipal(s1, s2, s3);
    return { equivalent, factor: vonMisesTheory.factorKernel(strength)(s1, s2, s3), extra: {} };
  },
  factorKernel(strength) {
    const Sy = strength.Sy!;
    return (s1, s2, s3) => ratioOrInfinity(Sy, vonMisesFromPrincipal(s1, s2, s3));
  },
  envelope: (strength, options) => ({
    theory: 'von-mises',
    principalPlane: [vonMisesEllipse(strength.Sy!, options?.segments)],
  }),
};
