import { z } from 'zod';
import { checkCriterion } from '../criteria/checkCriterion';
import { THEORY_IDS } from '../criteria/types';
import { criterionTex } from './criterionTex';
import { cellFailure, isFailure, ValuesBuilder } from './result';
import {
  cellIdSchema,
  cellNameSchema,
  materialIdSchema,
  requiredSchema,
  stateReferenceSchema,
  strengthSchema,
} from './schemaParts';
import { resolveStrength } from './strengthInput';
import type { CellKind, ExpressionField } from './types';

/** A criterion cell: a stress state checked against a failure theory. @public */
export const criterionCellSchema = z
  .strictObject({
    id: cellIdSchema,
    kind: z.literal('criterion'),
    name: cellNameSchema,
    of: stateReferenceSchema,
    theory: z.enum(THEORY_IDS, { error: `must be one of ${THEORY_IDS.join(', ')}` }),
    strength: strengthSchema.optional(),
    material: materialIdSchema.optional(),
    required: requiredSchema.optional(),
  })
  .superRefine((cell, ctx) => {
    if (cell.strength !== undefined && cell.material !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['material'], message: 'give either strength or material, not both' });
    }
    if (cell.strength === undefined && cell.material === undefined) {
      ctx.addIssue({ code: 'custom', path: ['strength'], message: 'is needed (or a material)' });
    }
  })
  .meta({ title: 'criterion', description: 'Failure check of `of` by `theory` against `strength` or `material`' });

/** @public */
export type CriterionCell = z.infer<typeof criterionCellSchema>;

/**
 * Criterion: checks the state `of` against a failure theory (see docs/criteria.md). Values:
 * `equivalent` (where the theory has one), `factor` (null with `unbounded: true` when no finite
 * factor exists), `margin` = factor / required - 1, `pass` = factor >= required, `required`,
 * the principal stresses `s1`, `s2`, `s3`, and for Mohr-Coulomb `radiusRatio`, `loadFactor`,
 * `planeAngle`, `planeNormal`, `planeShear` (its `factor` is the strength-reduction factor).
 * @example { kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' }
 * @public
 */
export const criterionKind: CellKind<CriterionCell> = {
  id: 'criterion',
  label: 'Failure criterion',
  schema: criterionCellSchema,
  expressions(cell) {
    const fields: ExpressionField[] = [];
    for (const [key, text] of Object.entries(cell.strength ?? {})) if (text !== undefined) fields.push([`strength.${key}`, text]);
    if (cell.required !== undefined) fields.push(['required', cell.required]);
    return fields;
  },
  references: (cell) => [['of', cell.of]],
  evaluate(cell, context) {
    const state = context.state('of', cell.of);
    if (isFailure(state)) return state;
    const resolved = resolveStrength(cell.id, 'criterion', cell.theory, cell, context);
    if (isFailure(resolved)) return resolved;
    const r = checkCriterion(cell.theory, state, resolved.strength, resolved.required);
    if (!r.ok) return cellFailure(cell.id, 'criterion', 'domain', `strength.${r.problem.key}: ${r.problem.message}`);
    const check = r.check;
    const values = new ValuesBuilder();
    if (check.equivalent !== null) values.number('equivalent', check.equivalent, 'stress');
    values.factor('factor', check.factor);
    values.number('margin', check.margin, 'ratio');
    values.flag('pass', check.pass);
    values.number('required', check.required, 'ratio');
    values.number('s1', check.principal[0], 'stress').number('s2', check.principal[1], 'stress').number('s3', check.principal[2], 'stress');
    for (const [key, v] of Object.entries(check.extra)) {
      values.number(key, v, key === 'planeAngle' ? 'angle' : key === 'planeNormal' || key === 'planeShear' ? 'stress' : 'ratio');
    }
    return values.ok(cell.id, 'criterion', {
      state,
      criterion: { theory: cell.theory, strength: resolved.strength, required: check.required },
    });
  },
  equation: (_cell, result, context) => criterionTex(result, context.system),
};
