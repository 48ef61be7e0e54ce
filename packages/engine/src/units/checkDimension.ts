import { DIMENSIONS, describeDimension, sameDimension, type Dimension } from './dimension';

/** What a field must hold. @public */
export type ExpectedDimension = 'pressure' | 'angle' | 'dimensionless' | 'length' | 'force' | 'any';

const WANTED: Record<Exclude<ExpectedDimension, 'any'>, { dim: Dimension; words: string }> = {
  pressure: { dim: DIMENSIONS.pressure, words: 'a stress (a pressure, e.g. 120 MPa or 18 ksi)' },
  angle: { dim: DIMENSIONS.angle, words: 'an angle (e.g. 30 deg or 0.5 rad)' },
  dimensionless: { dim: DIMENSIONS.dimensionless, words: 'a plain number' },
  length: { dim: DIMENSIONS.length, words: 'a length (e.g. 12 mm)' },
  force: { dim: DIMENSIONS.force, words: 'a force (e.g. 18 kN)' },
};

/**
 * Check that a field's value has the dimension the field needs. Returns null when it does, else
 * a message that names the field and the dimension it got, e.g.
 * `sx: expected a stress (a pressure, e.g. 120 MPa or 18 ksi), got a force`.
 * @public
 */
export function checkDimension(field: string, dim: Dimension, expected: ExpectedDimension): string | null {
  if (expected === 'any') return null;
  const want = WANTED[expected];
  if (sameDimension(dim, want.dim)) return null;
  const hint = expected === 'angle' && sameDimension(dim, DIMENSIONS.dimensionless) ? ' (write the unit: deg or rad)' : '';
  return `${field}: expected ${want.words}, got ${describeDimension(dim)}${hint}`;
}
