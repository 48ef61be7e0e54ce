import type { CellOk } from '../kinds/result';
import type { Dimension } from '../units/dimension';
import { scopeValueOf } from '../units/expression';
import { dimensionOfMeasure } from '../units/measure';

const cache = new WeakMap<CellOk, unknown>();

/** An own, enumerable property computed on first read and kept. */
function defineLazy(object: Record<string, unknown>, key: string, compute: () => unknown): void {
  Object.defineProperty(object, key, {
    configurable: true,
    enumerable: true,
    get() {
      const v = compute();
      Object.defineProperty(object, key, { value: v, enumerable: true, configurable: false, writable: false });
      return v;
    },
  });
}

/**
 * The value a cell's name takes inside other cells' expressions. A quantity is its value (a
 * mathjs Unit in SI base units, or a plain number); any other kind is an object of its numeric
 * values, so `P.s1`, `C.factor` or `S.txy` work in expressions. An unbounded factor is Infinity
 * there. Built once per result.
 */
export function scopeValueOfResult(result: CellOk): unknown {
  const hit = cache.get(result);
  if (hit !== undefined) return hit;
  let value: unknown;
  if (result.kind === 'quantity') {
    value = scopeValueOf({ si: result.values.value as number, dim: result.measures.value as Dimension });
  } else {
    // Values become mathjs Units only when an expression reads them: a principal cell has some
    // thirty values, and a referring expression usually reads one or two.
    const object: Record<string, unknown> = {};
    for (const [key, v] of Object.entries(result.values)) {
      if (typeof v === 'boolean') object[key] = v;
      else if (typeof v === 'number') {
        const measure = result.measures[key];
        if (measure === undefined) object[key] = v;
        else defineLazy(object, key, () => scopeValueOf({ si: v, dim: dimensionOfMeasure(measure) }));
      } else if (v === null && result.values.unbounded === true && (key === 'factor' || key === 'minFactor' || key === 'margin')) {
        object[key] = Infinity;
      }
    }
    value = object;
  }
  cache.set(result, value);
  return value;
}
