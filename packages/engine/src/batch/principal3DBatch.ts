import { principalStresses } from '../stress/principalStresses';
import { vonMisesStress } from '../stress/vonMises';
import type { PrincipalColumns, StressColumns } from './columns';

const SQRT3 = Math.sqrt(3);

// cos(acos(r) / 3) without acos and cos. With s = sqrt((1 + r)/2), x = cos(π/3 - ⅔ asin s) is
// analytic on s ∈ [0, 1]; a degree-10 least-squares Chebyshev fit in t = 2s - 1 (power form below,
// max error 7e-11, fitted with numpy.polynomial.chebyshev) gives a start that one Newton step on
// the triple-angle identity 4x³ - 3x = r (x = cos φ, r = cos 3φ) refines to rounding. About twice
// as fast as Math.acos + Math.cos here; as accurate within the |r| < 1 - 1e-8 the loop allows.
const C0 = 0.7660444431277579;
const C1 = 0.24740906696471762;
const C2 = -0.015509189063454259;
const C3 = 0.002466340112005721;
const C4 = -0.0005041174596463012;
const C5 = 0.0001164954858528442;
const C6 = -2.895026997668543e-05;
const C7 = 7.385094439484332e-06;
const C8 = -1.9789942830973005e-06;
const C9 = 7.122818387451724e-07;
const C10 = -2.0733122868813663e-07;

/** cos(acos(r) / 3) for -1 < r < 1 (see the constants above). */
function cosThirdAcos(r: number): number {
  const t = 2 * Math.sqrt(0.5 * (1 + r)) - 1;
  let x = C10;
  x = x * t + C9;
  x = x * t + C8;
  x = x * t + C7;
  x = x * t + C6;
  x = x * t + C5;
  x = x * t + C4;
  x = x * t + C3;
  x = x * t + C2;
  x = x * t + C1;
  x = x * t + C0;
  return x - (4 * x * x * x - 3 * x - r) / (12 * x * x - 3);
}
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
 * s2 = 3q - s1 - s3. cos φ comes from a polynomial start and a Newton step (no acos, no cos), and
 * cos(φ + 2π/3) = -½ cos φ - (√3/2) sin φ from it. Rows at or
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
 * stress, or, when `yieldStrength` > 0, the von Mises factor Sy / σ' (Infinity where σ' = 0).
 * σ' equals 3p (J2 = 3p²), but it is computed from the differences of the components instead:
 * for a nearly hydrostatic state with a large mean stress, a - q loses the digits that the
 * differences a - b keep.
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
    const cosPhi = cosThirdAcos(r);
    const sinPhi = Math.sqrt(1 - cosPhi * cosPhi);
    const s1 = q + 2 * p * cosPhi;
    const s3 = q - p * (cosPhi + SQRT3 * sinPhi);
    o1[i] = s1;
    o2[i] = 3 * q - s1 - s3;
    o3[i] = s3;
    if (extra) {
      const vm = Math.sqrt(0.5 * ((a - b) * (a - b) + (b - c) * (b - c) + (c - a) * (c - a)) + 3 * (d * d + e * e + f * f));
      extra[i] = factor ? yieldStrength / vm : vm;
    }
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
