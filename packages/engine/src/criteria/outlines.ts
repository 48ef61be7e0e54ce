import type { PrincipalPoint } from './types';

/**
 * The Coulomb-Mohr hexagon in the principal-stress plane for a tensile strength `st` and a
 * compressive strength `sc` (both positive, Pa): corners (st, 0), (st, st), (0, st), (-sc, 0),
 * (-sc, -sc), (0, -sc), closed. With st = sc = Sy it is the Tresca hexagon.
 * @public
 */
export function mohrHexagon(st: number, sc: number): PrincipalPoint[] {
  const corners: [number, number][] = [
    [st, 0],
    [st, st],
    [0, st],
    [-sc, 0],
    [-sc, -sc],
    [0, -sc],
    [st, 0],
  ];
  return corners.map(([sA, sB]) => ({ sA, sB }));
}

/**
 * The von Mises ellipse sA² - sA sB + sB² = Sy² as a closed polyline of `segments` segments
 * (Pa). In u = (sA + sB)/√2, v = (sA - sB)/√2 it reads u²/2 + 3v²/2 = Sy².
 * @public
 */
export function vonMisesEllipse(Sy: number, segments = 120): PrincipalPoint[] {
  const n = Math.max(8, Math.floor(segments));
  const points: PrincipalPoint[] = [];
  for (let i = 0; i <= n; i++) {
    const t = (2 * Math.PI * (i % n)) / n;
    const u = Math.SQRT2 * Sy * Math.cos(t);
    const v = Math.sqrt(2 / 3) * Sy * Math.sin(t);
    points.push({ sA: (u + v) / Math.SQRT2, sB: (u - v) / Math.SQRT2 });
  }
  return points;
}

/** A positive finite number check with a message for the strength value `key`. @public */
export function positiveStrength(
  key: 'Sy' | 'Sut' | 'Suc' | 'c',
  value: number | undefined,
): { key: 'Sy' | 'Sut' | 'Suc' | 'c'; message: string } | null {
  if (value === undefined) return { key, message: 'is missing' };
  if (!Number.isFinite(value)) return { key, message: 'must be a finite number' };
  if (value <= 0) {
    const hint = key === 'Suc' ? ' (give the compressive strength as a positive magnitude)' : '';
    return { key, message: `must be positive${hint}` };
  }
  return null;
}

/** Safe division for a factor of safety: strength over a non-negative demand, Infinity when the demand is 0. */
export function ratioOrInfinity(strength: number, demand: number): number {
  return demand > 0 ? strength / demand : Infinity;
}
