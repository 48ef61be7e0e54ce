import { z } from 'zod';
import { fieldTex } from './fieldTex';
import { texName } from './latex';
import { isFailure, ValuesBuilder } from './result';
import { cellIdSchema, cellNameSchema, expressionSchema } from './schemaParts';
import type { CellKind } from './types';

/** A quantity cell: a named expression with units. @public */
export const quantityCellSchema = z
  .strictObject({
    id: cellIdSchema,
    kind: z.literal('quantity'),
    name: cellNameSchema,
    expr: expressionSchema,
  })
  .meta({ title: 'quantity', description: 'A named value: an expression with units, e.g. "18 kN"' });

/** @public */
export type QuantityCell = z.infer<typeof quantityCellSchema>;

/**
 * Quantity: `name = expr`, any dimension. Result `value` in SI base units; its measure is the
 * expression's dimension, so `18 kN` shows as kN in SI units and kip in US units.
 * @example { kind: 'quantity', name: 'A', expr: '40 mm * 12 mm' } // value 4.8e-4 (m²)
 * @public
 */
export const quantityKind: CellKind<QuantityCell> = {
  id: 'quantity',
  label: 'Quantity',
  schema: quantityCellSchema,
  expressions: (cell) => [['expr', cell.expr]],
  references: () => [],
  evaluate(cell, context) {
    const q = context.quantity('expr', cell.expr);
    if (isFailure(q)) return q;
    return new ValuesBuilder().number('value', q.si, q.dim).ok(cell.id, 'quantity');
  },
  equation(cell, result, context) {
    const value = result.values.value;
    const measure = result.measures.value;
    if (typeof value !== 'number' || measure === undefined) return null;
    return fieldTex(texName(cell.name), cell.expr, value, measure, context);
  },
};
