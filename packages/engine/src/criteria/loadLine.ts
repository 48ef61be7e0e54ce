import { principalPlaneStresses } from '../stress/principalPlane';
import type { StressTensor } from '../stress/types';
import type { PrincipalPoint } from './types';

/**
 * The proportional load line of a plane state in the principal-stress plane: from the origin
 * through the state's point (p1, p2) to where it meets the envelope, at factor × the point.
 * @public
 */
export interface LoadLine {
  /** The state's in-plane principal stresses (p1, p2), Pa. */
  readonly point: PrincipalPoint;
  /** The point on the envelope, factor × point; null when the factor is infinite. */
  readonly onEnvelope: PrincipalPoint | null;
  readonly factor: number;
}

/**
 * Load line of a state for the sA–sB plot, or null when the state is not a plane state in x-y
 * (the 2D plot has no place for it). Units: Pa.
 * @example planeLoadLine({ sx: 80e6, sy: -40e6, sz: 0, txy: 25e6, tyz: 0, tzx: 0 }, 2)
 *   // { point: { sA: 85e6, sB: -45e6 }, onEnvelope: { sA: 170e6, sB: -90e6 }, factor: 2 }
 * @public
 */
export function planeLoadLine(state: StressTensor, factor: number): LoadLine | null {
  if (state.sz !== 0 || state.tyz !== 0 || state.tzx !== 0) return null;
  const p = principalPlaneStresses(state);
  const point = { sA: p.p1, sB: p.p2 };
  const onEnvelope = Number.isFinite(factor) ? { sA: factor * p.p1, sB: factor * p.p2 } : null;
  return { point, onEnvelope, factor };
}
