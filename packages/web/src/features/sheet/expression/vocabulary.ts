/** A word offered by completion besides the sheet's own cell names. */
export interface VocabularyWord {
  label: string;
  detail: string;
}

/**
 * Units offered while typing, the ones stress work uses most; any other unit mathjs knows still
 * works when typed. ksi and kip are defined from the exact pound-force and inch by the engine.
 */
export const UNIT_WORDS: readonly VocabularyWord[] = [
  { label: 'MPa', detail: 'megapascal' },
  { label: 'kPa', detail: 'kilopascal' },
  { label: 'GPa', detail: 'gigapascal' },
  { label: 'Pa', detail: 'pascal' },
  { label: 'ksi', detail: 'kip per square inch' },
  { label: 'psi', detail: 'pound-force per square inch' },
  { label: 'Msi', detail: 'million psi' },
  { label: 'N', detail: 'newton' },
  { label: 'kN', detail: 'kilonewton' },
  { label: 'MN', detail: 'meganewton' },
  { label: 'lbf', detail: 'pound-force' },
  { label: 'kip', detail: '1000 lbf' },
  { label: 'mm', detail: 'millimetre' },
  { label: 'cm', detail: 'centimetre' },
  { label: 'm', detail: 'metre' },
  { label: 'in', detail: 'inch' },
  { label: 'ft', detail: 'foot' },
  { label: 'deg', detail: 'degree' },
  { label: 'rad', detail: 'radian' },
  { label: 'kg', detail: 'kilogram' },
  { label: 's', detail: 'second' },
];

/** Functions offered while typing (the expression language has more). */
export const FUNCTION_WORDS: readonly VocabularyWord[] = [
  { label: 'sqrt', detail: 'square root' },
  { label: 'abs', detail: 'absolute value' },
  { label: 'max', detail: 'largest argument' },
  { label: 'min', detail: 'smallest argument' },
  { label: 'sin', detail: 'sine' },
  { label: 'cos', detail: 'cosine' },
  { label: 'tan', detail: 'tangent' },
  { label: 'atan2', detail: 'angle of (y, x)' },
  { label: 'hypot', detail: 'root of the sum of squares' },
  { label: 'exp', detail: 'e to the power' },
  { label: 'log', detail: 'natural logarithm' },
  { label: 'log10', detail: 'common logarithm' },
];
