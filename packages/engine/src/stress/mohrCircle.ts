import { principalPlaneStresses } from './principalPlane';
import { principalStresses } from './principalStresses';
import { rotatePlaneStress } from './rotatePlaneStress';
import type { PlaneStress, StressTensor } from './types';

/**
 * A point of Mohr's plane: `sigma` is the normal stress and `tau` the shear stress tx'y' of the
 * face whose normal x' is at some angle θ from x (Pa). With this choice the x face is at
 * (sx, txy) and the y face at (sy, -txy), and turning the element by +θ (counterclockwise) turns
 * the point by 2θ clockwise when tau is drawn upward. A plot that draws shear "clockwise up" (a
 * common convention in the trade) flips the tau axis; the numbers never change with it.
 * @public
 */
export interface MohrPoint {
  readonly sigma: number;
  readonly tau: number;
}

/** Geometry of the in-plane Mohr circle of a plane state, ready to plot. @public */
export interface PlaneMohrCircle {
  /** Centre on the sigma axis, (sx + sy) / 2, Pa. */
  readonly center: number;
  /** Radius = maximum in-plane shear, Pa. */
  readonly radius: number;
  /** Point of the x face, (sx, txy). */
  readonly xFace: MohrPoint;
  /** Point of the y face, (sy, -txy). */
  readonly yFace: MohrPoint;
  /** Principal points (p1, 0) and (p2, 0) and the angle from x to p1, radians. */
  readonly principal: { readonly p1: MohrPoint; readonly p2: MohrPoint; readonly thetaP: number };
  /**
   * Maximum-shear points: `positive` (center, +radius) is the face at `thetaS` (= thetaP - 45°,
   * folded into (-90°, 90°]); `negative` (center, -radius) the face at thetaS + 90°.
   */
  readonly maxShear: { readonly positive: MohrPoint; readonly negative: MohrPoint; readonly thetaS: number };
  /** The rotated face pair x', y' when an angle was given. */
  readonly rotated?: { readonly angleRad: number; readonly xFace: MohrPoint; readonly yFace: MohrPoint };
}

/** One of the three circles of a 3D state, through principal stresses `i` and `j`. @public */
export interface MohrCircle3DPart {
  readonly center: number;
  readonly radius: number;
  /** Which principal stresses bound it: [1, 2], [2, 3] or [1, 3]. */
  readonly between: readonly [1 | 2 | 3, 1 | 2 | 3];
}

/** The three Mohr circles of a 3D state (the outer one is 1-3). @public */
export interface Mohr3D {
  /** `[s1, s2, s3]`, Pa. */
  readonly principal: readonly [number, number, number];
  /** Circles 1-2, 2-3 and 1-3, in this order. */
  readonly circles: readonly [MohrCircle3DPart, MohrCircle3DPart, MohrCircle3DPart];
}

/**
 * Mohr's circle of a plane stress state with the x- and y-face points, the principal and
 * maximum-shear points and, when `angleRad` is given, the face pair of the element rotated by it.
 * Units: Pa, radians (counterclockwise).
 *
 * @example planeMohrCircle({ sx: 50e6, sy: -10e6, txy: 40e6 }).radius // 50e6
 * @public
 */
export function planeMohrCircle(state: PlaneStress, angleRad?: number): PlaneMohrCircle {
  const p = principalPlaneStresses(state);
  const base = {
    center: p.center,
    radius: p.tauMaxInPlane,
    xFace: { sigma: state.sx, tau: state.txy },
    yFace: { sigma: state.sy, tau: -state.txy },
    principal: { p1: { sigma: p.p1, tau: 0 }, p2: { sigma: p.p2, tau: 0 }, thetaP: p.thetaP },
    maxShear: {
      positive: { sigma: p.center, tau: p.tauMaxInPlane },
      negative: { sigma: p.center, tau: -p.tauMaxInPlane },
      thetaS: p.thetaS,
    },
  };
  if (angleRad === undefined) return base;
  const r = rotatePlaneStress(state, angleRad);
  return {
    ...base,
    rotated: { angleRad, xFace: { sigma: r.sx, tau: r.txy }, yFace: { sigma: r.sy, tau: -r.txy } },
  };
}

/**
 * The three Mohr circles of a stress tensor, from its sorted principal stresses. For a plane
 * state the out-of-plane principal stress 0 takes its place in the order, so the outer circle
 * may pass through the origin. Units: Pa.
 *
 * @example mohrCircles3D({ sx: 80e6, sy: 30e6, sz: 0, txy: 0, tyz: 0, tzx: 0 }).circles[2].radius // 40e6
 * @public
 */
export function mohrCircles3D(t: StressTensor): Mohr3D {
  const [s1, s2, s3] = principalStresses(t).values;
  const circle = (a: number, b: number, between: readonly [1 | 2 | 3, 1 | 2 | 3]): MohrCircle3DPart => ({
    center: (a + b) / 2,
    radius: (a - b) / 2,
    between,
  });
  return {
    principal: [s1, s2, s3],
    circles: [circle(s1, s2, [1, 2]), circle(s2, s3, [2, 3]), circle(s1, s3, [1, 3])],
  };
}
