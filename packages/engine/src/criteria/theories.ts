import { coulombMohrTheory } from './coulombMohr';
import { maxNormalTheory } from './maxNormal';
import { modifiedMohrTheory } from './modifiedMohr';
import { mohrCoulombTheory } from './mohrCoulomb';
import { trescaTheory } from './tresca';
import type { FailureTheory, TheoryId } from './types';
import { vonMisesTheory } from './vonMises';

/**
 * Every failure theory by id; explicit, so a new theory is one entry here and a type error until
 * it is added.
 * @public
 */
export const THEORIES: { readonly [K in TheoryId]: FailureTheory & { readonly id: K } } = {
  'von-mises': vonMisesTheory as FailureTheory & { id: 'von-mises' },
  tresca: trescaTheory as FailureTheory & { id: 'tresca' },
  'max-normal': maxNormalTheory as FailureTheory & { id: 'max-normal' },
  'coulomb-mohr': coulombMohrTheory as FailureTheory & { id: 'coulomb-mohr' },
  'modified-mohr': modifiedMohrTheory as FailureTheory & { id: 'modified-mohr' },
  'mohr-coulomb': mohrCoulombTheory as FailureTheory & { id: 'mohr-coulomb' },
};

/** True when `id` names a failure theory. @public */
export function isTheoryId(id: string): id is TheoryId {
  return Object.prototype.hasOwnProperty.call(THEORIES, id);
}
