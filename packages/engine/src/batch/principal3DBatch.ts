import { principalStresses } from '../stress/principalStresses';
import { vonMisesStress } from '../stress/vonMises';
import type { PrincipalColumns, StressColumns } from './columns';

const SQRT3 = Math.sqrt(3);
/**
 * Rows whose cubic is this close to a double root (|det B / 2| > 1 - NEAR_DOUBLE) go to the
 * robust solver: there acos amplifies rounding by 1/sqrt(1 - r²), and the two close roots would
 * lose up to half their digits. Such rows are rare in real data, so the fallback costs nothing
 * on average.
 */
const NEAR_DOUBLE = 1e-8;

/**
 * Principal stresses of many 3D states, sorted s1 >= s2 >= s3 (plain-number kernel).
 *
 * Per row, the trigonometric (Viète) solution of the characteristic cubic of a symmetric 3x3
 * matrix (Smith, Comm. ACM 4(4), 1961): q = I1/3, p = sqrt(tr((A - qI)²)/6),
 * r = det((A - qI)/p)/2, s1 = q + 2p cos φ, s3 = q + 2p cos(φ + 2π/3) with φ = acos(r)/3, and
 * s2 = 3q - s1 - s3. cos(φ + 2π/3) = -½ cos φ - (√3/2) sin φ saves a second cosine. Rows at or
 * near a repeated root (|r| > 1 - 1e-8), and rows whose squares would overflow, take the robust
 * solver `principalStresses` after the loop, so every row is accurate to about 1e-12 of its
 * largest principal stress. Plane columns (no sz, tyz, tzx) are 3D states with those zero.
 * Units: Pa.
 *
 * @example principal3DBatch({ sx, sy, txy, sz, tyz, tzx }, allocatePrincipal(sx.length))
 * @public
 */
export function principal3DBatch(columns: StressColumns, out: PrincipalColumns): void {
  principal3DLoop(columns, out, null, 0);
}

/**
 * The loop behind {@link principal3DBatch}. With `extra`, it also writes per row the von Mises
 * stress — which is 3p, since J2 = 3p² and σ' = sqrt(3 J2) — or, when `yieldStrength` > 0, the
 * von Mises factor Sy / σ' (Infinity where σ' = 0), at no extra cost.
 */
export function principal3DLoop(columns: StressColumns, out: PrincipalColumns, extra: Float64Array | null, yieldStrength: number): void {
  const { sx, sy, txy } = columns;
  const n = sx.length;
  const zero = columns.sz ? null : new Float64Array(n);
  const sz = columns.sz ?? zero!;
  const tyz = columns.tyz ?? zero!;
  const tzx = columns.tzx ?? zero!;
  const o1 = out.s1;
  const o2 = out.s2;
  const o3 = out.s3;
  const factor = yieldStrength > 0;
  const hard: number[] = [];
  for (let i = 0; i < n; i++) {
    const a = sx[i]!;
    const b = sy[i]!;
    const c = sz[i]!;
    const d = txy[i]!;
    const e = tyz[i]!;
    const f = tzx[i]!;
    const q = (a + b + c) / 3;
    const b00 = a - q;
    const b11 = b - q;
    const b22 = c - q;
    const p2 = (b00 * b00 + b11 * b11 + b22 * b22 + 2 * (d * d + e * e + f * f)) / 6;
    if (p2 === 0) {
      o1[i] = q;
      o2[i] = q;
      o3[i] = q;
      if (extra) extra[i] = factor ? Infinity : 0;
      continue;
    }
    const p = Math.sqrt(p2);
    const r = (b00 * (b11 * b22 - e * e) - d * (d * b22 - e * f) + f * (d * e - b11 * f)) / (2 * p2 * p);
    if (!(r > -1 + NEAR_DOUBLE && r < 1 - NEAR_DOUBLE)) {
      hard.push(i);
      continue;
    }
    const cosPhi = Math.cos(Math.acos(r) / 3);
    const sinPhi = Math.sqrt(1 - cosPhi * cosPhi);
    const s1 = q + 2 * p * cosPhi;
    const s3 = q - p * (cosPhi + SQRT3 * sinPhi);
    o1[i] = s1;
    o2[i] = 3 * q - s1 - s3;
    o3[i] = s3;
    if (extra) extra[i] = factor ? yieldStrength / (3 * p) : 3 * p;
  }
  for (const i of hard) {
    const t = { sx: sx[i]!, sy: sy[i]!, sz: sz[i]!, txy: txy[i]!, tyz: tyz[i]!, tzx: tzx[i]! };
    const v = principalStresses(t).values;
    o1[i] = v[0];
    o2[i] = v[1];
    o3[i] = v[2];
    if (extra) {
      const vm = vonMisesStress(t);
      extra[i] = factor ? (vm > 0 ? yieldStrength / vm : Infinity) : vm;
    }
  }
}
