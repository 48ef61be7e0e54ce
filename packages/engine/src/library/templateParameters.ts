import { z } from 'zod';
import type { CellResult } from '../kinds/result';
import { cellIdSchema, cellNameSchema, expressionSchema } from '../kinds/schemaParts';
import { createEvaluator } from '../sheet/createEvaluator';
import { checkDimension, type ExpectedDimension } from '../units/checkDimension';
import { DIMENSIONS, describeDimension, sameDimension, type Dimension } from '../units/dimension';
import { compileExpression, evaluateExpression, isExpressionProblem } from '../units/expression';
import { formatNumber } from '../units/formatQuantity';

/**
 * A template parameter: a quantity cell of the template whose `expr` the person starting a sheet
 * gives. `unit` is the unit the form asks in ('' for a plain number) and fixes the dimension;
 * `min` and `max` are expressions with units and may name other parameters (`max: "D - 1 mm"`).
 * @example { cellId: 'q3', name: 't', label: 'Wall thickness', unit: 'mm', min: '0.5 mm', max: 'r / 10' }
 * @public
 */
export const templateParameterSchema = z.strictObject({
  cellId: cellIdSchema,
  name: cellNameSchema,
  label: z.string({ error: 'must be a string' }).trim().min(1, { error: 'must not be empty' }).max(120),
  unit: z.string({ error: 'must be a string' }).trim().max(40),
  min: expressionSchema.optional(),
  max: expressionSchema.optional(),
  hint: z.string({ error: 'must be a string' }).max(300).optional(),
});
/** @public */
export type TemplateParameter = z.infer<typeof templateParameterSchema>;

/** The parameters of a template: at most 60, each cell and each name once. @public */
export const templateParametersSchema = z
  .array(templateParameterSchema, { error: 'must be a list of parameters' })
  .max(60, { error: 'must hold at most 60 parameters' })
  .superRefine((list, ctx) => {
    const cells = new Set<string>();
    const names = new Set<string>();
    list.forEach((p, i) => {
      if (cells.has(p.cellId)) ctx.addIssue({ code: 'custom', path: [i, 'cellId'], message: `cell "${p.cellId}" is already a parameter` });
      if (names.has(p.name)) ctx.addIssue({ code: 'custom', path: [i, 'name'], message: `"${p.name}" is already a parameter` });
      cells.add(p.cellId);
      names.add(p.name);
    });
  });

/** A problem naming its field: `parameters.t` for a value, `parameters[2].max` for a definition. @public */
export interface ParameterProblem {
  readonly field: string;
  readonly message: string;
}

/** The cells of a sheet, as far as parameters need them. @public */
export interface ParameterisedSheet {
  readonly cells: readonly { readonly id: string; readonly kind: string; readonly [field: string]: unknown }[];
}

/** Parameter values by parameter name, as typed (expressions with units, or plain numbers). @public */
export type ParameterValues = Readonly<Record<string, string | undefined>>;

/** Outcome of {@link applyTemplateParameters}. @public */
export type ParameterOutcome<S extends ParameterisedSheet> =
  | { readonly ok: true; readonly content: S; readonly exprs: Readonly<Record<string, string>> }
  | { readonly ok: false; readonly problems: readonly ParameterProblem[] };

const PLAIN_NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i;

const NAMED: readonly [ExpectedDimension, Dimension][] = [
  ['pressure', DIMENSIONS.pressure],
  ['angle', DIMENSIONS.angle],
  ['dimensionless', DIMENSIONS.dimensionless],
  ['length', DIMENSIONS.length],
  ['force', DIMENSIONS.force],
];

/** The dimension check of a value against its parameter's unit, with checkDimension's words where it has them. */
function dimensionProblem(field: string, got: Dimension, want: Dimension, unit: string): string | null {
  if (sameDimension(got, want)) return null;
  const named = NAMED.find(([, dim]) => sameDimension(dim, want));
  if (named) return checkDimension(field, got, named[0]);
  return `${field}: expected ${describeDimension(want)} (e.g. 1 ${unit}), got ${describeDimension(got)}`;
}

interface UnitInfo {
  readonly si: number;
  readonly dim: Dimension;
}

/** The SI size and dimension of one `unit` ('' is a plain number), or a message. */
function unitInfo(unit: string): UnitInfo | string {
  if (unit === '') return { si: 1, dim: DIMENSIONS.dimensionless };
  const q = evaluateExpression(`1 ${unit}`, new Map());
  if (isExpressionProblem(q)) return `"${unit}" is not a unit the sheet knows (${q.message})`;
  if (!(q.si > 0)) return `"${unit}" is not a positive unit`;
  return q;
}

/** A number in SI shown in the parameter's unit. */
function inUnit(si: number, unit: UnitInfo, text: string): string {
  const n = formatNumber(si / unit.si);
  return text === '' ? n : `${n} ${text}`;
}

function valueOf(result: CellResult | undefined): { si: number; dim: Dimension } | string {
  if (!result) return 'was not evaluated';
  if (!result.ok) return result.error.message.replace(/^expr: /, '');
  return { si: result.values.value as number, dim: result.measures.value as Dimension };
}

/** The text a value is stored as: a plain number gets the parameter's unit. */
function storedExpr(text: string, unit: string): string {
  const trimmed = text.trim();
  return unit !== '' && PLAIN_NUMBER.test(trimmed) ? `${trimmed} ${unit}` : trimmed;
}

/**
 * Check parameter values against a template and, when all are good, return the template's content
 * with each parameter cell's `expr` replaced (the content is not changed in place). A value may be
 * an expression with units ("12 mm", "0.5 in"), a plain number (read in the parameter's unit), or
 * an expression of other parameters. Each value must have the unit's dimension (checked with the
 * engine's checkDimension) and lie within `min` and `max` (inclusive). Problems name the field:
 * `parameters.t: Wall thickness must be at least 0.5 mm (got 0.2 mm)`.
 * @example applyTemplateParameters(content, params, { t: '6 mm', p: '20 MPa' })
 * @public
 */
export function applyTemplateParameters<S extends ParameterisedSheet>(
  content: S,
  parameters: readonly TemplateParameter[],
  values: ParameterValues,
): ParameterOutcome<S> {
  const problems: ParameterProblem[] = [];
  const units = new Map<string, UnitInfo>();
  const cellsById = new Map(content.cells.map((c) => [c.id, c]));

  parameters.forEach((p, i) => {
    const cell = cellsById.get(p.cellId);
    if (!cell || cell.kind !== 'quantity') {
      problems.push({ field: `parameters[${i}].cellId`, message: `parameters[${i}].cellId: "${p.cellId}" is not a quantity cell of the template` });
    } else if (cell.name !== p.name) {
      problems.push({ field: `parameters[${i}].name`, message: `parameters[${i}].name: cell "${p.cellId}" is named "${String(cell.name)}", not "${p.name}"` });
    }
    const unit = unitInfo(p.unit);
    if (typeof unit === 'string') problems.push({ field: `parameters[${i}].unit`, message: `parameters[${i}].unit: ${unit}` });
    else units.set(p.name, unit);
  });
  if (problems.length > 0) return { ok: false, problems };

  const exprs: Record<string, string> = {};
  const cells: { id: string; kind: 'quantity'; name: string; expr: string }[] = [];
  for (const p of parameters) {
    const text = values[p.name];
    if (text === undefined || text.trim() === '') {
      problems.push({ field: `parameters.${p.name}`, message: `parameters.${p.name}: ${p.label} is required` });
      continue;
    }
    exprs[p.name] = storedExpr(text, p.unit);
    cells.push({ id: p.cellId, kind: 'quantity', name: p.name, expr: exprs[p.name] as string });
  }
  parameters.forEach((p, i) => {
    for (const bound of ['min', 'max'] as const) {
      const text = p[bound];
      if (text !== undefined) cells.push({ id: `${p.cellId}#${bound}`, kind: 'quantity', name: `__${bound}_${i}`, expr: text });
    }
  });
  const ev = createEvaluator({ cells });

  // Values first: a bound that names a parameter whose value is wrong is not judged.
  const good = new Map<string, { si: number; unit: UnitInfo }>();
  for (const p of parameters) {
    if (exprs[p.name] === undefined) continue;
    const unit = units.get(p.name) as UnitInfo;
    const field = `parameters.${p.name}`;
    const value = valueOf(ev.results.get(p.cellId));
    if (typeof value === 'string') {
      problems.push({ field, message: `${field}: ${p.label}: ${value} (a value may use numbers, units and the other parameters)` });
      continue;
    }
    const wrong = dimensionProblem(field, value.dim, unit.dim, p.unit);
    if (wrong) problems.push({ field, message: `${field}: ${p.label}: ${wrong.slice(field.length + 2)}` });
    else good.set(p.name, { si: value.si, unit });
  }
  const names = new Set(parameters.map((p) => p.name));
  parameters.forEach((p, i) => {
    const value = good.get(p.name);
    if (!value) return;
    const field = `parameters.${p.name}`;
    for (const bound of ['min', 'max'] as const) {
      const text = p[bound];
      if (text === undefined) continue;
      const boundField = `parameters[${i}].${bound}`;
      if (compileExpression(text).symbols.some((s) => names.has(s) && !good.has(s))) continue;
      const limit = valueOf(ev.results.get(`${p.cellId}#${bound}`));
      if (typeof limit === 'string') {
        problems.push({ field: boundField, message: `${boundField}: ${limit} (a bound may use numbers, units and the parameters)` });
        continue;
      }
      const wrongBound = dimensionProblem(boundField, limit.dim, value.unit.dim, p.unit);
      if (wrongBound) {
        problems.push({ field: boundField, message: wrongBound });
        continue;
      }
      const outside = bound === 'min' ? value.si < limit.si : value.si > limit.si;
      if (outside) {
        const words = bound === 'min' ? 'at least' : 'at most';
        problems.push({
          field,
          message: `${field}: ${p.label} must be ${words} ${inUnit(limit.si, value.unit, p.unit)} (got ${inUnit(value.si, value.unit, p.unit)})`,
        });
      }
    }
  });
  if (problems.length > 0) return { ok: false, problems };

  const byCell = new Map(parameters.map((p) => [p.cellId, exprs[p.name] as string]));
  const next = content.cells.map((c) => (byCell.has(c.id) ? { ...c, expr: byCell.get(c.id) } : c));
  return { ok: true, content: { ...content, cells: next }, exprs };
}

/** Each parameter's current `expr` in the template, by parameter name (the form's defaults). @public */
export function defaultParameterValues(content: ParameterisedSheet, parameters: readonly TemplateParameter[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const p of parameters) {
    const cell = content.cells.find((c) => c.id === p.cellId);
    if (cell && typeof cell.expr === 'string') out[p.name] = cell.expr;
  }
  return out;
}

/**
 * Check a template's parameter definitions against its content: every parameter names a quantity
 * cell, its unit is known, its bounds evaluate with the unit's dimension, and the template's own
 * values are valid parameter values (so the form's defaults pass). Empty when all is well.
 * @public
 */
export function checkTemplateParameters(content: ParameterisedSheet, parameters: readonly TemplateParameter[]): ParameterProblem[] {
  const outcome = applyTemplateParameters(content, parameters, defaultParameterValues(content, parameters));
  return outcome.ok ? [] : [...outcome.problems];
}
