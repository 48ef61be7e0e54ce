import { THEORIES } from '../criteria/theories';
import type { Strength, TheoryId } from '../criteria/types';
import { allocatePrincipal, rowCount, type PrincipalColumns, type StressColumns } from './columns';
import { principal3DBatch, principal3DLoop } from './principal3DBatch';

/**
 * Factors of safety of many stress states against one theory (plain-number kernel). Plane
 * columns use the in-plane closed form with the out-of-plane 0 sorted in; 3D columns use
 * {@link principal3DBatch}. The theory's own factor kernel is applied per row, so a point set and
 * a single criterion cell give the same numbers. Strengths in Pa and radians, already validated
 * (see `FailureTheory.validate`). Pass `principal` to keep the principal stresses too.
 *
 * @example criterionFactorBatch('von-mises', { sx, sy, txy }, { Sy: 250e6 }, factors)
 * @public
 */
export function criterionFactorBatch(
  theory: TheoryId,
  columns: StressColumns,
  strength: Strength,
  factors: Float64Array,
  principal?: PrincipalColumns,
): void {
  const n = rowCount(columns);
  const kernel = THEORIES[theory].factorKernel(strength);
  if (columns.sz === undefined) {
    const { sx, sy, txy } = columns;
    for (let i = 0; i < n; i++) {
      const a = sx[i]!;
      const b = sy[i]!;
      const t = txy[i]!;
      const c = 0.5 * (a + b);
      const h = 0.5 * (a - b);
      const r = Math.sqrt(h * h + t * t);
      const p1 = c + r;
      const p2 = c - r;
      // Sort the out-of-plane 0 into (p1, p2).
      const s1 = p1 > 0 ? p1 : 0;
      const s3 = p2 < 0 ? p2 : 0;
      const s2 = p1 > 0 ? (p2 > 0 ? p2 : 0) : p1;
      factors[i] = kernel(s1, s2, s3);
      if (principal) {
        principal.s1[i] = s1;
        principal.s2[i] = s2;
        principal.s3[i] = s3;
      }
    }
    return;
  }
  const out = principal ?? allocatePrincipal(n);
  principal3DBatch(columns, out);
  const { s1, s2, s3 } = out;
  for (let i = 0; i < n; i++) factors[i] = kernel(s1[i]!, s2[i]!, s3[i]!);
}

/**
 * Fused kernel for the commonest batch: the three principal stresses and the von Mises factor
 * Sy / σ' of 3D states in one pass over the columns.
 * Units: Pa. Infinity where σ' = 0.
 * @public
 */
export function principalAndVonMisesBatch(columns: StressColumns, Sy: number, principal: PrincipalColumns, factors: Float64Array): void {
  if (!(Sy > 0)) throw new Error('Sy must be positive');
  rowCount(columns);
  principal3DLoop(columns, principal, factors, Sy);
}

/**
 * Fused kernel for plane states: in-plane principal stresses p1 >= p2 and the von Mises factor
 * Sy / sqrt(p1² - p1 p2 + p2²) in one pass. Units: Pa. Infinity where the state is zero.
 * @public
 */
export function principalAndVonMisesPlaneBatch(
  columns: Pick<StressColumns, 'sx' | 'sy' | 'txy'>,
  Sy: number,
  p1: Float64Array,
  p2: Float64Array,
  factors: Float64Array,
): void {
  const { sx, sy, txy } = columns;
  const n = sx.length;
  for (let i = 0; i < n; i++) {
    const a = sx[i]!;
    const b = sy[i]!;
    const t = txy[i]!;
    const c = 0.5 * (a + b);
    const h = 0.5 * (a - b);
    const r = Math.sqrt(h * h + t * t);
    const hi = c + r;
    const lo = c - r;
    p1[i] = hi;
    p2[i] = lo;
    // σ'² = p1² - p1 p2 + p2² = c² + 3r².
    const vm = Math.sqrt(c * c + 3 * r * r);
    factors[i] = vm > 0 ? Sy / vm : Infinity;
  }
}

/** Summary of a column of factors against a required factor. @public */
export interface FactorSummary {
  readonly count: number;
  /** Smallest factor (Infinity when every row is unbounded; NaN for no rows). */
  readonly minFactor: number;
  /** 0-based index of the row with the smallest factor (the first such row); -1 for no rows. */
  readonly worstRow: number;
  /** Rows with factor < required. */
  readonly failing: number;
}

/**
 * Count, minimum factor, worst row and failing rows of a factor column.
 * @example summarizeFactors(new Float64Array([2, 1.2, 3]), 1.5) // { count: 3, minFactor: 1.2, worstRow: 1, failing: 1 }
 * @public
 */
export function summarizeFactors(factors: Float64Array, required = 1): FactorSummary {
  const n = factors.length;
  let minFactor = n === 0 ? NaN : Infinity;
  let worstRow = n === 0 ? -1 : 0;
  let failing = 0;
  for (let i = 0; i < n; i++) {
    const f = factors[i]!;
    if (f < minFactor) {
      minFactor = f;
      worstRow = i;
    }
    if (f < required) failing++;
  }
  return { count: n, minFactor, worstRow, failing };
}
