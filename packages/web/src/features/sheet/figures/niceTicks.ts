/**
 * Round tick values for an axis: steps of 1, 2 or 5 times a power of ten, all inside
 * [min, max], about `count` intervals across the range.
 *
 * The values are rounded to the step's decimals so that 0.1 + 0.2 prints as 0.3.
 * An empty or non-finite range gives no ticks; a zero-width range gives its one value.
 *
 * @example
 * niceTicks(0, 100, 5);   // [0, 20, 40, 60, 80, 100]
 * niceTicks(-45, 85, 6);  // [-40, -20, 0, 20, 40, 60, 80]
 */
export function niceTicks(min: number, max: number, count: number): number[] {
  if (!Number.isFinite(min) || !Number.isFinite(max) || !(count >= 1)) return [];
  const low = Math.min(min, max);
  const high = Math.max(min, max);
  if (low === high) return [low];

  return ticksForStep(low, high, niceStep(high - low, count));
}

/**
 * The multiples of `step` inside [min, max], rounded to the step's decimals. Use it to give two
 * axes of an equal-aspect plot the same step.
 *
 * @example
 * ticksForStep(-45, 85, 50); // [0, 50]
 */
export function ticksForStep(min: number, max: number, step: number): number[] {
  if (!Number.isFinite(min) || !Number.isFinite(max) || !(step > 0)) return [];
  const low = Math.min(min, max);
  const high = Math.max(min, max);
  // Enough decimals to print the step exactly (a step of 0.25 needs two, of 20 none).
  const decimals = stepDecimals(step) + 1;
  const tolerance = step * 1e-9;
  const first = Math.ceil((low - tolerance) / step);
  const last = Math.floor((high + tolerance) / step);
  if (last - first > 10_000) return []; // a step far too small for the range

  const ticks: number[] = [];
  for (let k = first; k <= last; k++) {
    const value = Number((k * step).toFixed(decimals));
    ticks.push(value === 0 ? 0 : value); // no -0
  }
  return ticks;
}

/** Decimals needed to print multiples of a 1-2-5 step: 20 → 0, 0.5 → 1, 0.02 → 2. */
export function stepDecimals(step: number): number {
  return Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
}

/**
 * The round step (1, 2 or 5 × 10^k) nearest to `span / count` on a log scale, so the tick
 * count stays close to what was asked for (the thresholds are the geometric means √2, √10, √50).
 */
export function niceStep(span: number, count: number): number {
  const raw = span / Math.max(1, count);
  const magnitude = 10 ** Math.floor(Math.log10(raw));
  const fraction = raw / magnitude;
  const nice =
    fraction >= Math.sqrt(50) ? 10 : fraction >= Math.sqrt(10) ? 5 : fraction >= Math.SQRT2 ? 2 : 1;
  return nice * magnitude;
}
