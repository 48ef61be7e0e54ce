/**
 * The verdict on a factor of safety, as the figures show it.
 *
 * - `fail`: n < 1, the stress reaches the envelope;
 * - `low-margin`: 1 ≤ n < required;
 * - `pass`: n ≥ required (and n ≥ 1), or no finite factor at all (`null`: the load can grow
 *   without bound along its line).
 *
 * Fail is judged first, so a required factor below 1 never turns a failing stress into a pass.
 */
export type SafetyStatus = 'pass' | 'low-margin' | 'fail';

/**
 * @param factor factor of safety n, or `null` when it is unbounded
 * @param required the factor the check asks for; 1 when none is given
 * @example
 * safetyStatus(2.35, 1.5); // 'pass'
 * safetyStatus(1.2, 1.5);  // 'low-margin'
 * safetyStatus(0.8, 1.5);  // 'fail'
 */
export function safetyStatus(factor: number | null, required = 1): SafetyStatus {
  if (factor === null || factor === Number.POSITIVE_INFINITY) return 'pass';
  if (Number.isNaN(factor) || factor < 1) return 'fail';
  if (factor < required) return 'low-margin';
  return 'pass';
}

/** The word a badge shows for each verdict. */
export const safetyStatusWord: Record<SafetyStatus, string> = {
  pass: 'Pass',
  'low-margin': 'Low margin',
  fail: 'Fail',
};
