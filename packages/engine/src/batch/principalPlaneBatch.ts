import type { StressColumns } from './columns';

/**
 * In-plane principal stresses of many plane states (plain-number kernel):
 * p1,2 = (sx + sy)/2 ± sqrt(((sx - sy)/2)² + txy²), and optionally thetaP = ½ atan2(2txy, sx - sy)
 * in (-π/2, π/2]. Same equations as `principalPlaneStresses`. Units: Pa, radians.
 *
 * @example
 *   const p1 = new Float64Array(n), p2 = new Float64Array(n);
 *   principalPlaneBatch({ sx, sy, txy }, p1, p2);
 * @public
 */
export function principalPlaneBatch(
  columns: Pick<StressColumns, 'sx' | 'sy' | 'txy'>,
  p1: Float64Array,
  p2: Float64Array,
  thetaP?: Float64Array,
): void {
  const { sx, sy, txy } = columns;
  const n = sx.length;
  for (let i = 0; i < n; i++) {
    const a = sx[i]!;
    const b = sy[i]!;
    const t = txy[i]!;
    const c = 0.5 * (a + b);
    const h = 0.5 * (a - b);
    // sqrt(h² + t²) instead of Math.hypot, which is several times slower; stresses never
    // come near the 1e154 where the squares would overflow.
    const r = Math.sqrt(h * h + t * t);
    p1[i] = c + r;
    p2[i] = c - r;
  }
  if (thetaP) {
    for (let i = 0; i < n; i++) {
      let angle = 0.5 * Math.atan2(txy[i]! + 0, 0.5 * (sx[i]! - sy[i]!));
      if (angle <= -Math.PI / 2) angle += Math.PI;
      thetaP[i] = angle;
    }
  }
}

/**
 * Von Mises stress of many plane states: sqrt(sx² - sx sy + sy² + 3 txy²). Units: Pa.
 * @public
 */
export function vonMisesPlaneBatch(columns: Pick<StressColumns, 'sx' | 'sy' | 'txy'>, out: Float64Array): void {
  const { sx, sy, txy } = columns;
  const n = sx.length;
  for (let i = 0; i < n; i++) {
    const a = sx[i]!;
    const b = sy[i]!;
    const t = txy[i]!;
    out[i] = Math.sqrt(a * a - a * b + b * b + 3 * t * t);
  }
}
