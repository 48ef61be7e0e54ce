import { principalPlaneStresses } from './principalPlane';
import type { PrincipalTriple, StressTensor, Vector3 } from './types';

/** The three principal stresses of a tensor with their directions. @public */
export interface PrincipalStresses {
  /** `[s1, s2, s3]`, Pa, sorted s1 >= s2 >= s3. */
  readonly values: PrincipalTriple;
  /**
   * Unit vectors of the principal directions, in the order of `values`. Each of the first two
   * points so that its largest component is positive; the third is their cross product, so the
   * three form a right-handed frame. Where roots repeat, any orthonormal basis of the repeated
   * eigenspace is a valid answer; this one is deterministic.
   */
  readonly directions: readonly [Vector3, Vector3, Vector3];
}

type Mutable3 = [number, number, number];

const cross = (a: Vector3, b: Vector3): Mutable3 => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];
const dot = (a: Vector3, b: Vector3): number => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const scale = (a: Vector3, k: number): Mutable3 => [a[0] * k, a[1] * k, a[2] * k];

/** Symmetric 3x3 matrix as its six distinct entries. */
interface Sym3 {
  a00: number;
  a01: number;
  a02: number;
  a11: number;
  a12: number;
  a22: number;
}

/**
 * Eigenvector of `m` for the eigenvalue `value`, from the best-conditioned cross product of two
 * rows of m - value·I. The rows are scaled by their largest entry first so the cross products
 * cannot underflow; a rank-one m - value·I (a repeated root) leaves a plane of eigenvectors, and
 * a zero one (a triple root) all of space.
 */
function eigenvectorFromRows(m: Sym3, value: number): Mutable3 {
  const raw = [m.a00 - value, m.a01, m.a02, m.a01, m.a11 - value, m.a12, m.a02, m.a12, m.a22 - value];
  const size = Math.max(...raw.map(Math.abs));
  if (size === 0) return [1, 0, 0];
  const e = raw.map((v) => v / size);
  const rows: Vector3[] = [
    [e[0]!, e[1]!, e[2]!],
    [e[3]!, e[4]!, e[5]!],
    [e[6]!, e[7]!, e[8]!],
  ];
  const candidates = [cross(rows[0]!, rows[1]!), cross(rows[0]!, rows[2]!), cross(rows[1]!, rows[2]!)];
  let best = candidates[0]!;
  let bestNorm = dot(best, best);
  for (const c of candidates.slice(1)) {
    const n = dot(c, c);
    if (n > bestNorm) {
      best = c;
      bestNorm = n;
    }
  }
  if (bestNorm > 0) return scale(best, 1 / Math.sqrt(bestNorm));
  const row = rows.reduce((a, b) => (dot(b, b) > dot(a, a) ? b : a));
  return orthogonalComplement(scale(row, 1 / Math.sqrt(dot(row, row))))[0];
}

/** Two unit vectors U, V that complete the unit vector W to an orthonormal frame. */
function orthogonalComplement(w: Vector3): [Mutable3, Mutable3] {
  let u: Mutable3;
  if (Math.abs(w[0]) > Math.abs(w[1])) {
    const inv = 1 / Math.sqrt(w[0] * w[0] + w[2] * w[2]);
    u = [-w[2] * inv, 0, w[0] * inv];
  } else {
    const inv = 1 / Math.sqrt(w[1] * w[1] + w[2] * w[2]);
    u = [0, w[2] * inv, -w[1] * inv];
  }
  return [u, cross(w, u)];
}

const times = (m: Sym3, v: Vector3): Mutable3 => [
  m.a00 * v[0] + m.a01 * v[1] + m.a02 * v[2],
  m.a01 * v[0] + m.a11 * v[1] + m.a12 * v[2],
  m.a02 * v[0] + m.a12 * v[1] + m.a22 * v[2],
];

/**
 * The two eigenpairs orthogonal to the known eigenvector `known`: project the matrix onto the
 * plane orthogonal to it and solve that 2x2 problem in closed form (centre ± radius, half the
 * atan2 angle), which stays accurate to rounding of the largest entry even when the two roots
 * nearly coincide — where the trigonometric cubic formula alone loses half its digits.
 */
function complementPairs(m: Sym3, known: Vector3): [Pair, Pair] {
  const [u, v] = orthogonalComplement(known);
  const au = times(m, u);
  const av = times(m, v);
  const m00 = dot(u, au);
  const m01 = dot(u, av);
  const m11 = dot(v, av);
  const center = (m00 + m11) / 2;
  const half = (m00 - m11) / 2;
  const radius = Math.hypot(half, m01);
  const angle = Math.atan2(m01, half) / 2;
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  const first: Vector3 = [c * u[0] + s * v[0], c * u[1] + s * v[1], c * u[2] + s * v[2]];
  const second: Vector3 = [-s * u[0] + c * v[0], -s * u[1] + c * v[1], -s * u[2] + c * v[2]];
  return [
    { value: center + radius, vector: first },
    { value: center - radius, vector: second },
  ];
}

/** Flip a vector so that its largest component (first one on ties) is positive. */
function canonicalSign(v: Vector3): Mutable3 {
  let k: 0 | 1 | 2 = 0;
  if (Math.abs(v[1]) > Math.abs(v[k])) k = 1;
  if (Math.abs(v[2]) > Math.abs(v[k])) k = 2;
  return v[k] < 0 ? [-v[0] + 0, -v[1] + 0, -v[2] + 0] : [v[0] + 0, v[1] + 0, v[2] + 0];
}

interface Pair {
  value: number;
  vector: Vector3;
}

function sortedResult(pairs: Pair[]): PrincipalStresses {
  pairs.sort((a, b) => b.value - a.value);
  const d1 = canonicalSign(pairs[0]!.vector);
  const d2 = canonicalSign(pairs[1]!.vector);
  const d3 = cross(d1, d2).map((v) => v + 0) as Mutable3;
  return { values: [pairs[0]!.value, pairs[1]!.value, pairs[2]!.value], directions: [d1, d2, d3] };
}

/** Tensor with z principal (tyz = tzx = 0): the in-plane pair in closed form, sz exactly. */
function withPrincipalZ(t: StressTensor): PrincipalStresses {
  if (t.txy === 0) {
    return sortedResult([
      { value: t.sx, vector: [1, 0, 0] },
      { value: t.sy, vector: [0, 1, 0] },
      { value: t.sz, vector: [0, 0, 1] },
    ]);
  }
  const p = principalPlaneStresses(t);
  const c = Math.cos(p.thetaP);
  const s = Math.sin(p.thetaP);
  return sortedResult([
    { value: p.p1, vector: [c, s, 0] },
    { value: p.p2, vector: [-s, c, 0] },
    { value: t.sz, vector: [0, 0, 1] },
  ]);
}

/**
 * Principal stresses of a symmetric 3D stress tensor, sorted s1 >= s2 >= s3, with directions.
 *
 * Method: the trigonometric (Viète) solution of s³ - I1 s² + I2 s - I3 = 0 for a symmetric
 * matrix (Smith, "Eigenvalues of a symmetric 3x3 matrix", Comm. ACM 4(4), 1961) picks the root
 * best separated from the other two; its eigenvector comes from the best-conditioned cross
 * product of two rows of A - sI and its value is refined by the Rayleigh quotient; the other two
 * pairs come from the 2x2 problem on the plane orthogonal to it, in closed form (the deflation of
 * Eberly, "A Robust Eigensolver for 3x3 Symmetric Matrices", Geometric Tools, 2014). So repeated
 * and nearly repeated roots keep full accuracy. The tensor is scaled by its largest entry first,
 * so tiny and huge magnitudes neither underflow nor overflow; a tensor with tyz = tzx = 0 (a
 * plane state included) takes the exact in-plane closed form, so a plane state's out-of-plane
 * principal stress is exactly 0.
 *
 * Units: Pa in, Pa out. Inputs must be finite.
 *
 * @example principalStresses({ sx: 3, sy: 0, sz: 0, txy: 1, tyz: 2, tzx: 1 }).values // ≈ [4, 1, -2]
 * @public
 */
export function principalStresses(t: StressTensor): PrincipalStresses {
  if (t.tyz === 0 && t.tzx === 0) return withPrincipalZ(t);
  const maxAbs = Math.max(
    Math.abs(t.sx),
    Math.abs(t.sy),
    Math.abs(t.sz),
    Math.abs(t.txy),
    Math.abs(t.tyz),
    Math.abs(t.tzx),
  );
  // Divide rather than multiply by 1 / maxAbs: the reciprocal of a subnormal overflows.
  const m: Sym3 = {
    a00: t.sx / maxAbs,
    a11: t.sy / maxAbs,
    a22: t.sz / maxAbs,
    a01: t.txy / maxAbs,
    a12: t.tyz / maxAbs,
    a02: t.tzx / maxAbs,
  };
  const offNorm = m.a01 * m.a01 + m.a02 * m.a02 + m.a12 * m.a12;
  const q = (m.a00 + m.a11 + m.a22) / 3;
  const b00 = m.a00 - q;
  const b11 = m.a11 - q;
  const b22 = m.a22 - q;
  const p = Math.sqrt((b00 * b00 + b11 * b11 + b22 * b22 + 2 * offNorm) / 6);
  if (p === 0) {
    // Shear below the smallest double after scaling, equal normal stresses: hydrostatic.
    const s = q * maxAbs;
    return sortedResult([
      { value: s, vector: [1, 0, 0] },
      { value: s, vector: [0, 1, 0] },
      { value: s, vector: [0, 0, 1] },
    ]);
  }
  // det(B) / 2 with B = (A - qI) / p; clamped because rounding may push it past ±1.
  const c00 = b11 * b22 - m.a12 * m.a12;
  const c01 = m.a01 * b22 - m.a12 * m.a02;
  const c02 = m.a01 * m.a12 - b11 * m.a02;
  const halfDet = Math.min(1, Math.max(-1, (b00 * c00 - m.a01 * c01 + m.a02 * c02) / (2 * p * p * p)));
  const angle = Math.acos(halfDet) / 3;
  // halfDet >= 0: the largest root is the best separated from the other two; otherwise the
  // smallest. Its eigenvector is well conditioned; the other two come from the 2x2 problem.
  const separated = q + 2 * p * (halfDet >= 0 ? Math.cos(angle) : Math.cos(angle + (2 * Math.PI) / 3));
  const vector = eigenvectorFromRows(m, separated);
  // The Rayleigh quotient refines the separated root to the rounding of the largest entry.
  const refined = dot(vector, times(m, vector));
  const [a, b] = complementPairs(m, vector);
  const unscale = (pair: Pair): Pair => ({ value: pair.value * maxAbs, vector: pair.vector });
  return sortedResult([unscale({ value: refined, vector }), unscale(a), unscale(b)]);
}
