import type { PlaneStrain, PlaneStress } from './types';

/**
 * Shear modulus of an isotropic material, G = E / (2 (1 + nu)). Units: Pa.
 * @example shearModulus(200e9, 0.3) // 76.92e9
 * @public
 */
export function shearModulus(E: number, nu: number): number {
  return E / (2 * (1 + nu));
}

/**
 * Plane-stress Hooke's law for an isotropic material (e.g. Gere & Goodno, Mechanics of
 * Materials, Sec. 7.5, from memory):
 *
 *   sx = E/(1 - nu²) (ex + nu ey),  sy = E/(1 - nu²) (ey + nu ex),  txy = G gxy
 *
 * Units: E in Pa, strains dimensionless (gxy engineering shear strain), stresses in Pa.
 * Callers check E > 0 and -1 < nu < 0.5.
 *
 * @example planeStressFromStrain({ ex: 770e-6, ey: -350e-6, gxy: 1940e-6 }, 70e9, 0.33).txy // ≈ 51.05e6
 * @public
 */
export function planeStressFromStrain(strain: PlaneStrain, E: number, nu: number): PlaneStress {
  const k = E / (1 - nu * nu);
  return {
    sx: k * (strain.ex + nu * strain.ey),
    sy: k * (strain.ey + nu * strain.ex),
    txy: shearModulus(E, nu) * strain.gxy,
  };
}

/** In-plane strains of a plane stress state, with the out-of-plane normal strain `ez`. @public */
export interface PlaneStressStrains extends PlaneStrain {
  /** ez = -nu (sx + sy) / E. */
  readonly ez: number;
}

/**
 * The inverse of {@link planeStressFromStrain}: ex = (sx - nu sy)/E, ey = (sy - nu sx)/E,
 * gxy = txy / G, ez = -nu (sx + sy)/E. Units: Pa in, dimensionless out.
 * @public
 */
export function strainFromPlaneStress(state: PlaneStress, E: number, nu: number): PlaneStressStrains {
  return {
    ex: (state.sx - nu * state.sy) / E,
    ey: (state.sy - nu * state.sx) / E,
    gxy: state.txy / shearModulus(E, nu),
    ez: (-nu * (state.sx + state.sy)) / E,
  };
}
