import { mohrOf, type CellResult } from '@sheaf/engine';
import type { RotatedPlaneState } from '../figures/mohrCircleLayout';

/** What to draw for a result that holds a stress state. Pa and radians, sheet sign convention. */
export type MohrFigureData =
  | { kind: 'plane'; sx: number; sy: number; txy: number; rotated?: RotatedPlaneState; s1: number; s2: number; s3: number }
  | { kind: 'three'; s1: number; s2: number; s3: number };

/**
 * The Mohr's-circle figure of a stress, rosette, rotate or principal result, from the engine's
 * `mohrOf`: a plane state (z a principal direction with σz = 0) as its in-plane circle — for a
 * rotate cell with the original face points and the rotated pair — and any other state as its
 * three circles. Null for failed cells and kinds without a state.
 */
export function mohrFigureOf(result: CellResult | undefined): MohrFigureData | null {
  const plot = mohrOf(result);
  if (!plot || !result?.ok || !result.state) return null;
  const [s1, s2, s3] = plot.circles.principal;
  const base = result.rotation?.from ?? result.state;
  if (plot.plane && base.sz === 0) {
    const rotated = plot.plane.rotated;
    return {
      kind: 'plane',
      sx: plot.plane.xFace.sigma,
      sy: plot.plane.yFace.sigma,
      txy: plot.plane.xFace.tau,
      ...(rotated
        ? {
            rotated: {
              angleRad: rotated.angleRad,
              sxr: rotated.xFace.sigma,
              syr: rotated.yFace.sigma,
              txyr: rotated.xFace.tau,
            },
          }
        : {}),
      s1,
      s2,
      s3,
    };
  }
  return { kind: 'three', s1, s2, s3 };
}

/**
 * An angle for a rotate cell's `angle` field from a dragged diameter, e.g. "32.5 deg": to the
 * nearest half degree, which is as fine as a drag can be meant.
 */
export function angleText(angleRad: number): string {
  const degrees = Math.round(((angleRad * 180) / Math.PI) * 2) / 2;
  return `${Object.is(degrees, -0) ? 0 : degrees} deg`;
}
