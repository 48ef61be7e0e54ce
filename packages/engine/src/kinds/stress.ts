import { z } from 'zod';
import type { StressTensor } from '../stress/types';
import { fieldTex } from './fieldTex';
import { isFailure, ValuesBuilder } from './result';
import { cellIdSchema, cellNameSchema, expressionSchema } from './schemaParts';
import type { CellKind, ExpressionField } from './types';

/** A stress cell: a plane state, or a 3D tensor when any of sz, tyz, tzx is given. @public */
export const stressCellSchema = z
  .strictObject({
    id: cellIdSchema,
    kind: z.literal('stress'),
    name: cellNameSchema,
    sx: expressionSchema,
    sy: expressionSchema,
    txy: expressionSchema,
    sz: expressionSchema.optional(),
    tyz: expressionSchema.optional(),
    tzx: expressionSchema.optional(),
  })
  .meta({
    title: 'stress',
    description: 'Stress state: sx, sy, txy (plane) and optionally sz, tyz, tzx (3D); tension positive',
  });

/** @public */
export type StressCell = z.infer<typeof stressCellSchema>;

const COMPONENTS = ['sx', 'sy', 'txy', 'sz', 'tyz', 'tzx'] as const;
const TEX: Record<(typeof COMPONENTS)[number], string> = {
  sx: '\\sigma_x',
  sy: '\\sigma_y',
  txy: '\\tau_{xy}',
  sz: '\\sigma_z',
  tyz: '\\tau_{yz}',
  tzx: '\\tau_{zx}',
};

/**
 * Stress: the components of a stress state, each a pressure (tension positive; txy acts in +y on
 * the +x face). Missing sz, tyz, tzx are 0. Values: all six components in Pa; the cell can be
 * referred to as a stress state (`of`).
 * @example { kind: 'stress', name: 'S', sx: 'F / A', sy: '0 MPa', txy: '22 MPa' }
 * @public
 */
export const stressKind: CellKind<StressCell> = {
  id: 'stress',
  label: 'Stress state',
  schema: stressCellSchema,
  expressions(cell) {
    const fields: ExpressionField[] = [];
    for (const k of COMPONENTS) if (cell[k] !== undefined) fields.push([k, cell[k]!]);
    return fields;
  },
  references: () => [],
  evaluate(cell, context) {
    const state: Record<string, number> = {};
    for (const k of COMPONENTS) {
      const text = cell[k];
      if (text === undefined) {
        state[k] = 0;
        continue;
      }
      const v = context.value(k, text, 'pressure');
      if (isFailure(v)) return v;
      state[k] = v;
    }
    const values = new ValuesBuilder();
    for (const k of COMPONENTS) values.number(k, state[k]!, 'stress');
    return values.ok(cell.id, 'stress', { state: state as unknown as StressTensor });
  },
  equation(cell, result, context) {
    const lines = COMPONENTS.filter((k) => cell[k] !== undefined).map((k) =>
      fieldTex(TEX[k], cell[k]!, result.values[k] as number, 'stress', context).replace(' = ', ' &= '),
    );
    return `\\begin{aligned}${lines.join(' \\\\ ')}\\end{aligned}`;
  },
};
