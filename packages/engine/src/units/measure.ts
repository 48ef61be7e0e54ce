import { DIMENSIONS, type Dimension } from './dimension';

/**
 * What a result value measures, for formatting. Kinds use the named measures; a quantity cell
 * carries the dimension of its expression.
 *
 * - `stress` (Pa), `stress2` (Pa²), `stress3` (Pa³), `angle` (rad)
 * - `strain` (dimensionless, shown in microstrain), `ratio` (plain number: factors, margins)
 * - `count` and `index` (whole numbers)
 * @public
 */
export type Measure = 'stress' | 'stress2' | 'stress3' | 'angle' | 'strain' | 'ratio' | 'count' | 'index' | Dimension;

/** The physical dimension of a measure. @public */
export function dimensionOfMeasure(measure: Measure): Dimension {
  switch (measure) {
    case 'stress':
      return DIMENSIONS.pressure;
    case 'stress2':
      return DIMENSIONS.pressure2;
    case 'stress3':
      return DIMENSIONS.pressure3;
    case 'angle':
      return DIMENSIONS.angle;
    case 'strain':
    case 'ratio':
    case 'count':
    case 'index':
      return DIMENSIONS.dimensionless;
    default:
      return measure;
  }
}
