/**
 * Tresca equivalent stress (stress intensity): the largest difference of principal stresses,
 * s_max - s_min = 2 τ_max (maximum-shear-stress theory; Shigley's Mechanical Engineering Design,
 * 9th ed., Sec. 5-4, from memory). For a plane state pass all three principal stresses, the
 * out-of-plane 0 included: with both in-plane stresses of one sign the 0 governs.
 *
 * Units: Pa. Callers may pass the principal stresses in any order.
 *
 * @example trescaStress(80e6, 30e6, 0) // 80e6 (the out-of-plane zero governs)
 * @public
 */
export function trescaStress(a: number, b: number, c: number): number {
  return Math.max(a, b, c) - Math.min(a, b, c);
}

/**
 * Absolute maximum shear stress, (s_max - s_min) / 2, Pa; same rules as {@link trescaStress}.
 * @example absoluteMaxShear(80e6, 30e6, 0) // 40e6
 * @public
 */
export function absoluteMaxShear(a: number, b: number, c: number): number {
  return trescaStress(a, b, c) / 2;
}
