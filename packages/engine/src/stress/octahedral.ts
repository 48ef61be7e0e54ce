/** Normal and shear stress on the octahedral planes. @public */
export interface OctahedralStresses {
  /** σ_oct = (s1 + s2 + s3) / 3 = I1 / 3, Pa. */
  readonly normal: number;
  /** τ_oct = ⅓ sqrt((s1 - s2)² + (s2 - s3)² + (s3 - s1)²) = (√2 / 3) σ_vM, Pa. */
  readonly shear: number;
}

/**
 * Octahedral normal and shear stresses from the principal stresses (e.g. Shigley's Mechanical
 * Engineering Design, 9th ed., Eqs. 5-16 and 5-17, from memory). Units: Pa; order free.
 *
 * @example octahedralStresses(3, 0, 0) // { normal: 1, shear: √2 }
 * @public
 */
export function octahedralStresses(s1: number, s2: number, s3: number): OctahedralStresses {
  const a = s1 - s2;
  const b = s2 - s3;
  const c = s3 - s1;
  return { normal: (s1 + s2 + s3) / 3, shear: Math.sqrt(a * a + b * b + c * c) / 3 };
}
