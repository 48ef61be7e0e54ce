import type { Strength, TheoryId } from '../criteria/types';
import type { StressTensor } from '../stress/types';
import type { Measure } from '../units/measure';
import type { KindId } from './kindIds';

/**
 * Error codes of a cell, a closed union:
 * - `parse`: an expression does not parse or uses a construct that is not allowed
 * - `unknown-name`: an expression or `of` names no cell (or an unknown function)
 * - `cycle`: the cell is part of a reference cycle
 * - `unit-mismatch`: a value has the wrong dimension, or units do not combine
 * - `domain`: a value is outside what the formula accepts (negative E, nu >= 0.5, ...)
 * - `upstream`: a cell this one depends on has an error (`rootCellId` names the cause)
 * - `invalid-field`: the cell's fields do not fit its kind's schema, or a reference has the wrong kind
 * - `duplicate-name`: another cell has the same name
 * - `unknown-material`: the material id is not in the materials list
 * - `not-supported`: valid input this version cannot evaluate yet (upload sources)
 * - `evaluation`: an expression failed while being evaluated
 * - `forbidden`: an expression called a function that sheets may not use
 * @public
 */
export const CELL_ERROR_CODES = [
  'parse',
  'unknown-name',
  'cycle',
  'unit-mismatch',
  'domain',
  'upstream',
  'invalid-field',
  'duplicate-name',
  'unknown-material',
  'not-supported',
  'evaluation',
  'forbidden',
] as const;

/** A cell error code. @public */
export type CellErrorCode = (typeof CELL_ERROR_CODES)[number];

/** Why a cell has no value. The message names the field at fault. @public */
export interface CellError {
  readonly code: CellErrorCode;
  readonly message: string;
  /** The cell this error belongs to. */
  readonly cellId: string;
  /** For `upstream`: the cell where the trouble started. */
  readonly rootCellId?: string;
}

/**
 * A value in a result: numbers in SI base units (Pa, m, N, rad; strains and ratios plain),
 * booleans (`pass`), null (a factor with no finite value, with `unbounded: true` beside it), or
 * a list of numbers (direction cosines, per-row factors).
 * @public
 */
export type ResultValue = number | boolean | null | readonly (number | null)[];

/** A cell that evaluated. @public */
export interface CellOk {
  readonly ok: true;
  readonly cellId: string;
  readonly kind: KindId;
  /** Named values, SI base units; JSON-safe (no Infinity, no NaN). */
  readonly values: Readonly<Record<string, ResultValue>>;
  /** What each numeric value measures, for formatting (see `formatResult`). */
  readonly measures: Readonly<Record<string, Measure>>;
  /** The stress state a cell of a state kind holds (SI, tension positive). */
  readonly state?: StressTensor;
  /** rotate: the state it was turned from, and the angle (radians, counterclockwise). */
  readonly rotation?: { readonly from: StressTensor; readonly angleRad: number };
  /** criterion and pointset: what was checked, for envelope plots. */
  readonly criterion?: { readonly theory: TheoryId; readonly strength: Strength; readonly required: number };
}

/** A cell that did not evaluate. @public */
export interface CellFailure {
  readonly ok: false;
  readonly cellId: string;
  /** The cell's kind, or null when the kind itself is missing or unknown. */
  readonly kind: KindId | null;
  readonly error: CellError;
}

/** A cell's result: values, or an error value. Evaluation never throws. @public */
export type CellResult = CellOk | CellFailure;

/** Build a failure. @public */
export function cellFailure(
  cellId: string,
  kind: KindId | null,
  code: CellErrorCode,
  message: string,
  rootCellId?: string,
): CellFailure {
  return { ok: false, cellId, kind, error: rootCellId ? { code, message, cellId, rootCellId } : { code, message, cellId } };
}

/** True for a failure (narrows unions of a value and a failure). @public */
export function isFailure(value: unknown): value is CellFailure {
  return typeof value === 'object' && value !== null && (value as { ok?: unknown }).ok === false && 'error' in value;
}

/** Collects result values and their measures, keeping values JSON-safe. */
export class ValuesBuilder {
  readonly values: Record<string, ResultValue> = {};
  readonly measures: Record<string, Measure> = {};

  /** A finite number with its measure. Non-finite numbers become null. */
  number(key: string, value: number, measure: Measure): this {
    this.values[key] = Number.isFinite(value) ? value + 0 : null;
    this.measures[key] = measure;
    return this;
  }

  /** A factor that may be infinite: Infinity becomes null with `unbounded: true`. */
  factor(key: string, value: number): this {
    if (value === Infinity) {
      this.values[key] = null;
      this.values.unbounded = true;
    } else {
      this.values[key] = Number.isFinite(value) ? value + 0 : null;
    }
    this.measures[key] = 'ratio';
    return this;
  }

  flag(key: string, value: boolean): this {
    this.values[key] = value;
    return this;
  }

  list(key: string, value: readonly number[], measure: Measure): this {
    this.values[key] = value.map((v) => (Number.isFinite(v) ? v + 0 : null));
    this.measures[key] = measure;
    return this;
  }

  /** The finished result. */
  ok(cellId: string, kind: KindId, extras: Pick<CellOk, 'state' | 'rotation' | 'criterion'> = {}): CellOk {
    return { ok: true, cellId, kind, values: this.values, measures: this.measures, ...extras };
  }
}
