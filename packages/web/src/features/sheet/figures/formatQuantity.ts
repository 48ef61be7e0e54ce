/**
 * Number formatting for the figures: engineering precision (three significant figures), a true
 * minus sign, and the unit always printed after a stress.
 */

import type { DisplayUnit } from './figureTypes';

const minus = '\u2212';

/**
 * Relative size below which a difference does not show when the largest value is printed with
 * three significant figures; the figures treat smaller radii as zero.
 */
export const displayResolution = 5e-5;

export interface NumberFormatOptions {
  /** Significant figures of the reference magnitude; default 3. */
  significant?: number;
  /**
   * Largest magnitude printed alongside this number (same units). When given, the number keeps
   * its own significant figures but no more than one decimal beyond what the reference needs,
   * so a figure reads "X (80.0, 25.0)" and a shear of 3e-12 prints as 0.00, not 3.00e-12.
   */
  reference?: number;
  /** Fixed decimals; overrides `significant` and `reference`. */
  decimals?: number;
}

/**
 * A number with engineering precision: `significant` figures of the reference magnitude
 * (the number itself when no reference is given), never more than six decimals, exponent form
 * below 0.001, and U+2212 as the minus sign.
 *
 * @example
 * formatNumber(47.656098);            // "47.7"
 * formatNumber(-10.156098);           // "−10.2"
 * formatNumber(25, { reference: 80 }); // "25.0"
 * formatNumber(14.14, { reference: 504 }); // "14.1"
 * formatNumber(1234.5);               // "1235" (no exponent for large stresses)
 */
export function formatNumber(value: number, options: NumberFormatOptions = {}): string {
  if (Number.isNaN(value)) return '—';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : `${minus}∞`;
  const significant = options.significant ?? 3;
  const reference = Math.abs(options.reference ?? value);

  if (options.decimals === undefined && reference !== 0 && reference < 1e-3) {
    const text = value
      .toExponential(significant - 1)
      .replace('e+', 'e')
      .replace('-', minus);
    return text.replace(/e-/, `e${minus}`);
  }
  const decimalsFor = (magnitude: number) =>
    Math.min(
      6,
      Math.max(0, significant - 1 - (magnitude === 0 ? 0 : Math.floor(Math.log10(magnitude)))),
    );
  // With a reference: the number's own significant figures, but never more than one decimal
  // finer than the reference needs (14.14 beside 504 prints 14.1; 3e-12 beside 80 prints 0.00).
  const decimals =
    options.decimals !== undefined
      ? options.decimals
      : options.reference === undefined
        ? decimalsFor(reference)
        : Math.min(decimalsFor(Math.abs(value) || reference), decimalsFor(reference) + 1);
  let text = value.toFixed(decimals);
  // Rounding can leave "-0.0": a value that prints as zero is zero.
  if (Number(text) === 0) text = text.replace('-', '');
  return text.replace('-', minus);
}

/**
 * A stress given in Pa, printed in the display unit with the unit's label.
 *
 * @example
 * formatStress(47.656098e6, { label: 'MPa', perPa: 1e-6 }); // "47.7 MPa"
 */
export function formatStress(
  valuePa: number,
  unit: DisplayUnit,
  options: NumberFormatOptions = {},
): string {
  return `${formatStressNumber(valuePa, unit, options)} ${unit.label}`;
}

/** Like `formatStress` without the unit label, for tuples such as "(80.0, 25.0) MPa". */
export function formatStressNumber(
  valuePa: number,
  unit: DisplayUnit,
  options: NumberFormatOptions = {},
): string {
  const reference = options.reference === undefined ? undefined : options.reference * unit.perPa;
  return formatNumber(valuePa * unit.perPa, { ...options, reference });
}

/**
 * An angle given in radians, printed in degrees with one decimal and the degree sign.
 *
 * @example
 * formatAngle(0.43249); // "24.8°"
 */
export function formatAngle(angleRad: number): string {
  return `${formatNumber((angleRad * 180) / Math.PI, { decimals: 1 })}°`;
}

/**
 * A factor of safety with three significant figures; `null` (no finite factor) is "unbounded".
 *
 * @example
 * formatFactor(2.3456); // "2.35"
 * formatFactor(null);   // "unbounded"
 */
export function formatFactor(factor: number | null): string {
  if (factor === null || !Number.isFinite(factor)) return 'unbounded';
  return formatNumber(factor);
}
