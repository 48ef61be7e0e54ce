/**
 * Physical dimensions as exponent vectors over mathjs's base dimensions, in its order:
 * mass, length, time, current, temperature, luminous intensity, amount of substance, angle, bit.
 */

/** An exponent vector of 9 base dimensions (mathjs order). @public */
export type Dimension = readonly number[];

const d = (mass: number, length: number, time: number, angle = 0): Dimension => [mass, length, time, 0, 0, 0, 0, angle, 0];

/** Dimensions the engine names. @public */
export const DIMENSIONS = {
  dimensionless: d(0, 0, 0),
  pressure: d(1, -1, -2),
  pressure2: d(2, -2, -4),
  pressure3: d(3, -3, -6),
  force: d(1, 1, -2),
  length: d(0, 1, 0),
  area: d(0, 2, 0),
  volume: d(0, 3, 0),
  moment: d(1, 2, -2),
  forcePerLength: d(1, 0, -2),
  angle: d(0, 0, 0, 1),
  mass: d(1, 0, 0),
  time: d(0, 0, 1),
  density: d(1, -3, 0),
  unitWeight: d(1, -2, -2),
} as const satisfies Record<string, Dimension>;

/** A named dimension. @public */
export type DimensionName = keyof typeof DIMENSIONS;

const DESCRIPTIONS: Record<DimensionName, string> = {
  dimensionless: 'a plain number',
  pressure: 'a pressure (stress)',
  pressure2: 'a pressure squared',
  pressure3: 'a pressure cubed',
  force: 'a force',
  length: 'a length',
  area: 'an area',
  volume: 'a volume',
  moment: 'a moment (or energy)',
  forcePerLength: 'a force per length',
  angle: 'an angle',
  mass: 'a mass',
  time: 'a time',
  density: 'a density',
  unitWeight: 'a unit weight',
};

const BASE_UNITS = ['kg', 'm', 's', 'A', 'K', 'cd', 'mol', 'rad', 'bit'];

/** True when two dimensions are equal. @public */
export function sameDimension(a: Dimension, b: Dimension): boolean {
  for (let i = 0; i < 9; i++) if ((a[i] ?? 0) !== (b[i] ?? 0)) return false;
  return true;
}

/** The name of a dimension the engine knows, or null. @public */
export function nameOfDimension(dim: Dimension): DimensionName | null {
  for (const [name, known] of Object.entries(DIMENSIONS)) if (sameDimension(dim, known)) return name as DimensionName;
  return null;
}

/** The SI base unit string of a dimension, e.g. `kg m^-1 s^-2` for a pressure; '' when dimensionless. @public */
export function baseUnitOf(dim: Dimension): string {
  return BASE_UNITS.map((u, i) => {
    const e = dim[i] ?? 0;
    if (e === 0) return '';
    return e === 1 ? u : `${u}^${e}`;
  })
    .filter(Boolean)
    .join(' ');
}

/**
 * Words for a dimension in error messages: "a force", "a pressure (stress)", or the SI base
 * units for one without a name ("units of kg m^-2").
 * @public
 */
export function describeDimension(dim: Dimension): string {
  const name = nameOfDimension(dim);
  return name ? DESCRIPTIONS[name] : `units of ${baseUnitOf(dim)}`;
}
