import type { PlaneStress } from './types';

/**
 * The plane stress state on axes x'y' turned counterclockwise by `angleRad` from xy
 * (stress transformation equations, e.g. Gere & Goodno, Mechanics of Materials, Sec. 7.2):
 *
 *   sx' = (sx + sy)/2 + (sx - sy)/2 cos 2θ + txy sin 2θ
 *   tx'y' = -(sx - sy)/2 sin 2θ + txy cos 2θ
 *   sy' = sx + sy - sx'
 *
 * Units: Pa in, Pa out; angle in radians, counterclockwise positive.
 *
 * @example rotatePlaneStress({ sx: 6500, sy: 1700, txy: 2750 }, Math.PI / 3)
 *   // ≈ { sx: 5281.6, sy: 2918.4, txy: -3453.5 }
 * @public
 */
export function rotatePlaneStress(state: PlaneStress, angleRad: number): PlaneStress {
  const { sx, sy, txy } = state;
  const mean = (sx + sy) / 2;
  const half = (sx - sy) / 2;
  const c = Math.cos(2 * angleRad);
  const s = Math.sin(2 * angleRad);
  const sxr = mean + half * c + txy * s;
  const syr = mean - half * c - txy * s;
  const txyr = -half * s + txy * c;
  return { sx: sxr, sy: syr, txy: txyr };
}
