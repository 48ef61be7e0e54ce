import { eigs } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { caseTitle, expectNear, refCase, si } from '../../test/fixtures/cases';
import { stressInvariants } from './invariants';
import { octahedralStresses } from './octahedral';
import { principalStresses } from './principalStresses';
import { absoluteMaxShear } from './tresca';
import type { StressTensor, Vector3 } from './types';
import { vonMisesFromPrincipal, vonMisesStress } from './vonMises';

const tensorOf = (id: string): StressTensor => {
  const c = refCase(id);
  return {
    sx: si(c.inputs.sx),
    sy: si(c.inputs.sy),
    sz: si(c.inputs.sz),
    txy: si(c.inputs.txy),
    tyz: si(c.inputs.tyz),
    tzx: si(c.inputs.txz),
  };
};

/** |A v - λ v| for each principal pair, relative to the largest |λ|, and orthonormality. */
function expectEigenpairs(t: StressTensor, relTol = 1e-12): void {
  const { values, directions } = principalStresses(t);
  const scale = Math.max(...values.map(Math.abs), 1e-300);
  const times = (v: Vector3): number[] => [
    t.sx * v[0] + t.txy * v[1] + t.tzx * v[2],
    t.txy * v[0] + t.sy * v[1] + t.tyz * v[2],
    t.tzx * v[0] + t.tyz * v[1] + t.sz * v[2],
  ];
  directions.forEach((v, i) => {
    const av = times(v);
    const residual = Math.hypot(av[0]! - values[i]! * v[0], av[1]! - values[i]! * v[1], av[2]! - values[i]! * v[2]);
    expect(residual / scale).toBeLessThan(relTol);
    expect(Math.hypot(...v)).toBeCloseTo(1, 12);
  });
  const [a, b, c] = directions;
  expect(Math.abs(a[0] * b[0] + a[1] * b[1] + a[2] * b[2])).toBeLessThan(1e-12);
  expect(Math.abs(a[0] * c[0] + a[1] * c[1] + a[2] * c[2])).toBeLessThan(1e-12);
  expect(Math.abs(b[0] * c[0] + b[1] * c[1] + b[2] * c[2])).toBeLessThan(1e-12);
}

describe('principalStresses against published 3D cases', () => {
  for (const id of ['D-02', 'D-03', 'D-05']) {
    const c = refCase(id);
    it(caseTitle(c), () => {
      const t = tensorOf(id);
      const [s1, s2, s3] = principalStresses(t).values;
      const e = c.expected;
      expectNear(s1, e.s1, 's1');
      expectNear(s2, e.s2, 's2');
      expectNear(s3, e.s3, 's3');
      const inv = stressInvariants(t);
      expectNear(inv.I1, e.I1, 'I1');
      expectNear(inv.I2, e.I2, 'I2');
      expectNear(inv.I3, e.I3, 'I3');
      expectNear(vonMisesStress(t), e.von_mises, 'von Mises');
      expectNear(octahedralStresses(s1, s2, s3).shear, e.tau_oct, 'tau_oct');
      expectNear(absoluteMaxShear(s1, s2, s3), e.tau_abs_max, 'tau_abs_max');
      expectEigenpairs(t);
    });
  }

  const c10 = refCase('C-10');
  it(`${caseTitle(c10)}: von Mises from components = from principal; tau_oct = (√2/3) σvM`, () => {
    const m = c10.inputs.tensor!.value as number[][];
    const t: StressTensor = {
      sx: m[0]![0]! * 1e6, sy: m[1]![1]! * 1e6, sz: m[2]![2]! * 1e6,
      txy: m[0]![1]! * 1e6, tyz: m[1]![2]! * 1e6, tzx: m[0]![2]! * 1e6,
    };
    const [s1, s2, s3] = principalStresses(t).values;
    expectNear(vonMisesStress(t), c10.expected.von_mises_components, 'from components');
    expectNear(vonMisesFromPrincipal(s1, s2, s3), c10.expected.von_mises_principal, 'from principal');
    expectNear(octahedralStresses(s1, s2, s3).shear, c10.expected.tau_oct, 'tau_oct');
    expect(octahedralStresses(s1, s2, s3).shear).toBeCloseTo((Math.SQRT2 / 3) * vonMisesStress(t), 3);
  });
});

describe('principalStresses in hard cases (common practice, no source; eigenvalues cross-checked with mathjs eigs)', () => {
  it('a plane state has an exact zero among its principal stresses, sorted into place', () => {
    const { values } = principalStresses({ sx: -40e6, sy: -60e6, sz: 0, txy: 15e6, tyz: 0, tzx: 0 });
    expect(values[0]).toBe(0);
    expect(values[2]).toBeCloseTo(-68.02775638e6, 0);
  });

  it('zero shear: the diagonal, sorted, with the axes as directions', () => {
    const { values, directions } = principalStresses({ sx: 2, sy: 7, sz: -1, txy: 0, tyz: 0, tzx: 0 });
    expect(values).toEqual([7, 2, -1]);
    // Right-handed: the third direction is the cross product of the first two.
    expect(directions).toEqual([[0, 1, 0], [1, 0, 0], [0, 0, -1]]);
  });

  it('hydrostatic (triple root) and the zero tensor', () => {
    expect(principalStresses({ sx: 5, sy: 5, sz: 5, txy: 0, tyz: 0, tzx: 0 }).values).toEqual([5, 5, 5]);
    expect(principalStresses({ sx: 0, sy: 0, sz: 0, txy: 0, tyz: 0, tzx: 0 }).values).toEqual([0, 0, 0]);
  });

  it('double roots with shear: eigenpairs stay accurate and orthonormal', () => {
    // diag(3, 3, 6) turned into a general frame: (1,1,1)/√3 carries 6, the plane across it 3.
    // A = 3 I + 3 n nᵀ with n = (1,1,1)/√3 → diagonal 4, off-diagonal 1.
    const t = { sx: 4, sy: 4, sz: 4, txy: 1, tyz: 1, tzx: 1 };
    const { values } = principalStresses(t);
    expect(values[0]).toBeCloseTo(6, 13);
    expect(values[1]).toBeCloseTo(3, 13);
    expect(values[2]).toBeCloseTo(3, 13);
    expectEigenpairs(t);
    const lower = { sx: 2, sy: 2, sz: 2, txy: -1, tyz: -1, tzx: -1 }; // 3, 3, 0
    expect(principalStresses(lower).values.map((v) => Math.round(v * 1e12) / 1e12)).toEqual([3, 3, 0]);
    expectEigenpairs(lower);
  });

  it('nearly repeated roots agree with mathjs eigs', () => {
    const t = { sx: 100e6, sy: 100e6 + 1e-3, sz: 50e6, txy: 1e-4, tyz: 2e-4, tzx: 3e-4 };
    const mine = principalStresses(t).values;
    const ref = (eigs([[t.sx, t.txy, t.tzx], [t.txy, t.sy, t.tyz], [t.tzx, t.tyz, t.sz]]).values as number[])
      .slice()
      .sort((a, b) => b - a);
    mine.forEach((v, i) => expect(Math.abs(v - ref[i]!) / 100e6).toBeLessThan(1e-12));
    expectEigenpairs(t, 1e-11);
  });

  it('tiny and huge magnitudes scale exactly with the tensor', () => {
    const base = { sx: 50, sy: -20, sz: 10, txy: 30, tyz: -10, tzx: 20 };
    const ref = principalStresses(base).values;
    for (const k of [1e-300, 1e-150, 1e150, 1e300]) {
      const scaled = {
        sx: base.sx * k, sy: base.sy * k, sz: base.sz * k, txy: base.txy * k, tyz: base.tyz * k, tzx: base.tzx * k,
      };
      const got = principalStresses(scaled).values;
      got.forEach((v, i) => expect(Math.abs(v / k - ref[i]!)).toBeLessThan(1e-12 * 65.6));
      expectEigenpairs(scaled);
    }
  });

  it('subnormal shear on a nearly hydrostatic state stays finite', () => {
    const t = { sx: -8e8, sy: -8e8, sz: -8e8 - 1.2e-7, txy: 0, tyz: 1.5743993903e-314, tzx: 0 };
    const { values } = principalStresses(t);
    values.forEach((v) => expect(Math.abs(v + 8e8)).toBeLessThan(1e-6));
    expectEigenpairs(t);
  });

  it('directions form a right-handed frame with canonical signs', () => {
    const { directions } = principalStresses({ sx: 50, sy: -20, sz: 10, txy: 30, tyz: -10, tzx: 20 });
    const [a, b, c] = directions;
    expect(c[0]).toBeCloseTo(a[1] * b[2] - a[2] * b[1], 14);
    expect(c[1]).toBeCloseTo(a[2] * b[0] - a[0] * b[2], 14);
    expect(c[2]).toBeCloseTo(a[0] * b[1] - a[1] * b[0], 14);
    for (const v of [a, b]) expect(Math.max(...v.map(Math.abs))).toBe(Math.max(...v));
  });
});
