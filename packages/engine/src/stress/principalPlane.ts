import type { PlaneStress } from './types';

/** In-plane principal stresses of a plane state. @public */
export interface PlanePrincipal {
  /** Larger in-plane principal stress, Pa. */
  readonly p1: number;
  /** Smaller in-plane principal stress, Pa (p1 >= p2). */
  readonly p2: number;
  /** Angle from x to the p1 direction, radians, in (-π/2, π/2]. */
  readonly thetaP: number;
  /** Maximum in-plane shear stress (radius of the in-plane Mohr circle), Pa, >= 0. */
  readonly tauMaxInPlane: number;
  /** Average normal stress (centre of the in-plane Mohr circle), Pa. */
  readonly center: number;
  /**
   * Angle from x to the face that carries +tauMaxInPlane (thetaP - 45°), radians, folded into
   * (-π/2, π/2] (a turn of 180° gives the same element).
   */
  readonly thetaS: number;
}

const HALF_PI = Math.PI / 2;

/**
 * Fold an angle into (-π/2, π/2]; a stress element repeats every 180°.
 * @public
 */
export function foldHalfTurn(angleRad: number): number {
  let a = angleRad % Math.PI;
  if (a <= -HALF_PI) a += Math.PI;
  else if (a > HALF_PI) a -= Math.PI;
  return a;
}

/**
 * Principal stresses, principal angle and maximum in-plane shear of a plane stress state
 * (e.g. Gere & Goodno, Mechanics of Materials, Sec. 7.3):
 *
 *   p1,2 = (sx + sy)/2 ± sqrt(((sx - sy)/2)² + txy²),   thetaP = ½ atan2(2 txy, sx - sy)
 *
 * atan2 picks the root of tan 2θ = 2txy/(sx - sy) that carries p1, so no second test is needed.
 * Units: Pa, radians.
 *
 * @example principalPlaneStresses({ sx: 50e6, sy: -10e6, txy: 40e6 })
 *   // p1 = 70e6, p2 = -30e6, thetaP ≈ 0.4636 rad (26.57°), tauMaxInPlane = 50e6
 * @public
 */
export function principalPlaneStresses(state: PlaneStress): PlanePrincipal {
  const { sx, sy } = state;
  // Adding 0 turns -0 into +0, so a negative zero shear cannot flip atan2 to -π.
  const txy = state.txy + 0;
  const center = (sx + sy) / 2;
  const half = (sx - sy) / 2;
  const radius = Math.hypot(half, txy);
  let thetaP = Math.atan2(txy, half) / 2;
  if (thetaP <= -HALF_PI) thetaP += Math.PI;
  return {
    p1: center + radius,
    p2: center - radius,
    thetaP,
    tauMaxInPlane: radius,
    center,
    thetaS: foldHalfTurn(thetaP - Math.PI / 4),
  };
}
