import { foldHalfTurn } from './principalPlane';
import type { PlaneStrain } from './types';

/**
 * Normal strain along a line at `angleRad` counterclockwise from x (strain transformation;
 * e.g. Hibbeler, Mechanics of Materials, 8th ed., Sec. 10.3, from memory):
 *
 *   e(θ) = ex cos²θ + ey sin²θ + gxy sinθ cosθ
 *
 * @example normalStrainAt({ ex: 340e-6, ey: 110e-6, gxy: 180e-6 }, Math.PI / 6) // ≈ 360.44e-6
 * @public
 */
export function normalStrainAt(strain: PlaneStrain, angleRad: number): number {
  const c = Math.cos(angleRad);
  const s = Math.sin(angleRad);
  return strain.ex * c * c + strain.ey * s * s + strain.gxy * s * c;
}

/**
 * The plane strain state on axes turned counterclockwise by `angleRad` (same equations as the
 * stress transformation with txy replaced by gxy/2).
 * @public
 */
export function rotatePlaneStrain(strain: PlaneStrain, angleRad: number): PlaneStrain {
  const mean = (strain.ex + strain.ey) / 2;
  const half = (strain.ex - strain.ey) / 2;
  const c = Math.cos(2 * angleRad);
  const s = Math.sin(2 * angleRad);
  const ex = mean + half * c + (strain.gxy / 2) * s;
  return { ex, ey: strain.ex + strain.ey - ex, gxy: 2 * (-half * s + (strain.gxy / 2) * c) };
}

/** In-plane principal strains. @public */
export interface PrincipalPlaneStrains {
  readonly e1: number;
  readonly e2: number;
  /** Angle from x to the e1 direction, radians, in (-π/2, π/2]. */
  readonly thetaE: number;
  /** Maximum in-plane engineering shear strain, e1 - e2. */
  readonly gammaMaxInPlane: number;
}

/**
 * Principal strains: e1,2 = (ex + ey)/2 ± sqrt(((ex - ey)/2)² + (gxy/2)²), thetaE = ½ atan2(gxy, ex - ey).
 * @example principalPlaneStrains({ ex: 340e-6, ey: 110e-6, gxy: 180e-6 }).e1 // ≈ 371.03e-6
 * @public
 */
export function principalPlaneStrains(strain: PlaneStrain): PrincipalPlaneStrains {
  const mean = (strain.ex + strain.ey) / 2;
  const radius = Math.hypot((strain.ex - strain.ey) / 2, strain.gxy / 2);
  const thetaE = foldHalfTurn(Math.atan2(strain.gxy + 0, strain.ex - strain.ey) / 2);
  return { e1: mean + radius, e2: mean - radius, thetaE, gammaMaxInPlane: 2 * radius };
}
