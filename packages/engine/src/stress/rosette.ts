import type { PlaneStrain } from './types';

/** Rosette layouts: gauge a on x, gauges b and c counterclockwise from it. @public */
export type RosetteLayout =
  | { readonly kind: 'rectangular' }
  | { readonly kind: 'delta' }
  | { readonly kind: 'angles'; readonly anglesRad: readonly [number, number, number] };

/** Outcome of a rosette reduction: the strain state, or why the gauges cannot give one. @public */
export type RosetteReduction =
  | { readonly ok: true; readonly strain: PlaneStrain }
  | { readonly ok: false; readonly message: string };

/** Gauge angles of a layout, radians. @public */
export function rosetteAngles(layout: RosetteLayout): readonly [number, number, number] {
  switch (layout.kind) {
    case 'rectangular':
      return [0, Math.PI / 4, Math.PI / 2];
    case 'delta':
      return [0, Math.PI / 3, (2 * Math.PI) / 3];
    case 'angles':
      return layout.anglesRad;
  }
}

/**
 * Reduce three gauge readings to ex, ey and the engineering shear strain gxy by solving
 * e_i = ex cos²θ_i + ey sin²θ_i + gxy sinθ_i cosθ_i for i = a, b, c (e.g. Hibbeler, Mechanics of
 * Materials, 8th ed., Sec. 10.3, from memory). The two standard layouts use their closed forms:
 *
 * - rectangular 0/45/90: ex = ea, ey = ec, gxy = 2 eb - ea - ec
 * - delta 0/60/120: ex = ea, ey = (2 eb + 2 ec - ea)/3, gxy = 2 (eb - ec)/√3
 *
 * Three gauges at angles that do not fix the state (two parallel, e.g. 0/90/180) give an error
 * value rather than a wrong answer. Strains are dimensionless.
 *
 * @example reduceRosette({ kind: 'delta' }, [60e-6, 135e-6, 264e-6]) // ex 60e-6, ey 246e-6, gxy ≈ -148.96e-6
 * @public
 */
export function reduceRosette(layout: RosetteLayout, readings: readonly [number, number, number]): RosetteReduction {
  const [ea, eb, ec] = readings;
  if (layout.kind === 'rectangular') return { ok: true, strain: { ex: ea, ey: ec, gxy: 2 * eb - ea - ec } };
  if (layout.kind === 'delta') {
    return { ok: true, strain: { ex: ea, ey: (2 * eb + 2 * ec - ea) / 3, gxy: (2 * (eb - ec)) / Math.sqrt(3) } };
  }
  const rows = layout.anglesRad.map((t) => [Math.cos(t) ** 2, Math.sin(t) ** 2, Math.sin(t) * Math.cos(t)]);
  return solveGaugeSystem(rows as number[][], [ea, eb, ec]);
}

/** Cramer's rule on the 3x3 gauge system, with a conditioning test on the determinant. */
function solveGaugeSystem(m: number[][], rhs: readonly number[]): RosetteReduction {
  const det3 = (a: number[][]): number =>
    a[0]![0]! * (a[1]![1]! * a[2]![2]! - a[1]![2]! * a[2]![1]!) -
    a[0]![1]! * (a[1]![0]! * a[2]![2]! - a[1]![2]! * a[2]![0]!) +
    a[0]![2]! * (a[1]![0]! * a[2]![1]! - a[1]![1]! * a[2]![0]!);
  const det = det3(m);
  // Each row has norm <= 1, so |det| is at most about 1; the delta layout gives 0.65. Below 1e-6
  // two gauges are (nearly) parallel and the readings cannot separate ex, ey and gxy.
  if (!(Math.abs(det) > 1e-6)) {
    return {
      ok: false,
      message: 'the three gauge angles do not fix the strain state (two gauges lie along the same line)',
    };
  }
  const solve = (col: number): number => det3(m.map((row, i) => row.map((v, j) => (j === col ? rhs[i]! : v)))) / det;
  return { ok: true, strain: { ex: solve(0), ey: solve(1), gxy: solve(2) } };
}
