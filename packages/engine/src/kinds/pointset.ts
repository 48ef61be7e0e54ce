import { z } from 'zod';
import { columnsFromRows, evaluatePointSet, type ColumnMapping } from '../batch/pointSet';
import { THEORY_IDS } from '../criteria/types';
import { texPlain } from './latex';
import { cellFailure, isFailure, ValuesBuilder } from './result';
import { cellIdSchema, cellNameSchema, materialIdSchema, requiredSchema, strengthSchema } from './schemaParts';
import { resolveStrength } from './strengthInput';
import type { CellKind, ExpressionField } from './types';

const columnRef = z.union([z.number().int().min(0), z.string().min(1)], {
  error: 'must be a column index (0-based) or, for uploads, a column name',
});

/** A point-set cell: many stress states checked at once. @public */
export const pointsetCellSchema = z
  .strictObject({
    id: cellIdSchema,
    kind: z.literal('pointset'),
    name: cellNameSchema,
    source: z.union(
      [
        z.strictObject({ upload: z.string().min(1).meta({ description: 'Upload id' }) }),
        z.strictObject({
          rows: z
            .array(z.array(z.number(), { error: 'each row must be an array of numbers' }), { error: 'must be an array of rows' })
            .max(100000, { error: 'holds at most 100000 inline rows; upload larger sets' }),
        }),
      ],
      { error: 'must be {"upload": id} or {"rows": [[...], ...]}' },
    ),
    columns: z
      .strictObject({
        sx: columnRef,
        sy: columnRef,
        txy: columnRef,
        sz: columnRef.optional(),
        tyz: columnRef.optional(),
        tzx: columnRef.optional(),
      })
      .meta({ description: 'Where each stress component is: column index for inline rows, name or index for uploads' }),
    unit: z.string().max(32).optional().meta({ description: 'Unit of the numbers, a pressure unit (default MPa)' }),
    theory: z.enum(THEORY_IDS, { error: `must be one of ${THEORY_IDS.join(', ')}` }),
    strength: strengthSchema.optional(),
    material: materialIdSchema.optional(),
    required: requiredSchema.optional(),
    perRow: z.boolean().optional().meta({ description: 'Also return every row\'s factor' }),
  })
  .superRefine((cell, ctx) => {
    if (cell.strength !== undefined && cell.material !== undefined) {
      ctx.addIssue({ code: 'custom', path: ['material'], message: 'give either strength or material, not both' });
    }
    if (cell.strength === undefined && cell.material === undefined) {
      ctx.addIssue({ code: 'custom', path: ['strength'], message: 'is needed (or a material)' });
    }
  })
  .meta({ title: 'pointset', description: 'A set of stress points (inline rows or an upload) checked against a theory' });

/** @public */
export type PointsetCell = z.infer<typeof pointsetCellSchema>;

/**
 * Point set: every row's factor of safety against a theory, by the batch kernels. Values:
 * `count`, `minFactor` (null with `unbounded: true` when every row is unbounded), `worstRow`
 * (0-based index of the first row with the smallest factor), `failing` (rows below `required`),
 * `required`, `pass` (no failing row) and, with `perRow: true`, `factors` (null where unbounded).
 * Inline rows are read now; an upload source gives a `not-supported` error value.
 * @example { kind: 'pointset', name: 'FE', source: { rows: [[80, -40, 25]] }, columns: { sx: 0, sy: 1, txy: 2 }, theory: 'von-mises', strength: { Sy: '250 MPa' } }
 * @public
 */
export const pointsetKind: CellKind<PointsetCell> = {
  id: 'pointset',
  label: 'Point set',
  schema: pointsetCellSchema,
  expressions(cell) {
    const fields: ExpressionField[] = [];
    for (const [key, text] of Object.entries(cell.strength ?? {})) if (text !== undefined) fields.push([`strength.${key}`, text]);
    if (cell.required !== undefined) fields.push(['required', cell.required]);
    return fields;
  },
  references: () => [],
  evaluate(cell, context) {
    if ('upload' in cell.source) {
      return cellFailure(cell.id, 'pointset', 'not-supported', `source: uploads are not read by this engine version yet (upload ${cell.source.upload}); give inline rows`);
    }
    const mapping: Partial<Record<keyof ColumnMapping, number>> = {};
    for (const [key, ref] of Object.entries(cell.columns)) {
      if (ref === undefined) continue;
      if (typeof ref !== 'number') {
        return cellFailure(cell.id, 'pointset', 'invalid-field', `columns.${key}: inline rows need a column index (0-based), not a name`);
      }
      mapping[key as keyof ColumnMapping] = ref;
    }
    const unitText = cell.unit ?? 'MPa';
    if (!/^[A-Za-z]+$/.test(unitText)) {
      return cellFailure(cell.id, 'pointset', 'invalid-field', `unit: give a pressure unit such as MPa, ksi or Pa (got "${unitText}")`);
    }
    const siPerUnit = context.value('unit', `1 ${unitText}`, 'pressure');
    if (isFailure(siPerUnit)) return siPerUnit;
    const columns = columnsFromRows(cell.source.rows, mapping as ColumnMapping, siPerUnit);
    if ('row' in columns) {
      return cellFailure(cell.id, 'pointset', 'invalid-field', `source.rows[${columns.row}][${columns.column}] (${columns.component}): ${columns.message}`);
    }
    const resolved = resolveStrength(cell.id, 'pointset', cell.theory, cell, context);
    if (isFailure(resolved)) return resolved;
    const outcome = evaluatePointSet(cell.theory, columns, resolved.strength, resolved.required, cell.perRow === true);
    const values = new ValuesBuilder()
      .number('count', outcome.count, 'count')
      .factor('minFactor', outcome.minFactor)
      .number('worstRow', outcome.worstRow, 'index')
      .number('failing', outcome.failing, 'count')
      .number('required', outcome.required, 'ratio')
      .flag('pass', outcome.failing === 0);
    if (outcome.factors) values.list('factors', Array.from(outcome.factors), 'ratio');
    return values.ok(cell.id, 'pointset', {
      criterion: { theory: cell.theory, strength: resolved.strength, required: resolved.required },
    });
  },
  equation(_cell, result) {
    const v = result.values;
    if (v.count === 0) return '\\text{no rows}';
    const min = v.minFactor === null ? '\\infty' : texPlain(v.minFactor as number, 4);
    return `n_{min} = \\min_i n_i = ${min}\\ \\ (\\text{row } ${v.worstRow}),\\quad ${v.failing}\\ \\text{of}\\ ${v.count}\\ \\text{rows below}\\ n_{req} = ${texPlain(v.required as number)}`;
  },
};
