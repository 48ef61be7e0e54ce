import { principalStresses } from '../stress/principalStresses';
import type { PrincipalTriple, StressTensor } from '../stress/types';
import { THEORIES } from './theories';
import type { Strength, StrengthKey, TheoryId } from './types';

/** A stress state checked against a failure theory. @public */
export interface CriterionCheck {
  readonly theory: TheoryId;
  /** `[s1, s2, s3]`, Pa. */
  readonly principal: PrincipalTriple;
  /** Equivalent stress in Pa, or null where the theory has none. */
  readonly equivalent: number | null;
  /** Factor of safety (see the theory); `Infinity` where no finite factor exists. */
  readonly factor: number;
  /** Required factor of safety (1 when none is given). */
  readonly required: number;
  /** factor / required - 1; `Infinity` with an infinite factor. */
  readonly margin: number;
  /** factor >= required. */
  readonly pass: boolean;
  /** Theory-specific values (Mohr-Coulomb: radiusRatio, loadFactor, planeAngle, planeNormal, planeShear). */
  readonly extra: Readonly<Record<string, number>>;
}

/** Why a check could not be made: the strength value at fault and what is wrong with it. @public */
export interface CriterionProblem {
  readonly key: StrengthKey | 'required';
  readonly message: string;
}

/**
 * Check a stress tensor against a failure theory: principal stresses (a plane state's
 * out-of-plane 0 included), the theory's equivalent stress and factor of safety, the margin
 * against the required factor, pass or fail. Units: Pa and radians in the strengths.
 *
 * @example checkCriterion('von-mises', { sx: 80e6, sy: -40e6, sz: 0, txy: 25e6, tyz: 0, tzx: 0 }, { Sy: 250e6 }, 1.5)
 *   // { factor ≈ 2.186, margin ≈ 0.458, pass: true, ... }
 * @public
 */
export function checkCriterion(
  theoryId: TheoryId,
  state: StressTensor,
  strength: Strength,
  required = 1,
): { ok: true; check: CriterionCheck } | { ok: false; problem: CriterionProblem } {
  const theory = THEORIES[theoryId];
  const problem = theory.validate(strength);
  if (problem) return { ok: false, problem };
  if (!(Number.isFinite(required) && required > 0)) {
    return { ok: false, problem: { key: 'required', message: 'must be a positive number' } };
  }
  const principal = principalStresses(state).values;
  const { equivalent, factor, extra } = theory.assess(principal, strength);
  return {
    ok: true,
    check: {
      theory: theoryId,
      principal,
      equivalent,
      factor,
      required,
      margin: factor / required - 1,
      pass: factor >= required,
      extra,
    },
  };
}
