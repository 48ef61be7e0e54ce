/**
 * Plain types shared by the sheet figures. The figures take numbers in SI base units (Pa, rad)
 * and never import the engine; a display unit tells them how to print those numbers.
 */

/**
 * How to print a stress: `value in the display unit = value in Pa × perPa`.
 *
 * @example
 * const megapascal: DisplayUnit = { label: 'MPa', perPa: 1e-6 };
 * const ksi: DisplayUnit = { label: 'ksi', perPa: 1 / 6.894757e6 };
 */
export interface DisplayUnit {
  /** Printed after every number, e.g. `MPa`. */
  label: string;
  /** Display units per pascal, e.g. `1e-6` for MPa. */
  perPa: number;
}

/**
 * Which way the shear axis of a Mohr's-circle plot points. See `mohrPlotY` in
 * `figureGeometry.ts` for the exact mapping; in short:
 *
 * - `positive-down`: the τ axis points down; a point labelled (σ, τ) is drawn τ below the σ axis.
 * - `clockwise-up`: the axis reads the face shear taken positive when it turns the element
 *   clockwise, drawn upward.
 *
 * With the sheet's sign convention both put every point in the same place; only the τ axis
 * (its arrow, caption and tick readings) is mirrored. Point labels never change.
 */
export type ShearAxisConvention = 'positive-down' | 'clockwise-up';

/** A point in world (stress) or screen (SVG user unit) coordinates. */
export interface Point2 {
  x: number;
  y: number;
}
