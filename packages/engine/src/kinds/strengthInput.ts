import { THEORIES } from '../criteria/theories';
import type { Strength, StrengthKey, TheoryId } from '../criteria/types';
import type { ExpectedDimension } from '../units/checkDimension';
import type { KindId } from './kindIds';
import { findMaterial } from './materials';
import { cellFailure, isFailure, type CellFailure } from './result';
import type { KindContext } from './types';

const DIMENSION_OF: Record<StrengthKey, ExpectedDimension> = { Sy: 'pressure', Sut: 'pressure', Suc: 'pressure', c: 'pressure', phi: 'angle' };

/** The strength fields of a criterion or point-set cell. */
export interface StrengthFields {
  readonly strength?: Partial<Record<StrengthKey, string>>;
  readonly material?: string;
  readonly required?: string;
}

/**
 * Resolve the strengths a theory needs, from the cell's own `strength` expressions or from its
 * `material` in the materials list, check them (`FailureTheory.validate`) and read `required`.
 * Every problem is a failure naming the field: `strength.Sy`, `material`, `required`.
 */
export function resolveStrength(
  cellId: string,
  kind: KindId,
  theoryId: TheoryId,
  fields: StrengthFields,
  context: KindContext,
): { strength: Strength; required: number } | CellFailure {
  const theory = THEORIES[theoryId];
  const strength: Partial<Record<StrengthKey, number>> = {};
  if (fields.material !== undefined) {
    const material = findMaterial(context.materials, fields.material);
    if (!material) {
      return cellFailure(cellId, kind, 'unknown-material', `material: no material "${fields.material}" in the materials list`);
    }
    for (const key of theory.needs) {
      const raw = material[key];
      if (raw === undefined) {
        return cellFailure(cellId, kind, 'invalid-field', `material: "${fields.material}" has no ${key}, which ${theoryId} needs`);
      }
      const value =
        typeof raw === 'number' ? raw : context.value(`material.${key}`, raw, DIMENSION_OF[key]);
      if (isFailure(value)) return value;
      strength[key] = value;
    }
  } else {
    for (const key of theory.needs) {
      const text = fields.strength?.[key];
      if (text === undefined) {
        return cellFailure(cellId, kind, 'invalid-field', `strength.${key}: ${theoryId} needs ${key}`);
      }
      const value = context.value(`strength.${key}`, text, DIMENSION_OF[key]);
      if (isFailure(value)) return value;
      strength[key] = value;
    }
  }
  const problem = theory.validate(strength);
  if (problem) {
    const field = fields.material !== undefined ? `material (${fields.material}) ${problem.key}` : `strength.${problem.key}`;
    return cellFailure(cellId, kind, 'domain', `${field}: ${problem.message}`);
  }
  let required = 1;
  if (fields.required !== undefined) {
    const r = context.value('required', fields.required, 'dimensionless');
    if (isFailure(r)) return r;
    if (!(r > 0)) return cellFailure(cellId, kind, 'domain', 'required: must be a positive factor');
    required = r;
  }
  return { strength, required };
}
