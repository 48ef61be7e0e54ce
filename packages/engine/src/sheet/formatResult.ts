import type { CellOk } from '../kinds/result';
import { formatNumber, formatQuantity } from '../units/formatQuantity';
import type { UnitSystemId } from '../units/unitSystems';

/** One result value ready to show. @public */
export interface FormattedValue {
  /** The number in the display unit (null for flags, unbounded factors and lists). */
  readonly value: number | null;
  /** Display unit ('' for plain numbers and flags). */
  readonly unit: string;
  /** Text, e.g. `47.656 MPa`, `pass`, `unbounded`, `[0.908, 0.419, 0]`. */
  readonly text: string;
  /** LaTeX for KaTeX. */
  readonly latex: string;
}

/**
 * Every value of a result formatted for a unit system (stresses in MPa or ksi, angles in
 * degrees, strains in µε, ...). `unbounded` factors read "unbounded" (∞ in LaTeX); `pass` reads
 * "pass" or "fail".
 * @example formatResult(result, 'US').p1.text // '6.912 ksi'
 * @public
 */
export function formatResult(result: CellOk, system: UnitSystemId, digits = 5): Record<string, FormattedValue> {
  const out: Record<string, FormattedValue> = {};
  for (const [key, v] of Object.entries(result.values)) {
    const measure = result.measures[key];
    if (typeof v === 'boolean') {
      const text = key === 'pass' ? (v ? 'pass' : 'fail') : String(v);
      out[key] = { value: null, unit: '', text, latex: `\\text{${text}}` };
    } else if (v === null) {
      const unbounded = result.values.unbounded === true;
      out[key] = { value: null, unit: '', text: unbounded ? 'unbounded' : '—', latex: unbounded ? '\\infty' : '\\text{—}' };
    } else if (typeof v === 'number') {
      if (measure === undefined) {
        out[key] = { value: v, unit: '', text: formatNumber(v, digits), latex: formatNumber(v, digits) };
      } else {
        const f = formatQuantity(v, measure, system, digits);
        out[key] = { value: f.value, unit: f.unit, text: f.text, latex: f.latex };
      }
    } else {
      const parts = v.map((x) => (x === null ? '—' : measure ? formatQuantity(x, measure, system, digits).text : formatNumber(x, digits)));
      const text = `[${parts.join(', ')}]`;
      out[key] = { value: null, unit: '', text, latex: `\\left[${parts.join(',\\ ').replace(/µε/g, '\\mu\\varepsilon')}\\right]` };
    }
  }
  return out;
}
