import { z } from 'zod';
import type { Material, MaterialsLookup } from '../kinds/materials';
import { checkDimension, type ExpectedDimension } from '../units/checkDimension';
import { evaluateExpression, isExpressionProblem } from '../units/expression';

/**
 * A material of a materials library as people keep it: each property value is an expression with
 * units ("250 MPa", "38 deg", "0.29"), with its basis and the published source it comes from.
 * The evaluator receives the values only ({@link toEngineMaterial}); the sheet shows the sources.
 */

/** The properties a library material may carry. @public */
export const MATERIAL_PROPERTY_KEYS = ['Sy', 'Sut', 'Suc', 'c', 'phi', 'E', 'nu'] as const;
/** @public */
export type MaterialPropertyKey = (typeof MATERIAL_PROPERTY_KEYS)[number];

/**
 * Where a value comes from: `minimum` is a specification minimum, `typical` a handbook mean or
 * typical value, `design` a value chosen for design (an allowable, or a point in a published range).
 * @public
 */
export const MATERIAL_BASES = ['minimum', 'typical', 'design'] as const;
/** @public */
export type MaterialBasis = (typeof MATERIAL_BASES)[number];

/** Groups of the materials list. @public */
export const MATERIAL_CATEGORIES = [
  'carbon-steel',
  'alloy-steel',
  'stainless-steel',
  'aluminium',
  'titanium',
  'cast-iron',
  'soil',
  'rock',
  'other',
] as const;
/** @public */
export type MaterialCategory = (typeof MATERIAL_CATEGORIES)[number];

/** What each property is, its dimension and an example, for forms, tables and checks. @public */
export const MATERIAL_PROPERTIES: Readonly<
  Record<MaterialPropertyKey, { readonly label: string; readonly dimension: ExpectedDimension; readonly example: string }>
> = {
  Sy: { label: 'Yield strength Sy', dimension: 'pressure', example: '250 MPa' },
  Sut: { label: 'Ultimate tensile strength Sut', dimension: 'pressure', example: '400 MPa' },
  Suc: { label: 'Ultimate compressive strength Suc', dimension: 'pressure', example: '750 MPa' },
  c: { label: 'Cohesion c', dimension: 'pressure', example: '20 kPa' },
  phi: { label: 'Friction angle phi', dimension: 'angle', example: '30 deg' },
  E: { label: "Young's modulus E", dimension: 'pressure', example: '200 GPa' },
  nu: { label: "Poisson's ratio nu", dimension: 'dimensionless', example: '0.3' },
};

/** A material key: what criterion and point-set cells write in `material`. @public */
export const materialKeySchema = z
  .string({ error: 'must be a string' })
  .trim()
  .regex(/^[a-z0-9][a-z0-9-]{0,62}[a-z0-9]$/, {
    error: 'must be 2 to 64 lowercase letters, digits or hyphens, starting and ending with a letter or digit',
  });

/**
 * One property value with its basis and published source. `confirmed: false` marks a value that
 * could not be confirmed against the source it names (the table was not reached, or only a
 * secondary reproduction disagreeing with it was); every surface that shows or uses the value
 * shows a caution with it, and an issued revision keeps the mark in its frozen copy. `true` says
 * the value was checked against the named source; absent says nothing either way (an
 * organization's own values carry their own sources).
 * @public
 */
export const materialValueSchema = z.strictObject({
  value: z.string({ error: 'must be a string' }).trim().min(1, { error: 'must not be empty' }).max(100),
  basis: z.enum(MATERIAL_BASES, { error: `must be one of ${MATERIAL_BASES.join(', ')}` }),
  source: z
    .string({ error: 'must be a string' })
    .trim()
    .min(3, { error: 'must name the published source (standard or handbook, edition, table), or say "from memory"' })
    .max(500),
  confirmed: z.boolean({ error: 'must be true or false' }).optional(),
});
/** @public */
export type MaterialValue = z.infer<typeof materialValueSchema>;

const propertiesShape = Object.fromEntries(MATERIAL_PROPERTY_KEYS.map((key) => [key, materialValueSchema.optional()])) as {
  [K in MaterialPropertyKey]: z.ZodOptional<typeof materialValueSchema>;
};

/** A library material: id, name, category, notes and its property values. @public */
export const materialRecordSchema = z.strictObject({
  id: materialKeySchema,
  name: z.string({ error: 'must be a string' }).trim().min(1, { error: 'must not be empty' }).max(200),
  category: z.enum(MATERIAL_CATEGORIES, { error: `must be one of ${MATERIAL_CATEGORIES.join(', ')}` }),
  notes: z.string({ error: 'must be a string' }).max(2000).default(''),
  properties: z.strictObject(propertiesShape),
});
/** @public */
export type MaterialRecord = z.infer<typeof materialRecordSchema>;

/** A problem with one field of a material, e.g. `{ field: 'properties.Sy.value', message: '...' }`. @public */
export interface MaterialProblem {
  readonly field: string;
  readonly message: string;
}

function rangeProblem(key: MaterialPropertyKey, si: number): string | null {
  switch (key) {
    case 'c':
      return si >= 0 ? null : 'must be zero or positive';
    case 'phi':
      return si >= 0 && si < Math.PI / 2 ? null : 'must be at least 0 deg and less than 90 deg';
    case 'nu':
      return si >= 0 && si < 0.5 ? null : 'must be at least 0 and less than 0.5';
    default:
      return si > 0 ? null : 'must be positive';
  }
}

/**
 * Check the values of a material beyond its schema: each value evaluates on its own (no cell
 * names), has the property's dimension (checked with `checkDimension`) and lies in the
 * property's range (strengths and E positive, c >= 0, 0 <= phi < 90 deg, 0 <= nu < 0.5). A
 * material needs at least one property. Problems name the field, e.g. `properties.Sy.value`.
 * @example checkMaterialValues({ ...a36, properties: { Sy: { value: '250 kN', ... } } })
 *   // [{ field: 'properties.Sy.value', message: 'properties.Sy.value: expected a stress (...), got a force' }]
 * @public
 */
export function checkMaterialValues(record: Pick<MaterialRecord, 'properties'>): MaterialProblem[] {
  const problems: MaterialProblem[] = [];
  const keys = MATERIAL_PROPERTY_KEYS.filter((key) => record.properties[key] !== undefined);
  if (keys.length === 0) {
    problems.push({ field: 'properties', message: 'properties: give at least one value (Sy, Sut, Suc, c, phi, E or nu)' });
  }
  for (const key of keys) {
    const field = `properties.${key}.value`;
    const q = evaluateExpression((record.properties[key] as MaterialValue).value, new Map());
    if (isExpressionProblem(q)) {
      const hint = q.code === 'unknown-name' ? ' (a material value is a number with units, e.g. ' + MATERIAL_PROPERTIES[key].example + ')' : '';
      problems.push({ field, message: `${field}: ${q.message}${hint}` });
      continue;
    }
    const wrong = checkDimension(field, q.dim, MATERIAL_PROPERTIES[key].dimension);
    if (wrong) {
      problems.push({ field, message: wrong });
      continue;
    }
    const outside = rangeProblem(key, q.si);
    if (outside) problems.push({ field, message: `${field}: ${outside}` });
  }
  return problems;
}

/** The words that mark a value whose source could not be confirmed, wherever it is written out. @public */
export const UNCONFIRMED_SOURCE_WORDS = 'source not confirmed';

/**
 * The properties of a material whose values are marked `confirmed: false`, in the library's
 * property order (Sy, Sut, Suc, c, phi, E, nu), limited to `keys` when given (the strengths a
 * check uses).
 * @example unconfirmedKeys(ss17_4ph, ['Sy']) // ['Sy']
 * @public
 */
export function unconfirmedKeys(
  record: Pick<MaterialRecord, 'properties'>,
  keys: readonly MaterialPropertyKey[] = MATERIAL_PROPERTY_KEYS,
): MaterialPropertyKey[] {
  return MATERIAL_PROPERTY_KEYS.filter((key) => keys.includes(key) && record.properties[key]?.confirmed === false);
}

/**
 * The material as the evaluator takes it: the values as expressions with units, and one
 * `source` line that names the source of each value (values sharing a source are listed together,
 * each with its basis), e.g. `Sy, Sut (minimum): ASTM A36/A36M-19, Table 3; E, nu (typical): ...`.
 * Values marked `confirmed: false` say so in their group: `E, nu (typical; source not confirmed): ...`.
 * @public
 */
export function toEngineMaterial(record: Pick<MaterialRecord, 'name' | 'properties'>): Material {
  const values: Partial<Record<MaterialPropertyKey, string>> = {};
  const groups = new Map<string, { keys: MaterialPropertyKey[]; basis: string; source: string; unconfirmed: boolean }>();
  for (const key of MATERIAL_PROPERTY_KEYS) {
    const entry = record.properties[key];
    if (!entry) continue;
    values[key] = entry.value;
    const unconfirmed = entry.confirmed === false;
    const label = JSON.stringify([entry.basis, entry.source, unconfirmed]);
    const group = groups.get(label);
    if (group) group.keys.push(key);
    else groups.set(label, { keys: [key], basis: entry.basis, source: entry.source, unconfirmed });
  }
  const source = [...groups.values()]
    .map((g) => `${g.keys.join(', ')} (${g.basis}${g.unconfirmed ? `; ${UNCONFIRMED_SOURCE_WORDS}` : ''}): ${g.source}`)
    .join('; ');
  return { name: record.name, ...values, source };
}

/**
 * A materials lookup for the evaluator from library materials (later entries with the same id
 * replace earlier ones).
 * @example createEvaluator(sheet, { materials: materialsLookupOf(records) })
 * @public
 */
export function materialsLookupOf(records: Iterable<Pick<MaterialRecord, 'id' | 'name' | 'properties'>>): MaterialsLookup {
  const map = new Map<string, Material>();
  for (const record of records) map.set(record.id, toEngineMaterial(record));
  return map;
}
