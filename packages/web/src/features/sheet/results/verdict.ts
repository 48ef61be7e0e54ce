import type { CellOk } from '@sheaf/engine';
import type { Verdict } from '../../../components/VerdictShape';

/**
 * The verdict of a criterion or point-set result, judged on its factor n against the required
 * factor: fail when n < 1 (the stress reaches the envelope), low margin when 1 ≤ n < n_req,
 * pass when n ≥ n_req or when n is unbounded. Null for other kinds.
 */
export function verdictOf(result: CellOk): Verdict | null {
  if (result.kind !== 'criterion' && result.kind !== 'pointset') return null;
  const factor = result.kind === 'criterion' ? result.values.factor : result.values.minFactor;
  const required = typeof result.values.required === 'number' ? result.values.required : 1;
  if (factor === null || factor === undefined) return result.values.unbounded === true ? 'pass' : null;
  if (typeof factor !== 'number') return null;
  if (factor < 1) return 'fail';
  if (factor < required) return 'low';
  return 'pass';
}
