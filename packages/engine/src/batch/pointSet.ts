import { THEORIES } from '../criteria/theories';
import type { Strength, TheoryId } from '../criteria/types';
import type { StressColumns } from './columns';
import { criterionFactorBatch, summarizeFactors, type FactorSummary } from './factorBatch';

/** Which input column holds each stress component (0-based). @public */
export interface ColumnMapping {
  readonly sx: number;
  readonly sy: number;
  readonly txy: number;
  readonly sz?: number;
  readonly tyz?: number;
  readonly tzx?: number;
}

/** A point set evaluated against a theory. @public */
export interface PointSetOutcome extends FactorSummary {
  readonly required: number;
  /** Per-row factors (Infinity where unbounded), when asked for. */
  readonly factors?: Float64Array;
}

/** Where a row's value is missing or not a number. @public */
export interface RowProblem {
  readonly row: number;
  readonly column: number;
  readonly component: string;
  readonly message: string;
}

/**
 * Unit-aware wrapper: columns in Pa from rows of numbers in a stated unit (`siPerUnit` Pa per
 * unit, e.g. 1e6 for MPa). Returns the first row problem instead when a mapped value is missing
 * or not finite.
 * @example columnsFromRows([[80, -40, 25]], { sx: 0, sy: 1, txy: 2 }, 1e6) // sx = [80e6], ...
 * @public
 */
export function columnsFromRows(
  rows: readonly (readonly number[])[],
  mapping: ColumnMapping,
  siPerUnit: number,
): StressColumns | RowProblem {
  const n = rows.length;
  const keys = (['sx', 'sy', 'txy', 'sz', 'tyz', 'tzx'] as const).filter((k) => mapping[k] !== undefined);
  const out: Record<string, Float64Array> = {};
  for (const k of keys) out[k] = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const row = rows[i]!;
    for (const k of keys) {
      const col = mapping[k]!;
      const v = row[col];
      if (typeof v !== 'number' || !Number.isFinite(v)) {
        return { row: i, column: col, component: k, message: v === undefined ? 'is missing' : 'is not a finite number' };
      }
      out[k]![i] = v * siPerUnit;
    }
  }
  const threeD = mapping.sz !== undefined || mapping.tyz !== undefined || mapping.tzx !== undefined;
  if (threeD) {
    for (const k of ['sz', 'tyz', 'tzx'] as const) out[k] ??= new Float64Array(n);
  }
  return out as unknown as StressColumns;
}

/**
 * Evaluate a point set: per-row factors against a theory (plain-number kernels), then count,
 * minimum factor, worst row (0-based) and rows below the required factor. Strengths in Pa and
 * radians, already validated.
 * @public
 */
export function evaluatePointSet(
  theory: TheoryId,
  columns: StressColumns,
  strength: Strength,
  required = 1,
  keepFactors = false,
): PointSetOutcome {
  const problem = THEORIES[theory].validate(strength);
  if (problem) throw new Error(`strength ${problem.key} ${problem.message} (validate before evaluatePointSet)`);
  const factors = new Float64Array(columns.sx.length);
  criterionFactorBatch(theory, columns, strength, factors);
  const summary = summarizeFactors(factors, required);
  return keepFactors ? { ...summary, required, factors } : { ...summary, required };
}
