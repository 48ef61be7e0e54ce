import type { StressTensor } from './types';

/**
 * Von Mises equivalent stress from the tensor components (distortion-energy theory; Shigley's
 * Mechanical Engineering Design, 9th ed., Eq. 5-14, equation number from memory):
 *
 *   σ' = sqrt(½[(sx - sy)² + (sy - sz)² + (sz - sx)² + 6(txy² + tyz² + tzx²)])
 *
 * Units: Pa. Works for plane states (sz = tyz = tzx = 0) too.
 *
 * @example vonMisesStress({ sx: 200e6, sy: 0, sz: 0, txy: 0, tyz: 0, tzx: 0 }) // 200e6
 * @public
 */
export function vonMisesStress(t: StressTensor): number {
  const dxy = t.sx - t.sy;
  const dyz = t.sy - t.sz;
  const dzx = t.sz - t.sx;
  const shear = t.txy * t.txy + t.tyz * t.tyz + t.tzx * t.tzx;
  return Math.sqrt(0.5 * (dxy * dxy + dyz * dyz + dzx * dzx) + 3 * shear);
}

/**
 * Von Mises equivalent stress from the three principal stresses (Shigley 9th ed., Eq. 5-12,
 * from memory): σ' = sqrt(½[(s1 - s2)² + (s2 - s3)² + (s3 - s1)²]). Units: Pa; order free.
 * @public
 */
export function vonMisesFromPrincipal(s1: number, s2: number, s3: number): number {
  const a = s1 - s2;
  const b = s2 - s3;
  const c = s3 - s1;
  return Math.sqrt(0.5 * (a * a + b * b + c * c));
}
