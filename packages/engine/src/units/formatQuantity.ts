import { baseUnitOf, nameOfDimension } from './dimension';
import { dimensionOfMeasure, type Measure } from './measure';
import { UNIT_SYSTEMS, type UnitSystemId } from './unitSystems';

/** A value ready to show: the number in the display unit, the unit, and both as text and LaTeX. @public */
export interface FormattedQuantity {
  /** The number in the display unit (not rounded). */
  readonly value: number;
  /** Display unit label ('' for plain numbers). */
  readonly unit: string;
  /** Rounded number and unit, e.g. `47.656 MPa`. */
  readonly text: string;
  /** The same for KaTeX, e.g. `47.656\,\mathrm{MPa}`. */
  readonly latex: string;
}

/**
 * A number rounded to `digits` significant digits for display, without trailing zeros; plain
 * notation between 1e-4 and 1e7, exponent notation outside.
 * @example formatNumber(47656098.4, 5) // '4.7656e+7'; formatNumber(47.6560984) // '47.656'
 * @public
 */
export function formatNumber(value: number, digits = 5): string {
  if (value === 0 || Object.is(value, -0)) return '0';
  if (!Number.isFinite(value)) return value > 0 ? '∞' : value < 0 ? '-∞' : 'NaN';
  const abs = Math.abs(value);
  if (abs >= 1e-4 && abs < 1e7) {
    const fixed = value.toPrecision(digits);
    const plain = fixed.includes('e') ? String(Number(fixed)) : fixed;
    return plain.includes('.') ? plain.replace(/\.?0+$/, '') : plain;
  }
  const [mantissa, exponent] = value.toExponential(digits - 1).split('e');
  const m = mantissa!.includes('.') ? mantissa!.replace(/\.?0+$/, '') : mantissa!;
  return `${m}e${exponent!}`;
}

const latexNumber = (text: string): string => {
  const m = /^(-?[\d.]+)e([+-]\d+)$/.exec(text);
  if (!m) return text.replace('∞', '\\infty');
  return `${m[1]}\\times 10^{${Number(m[2])}}`;
};

/**
 * Format a value held in SI base units for display in a unit system: stresses in MPa or ksi,
 * forces in kN or kip, lengths in mm or in, angles in degrees, strains in microstrain (µε),
 * ratios and counts as plain numbers. A dimension without a display unit is shown in SI base units.
 * @example formatQuantity(47.656e6, 'stress', 'US').text // '6.912 ksi'
 * @public
 */
export function formatQuantity(valueSI: number, measure: Measure, system: UnitSystemId, digits = 5): FormattedQuantity {
  if (measure === 'strain') {
    const value = valueSI * 1e6;
    const n = formatNumber(value, digits);
    return { value, unit: 'µε', text: `${n} µε`, latex: `${latexNumber(n)}\\,\\mu\\varepsilon` };
  }
  if (measure === 'ratio' || measure === 'count' || measure === 'index') {
    const n = measure === 'ratio' ? formatNumber(valueSI, digits) : String(Math.round(valueSI));
    return { value: valueSI, unit: '', text: n, latex: latexNumber(n) };
  }
  const dim = dimensionOfMeasure(measure);
  const name = nameOfDimension(dim);
  if (name === 'dimensionless') {
    const n = formatNumber(valueSI, digits);
    return { value: valueSI, unit: '', text: n, latex: latexNumber(n) };
  }
  const display = name ? UNIT_SYSTEMS[system][name] : undefined;
  if (!display) {
    const base = baseUnitOf(dim);
    const n = formatNumber(valueSI, digits);
    return { value: valueSI, unit: base, text: `${n} ${base}`, latex: `${latexNumber(n)}\\,\\mathrm{${base.replace(/ /g, '\\,')}}` };
  }
  const value = valueSI / display.siPerUnit;
  const n = formatNumber(value, digits);
  const gap = display.label === '°' ? '' : ' ';
  const latexGap = display.label === '°' ? '' : '\\,';
  return { value, unit: display.label, text: `${n}${gap}${display.label}`, latex: `${latexNumber(n)}${latexGap}${display.latex}` };
}
