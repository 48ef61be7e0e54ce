import type { StressTensor } from './types';

/** The three stress invariants. @public */
export interface StressInvariants {
  /** I1 = sx + sy + sz, Pa. */
  readonly I1: number;
  /** I2 = sx sy + sy sz + sz sx - txy² - tyz² - tzx², Pa². */
  readonly I2: number;
  /** I3 = det(σ), Pa³. */
  readonly I3: number;
}

/**
 * Invariants of the stress tensor, with the signs that make the principal stresses the roots of
 * s³ - I1 s² + I2 s - I3 = 0 (e.g. Shigley's Mechanical Engineering Design, 9th ed., Eq. 3-15,
 * from memory).
 *
 * @example stressInvariants({ sx: 3, sy: 0, sz: 0, txy: 1, tyz: 2, tzx: 1 }) // { I1: 3, I2: -6, I3: -8 }
 * @public
 */
export function stressInvariants(t: StressTensor): StressInvariants {
  const { sx, sy, sz, txy, tyz, tzx } = t;
  return {
    I1: sx + sy + sz,
    I2: sx * sy + sy * sz + sz * sx - txy * txy - tyz * tyz - tzx * tzx,
    I3: sx * sy * sz + 2 * txy * tyz * tzx - sx * tyz * tyz - sy * tzx * tzx - sz * txy * txy,
  };
}
