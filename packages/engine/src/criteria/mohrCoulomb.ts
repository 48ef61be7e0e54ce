import { mohrHexagon } from './outlines';
import type { FailureTheory, MohrSegment, Strength, StrengthKey, TheoryAssessment } from './types';

/**
 * The strength-reduction factor F of a Mohr circle against the envelope τ = c + σ tanφ
 * (compression positive): the F for which c/F and tanφ/F make the envelope touch the circle
 * (the definition of Griffiths & Lane, "Slope stability analysis by finite elements",
 * Géotechnique 49(3), 1999, from memory). With the circle's compressive centre s and radius R the
 * touching condition (c + s tanφ)/sqrt(F² + tan²φ) = R gives
 *
 *   F = sqrt(((c + s tanφ) / R)² - tan²φ)
 *
 * The apex of the envelope, σ = -c / tanφ, does not move as F changes; a circle reaching past it
 * into tension fails for every F, and F = 0 is returned.
 * @public
 */
export function strengthReductionFactor(center: number, radius: number, c: number, phi: number): number {
  const tanPhi = Math.tan(phi);
  const capacity = c + center * tanPhi;
  if (radius === 0) return capacity > 0 ? Infinity : 0;
  const x = capacity / radius;
  if (!(x > tanPhi)) return 0;
  return Math.sqrt(x * x - tanPhi * tanPhi);
}

/**
 * Mohr-Coulomb theory for soil and rock with cohesion c and friction angle phi (Das, Principles
 * of Geotechnical Engineering, 7th ed., Ch. 11: τf = c + σ tanφ, and σ1 = σ3 tan²(45° + φ/2) +
 * 2c tan(45° + φ/2) at failure, compression positive there; from memory).
 *
 * The engine keeps tension positive: give compressive (effective) stresses as negative numbers.
 * With s1 >= s3 the outer Mohr circle has compressive centre s = -(s1 + s3)/2 and radius
 * R = (s1 - s3)/2. Three factors are computed:
 *
 * - `factor` — the **strength-reduction factor** F: c and tanφ divided by F until the envelope
 *   touches the circle, F = sqrt(((c + s tanφ)/R)² - tan²φ) (see {@link strengthReductionFactor});
 * - `radiusRatio` — the circle-radius ratio (c cosφ + s sinφ)/R: the radius of the circle with
 *   the same centre that touches the envelope, over R (0 when the centre lies past the apex);
 * - `loadFactor` — the factor n on proportional loading (the whole tensor times n):
 *   n = c cosφ / (R - s sinφ), Infinity when R <= s sinφ. It equals the Coulomb-Mohr factor with
 *   St = 2c cosφ/(1 + sinφ) and Sc = 2c cosφ/(1 - sinφ).
 *
 * Also `planeAngle` (45° + φ/2, the angle of the critical plane from the major compressive
 * principal plane, radians) and `planeNormal`, `planeShear`: the stress on that plane, the point
 * of the circle nearest the envelope (Pa, tension positive). There is no equivalent stress.
 * Envelope: the Coulomb-Mohr hexagon with St and Sc above (plane stress, c > 0 only) and both
 * branches of the straight envelope in Mohr's plane.
 *
 * @example mohrCoulombTheory.assess([-100e3, -100e3, -250e3], { c: 20e3, phi: Math.PI / 6 }).extra.radiusRatio // ≈ 1.3976
 * @public
 */
export const mohrCoulombTheory: FailureTheory = {
  id: 'mohr-coulomb',
  label: 'Mohr-Coulomb (cohesion and friction)',
  needs: ['c', 'phi'],
  validate(strength: Strength): { key: StrengthKey; message: string } | null {
    const { c, phi } = strength;
    if (c === undefined) return { key: 'c', message: 'is missing' };
    if (phi === undefined) return { key: 'phi', message: 'is missing' };
    if (!Number.isFinite(c) || c < 0) return { key: 'c', message: 'must be zero or positive' };
    if (!Number.isFinite(phi) || phi < 0 || phi >= Math.PI / 2) {
      return { key: 'phi', message: 'must be at least 0° and less than 90°' };
    }
    if (c === 0 && phi === 0) return { key: 'c', message: 'c and phi cannot both be zero (no strength)' };
    return null;
  },
  assess([s1, s2, s3], strength): TheoryAssessment {
    const c = strength.c!;
    const phi = strength.phi!;
    const center = -(s1 + s3) / 2;
    const radius = (s1 - s3) / 2;
    const sin = Math.sin(phi);
    const cos = Math.cos(phi);
    const reach = c * cos + center * sin;
    const radiusRatio = radius > 0 ? Math.max(0, reach) / radius : reach > 0 ? Infinity : 0;
    const demand = radius - center * sin;
    const loadFactor = demand > 0 ? (c * cos) / demand : Infinity;
    return {
      equivalent: null,
      factor: mohrCoulombTheory.factorKernel(strength)(s1, s2, s3),
      extra: {
        radiusRatio,
        loadFactor,
        planeAngle: Math.PI / 4 + phi / 2,
        planeNormal: -center + radius * sin,
        planeShear: radius * cos,
      },
    };
  },
  factorKernel(strength) {
    const c = strength.c!;
    const phi = strength.phi!;
    return (s1, _s2, s3) => strengthReductionFactor(-(s1 + s3) / 2, (s1 - s3) / 2, c, phi);
  },
  envelope(strength, options) {
    const c = strength.c!;
    const phi = strength.phi!;
    const sin = Math.sin(phi);
    const cos = Math.cos(phi);
    const tan = Math.tan(phi);
    const st = (2 * c * cos) / (1 + sin);
    const sc = (2 * c * cos) / (1 - sin);
    const extent = options?.extent ?? Math.max(4 * sc, 1);
    // Apex on the tension side: σ = c / tanφ (tension positive); with φ = 0 the lines are flat.
    const apex = tan > 0 ? c / tan : 0;
    const far = -extent;
    const tauAt = (sigma: number) => (tan > 0 ? c - sigma * tan : c);
    const upper: MohrSegment = { from: { sigma: apex, tau: tauAt(apex) }, to: { sigma: far, tau: tauAt(far) } };
    const lower: MohrSegment = {
      from: { sigma: upper.from.sigma, tau: -upper.from.tau },
      to: { sigma: upper.to.sigma, tau: -upper.to.tau },
    };
    return {
      theory: 'mohr-coulomb',
      principalPlane: c > 0 ? [mohrHexagon(st, sc)] : [],
      mohrPlane: [upper, lower],
      note:
        c > 0
          ? 'principal-plane outline: plane stress (out-of-plane stress zero) with St = 2c cosφ/(1+sinφ), Sc = 2c cosφ/(1-sinφ)'
          : 'without cohesion no plane stress state is safe; see the Mohr-plane envelope',
    };
  },
};
