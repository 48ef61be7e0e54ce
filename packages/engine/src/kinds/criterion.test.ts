import { describe, expect, it } from 'vitest';
import { caseTitle, expectNear, refCase } from '../../test/fixtures/cases';
import { errorOf, makeSheet, num, okOf } from '../test/makeSheet';
import type { Material } from './materials';

const materials: Record<string, Material> = {
  'a36': { name: 'ASTM A36 structural steel', Sy: '250 MPa', Sut: '400 MPa', E: 200e9, nu: 0.32, source: 'Hibbeler, Mechanics of Materials, inside-cover table' },
  'gray-iron-30': { name: 'Gray cast iron ASTM No. 30', Sut: '31 ksi', Suc: '109 ksi', source: "Shigley's MED 9th ed. Table A-24(a)" },
  'clay': { name: 'demo clay', c: 20e3, phi: '30 deg', source: 'invented for tests' },
  'nosy': { Sut: 1, source: 'deliberately incomplete' },
};

describe('criterion', () => {
  const f1 = refCase('F-01');
  it(`${caseTitle(f1)} as cells, von Mises and Tresca`, () => {
    const ev = makeSheet([
      { kind: 'stress', name: 'S', sx: '80 MPa', sy: '-40 MPa', txy: '25 MPa' },
      { kind: 'criterion', name: 'DE', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '2' },
      { kind: 'criterion', name: 'MSS', of: 'S', theory: 'tresca', material: 'a36', required: '2' },
    ], materials);
    const de = okOf(ev, 'DE');
    expectNear(num(de, 'equivalent'), f1.expected.von_mises, 'von Mises');
    expectNear(num(de, 'factor'), f1.expected.n_DE, 'n_DE');
    expect(de.values.pass).toBe(true);
    expect(num(de, 'margin')).toBeCloseTo(num(de, 'factor') / 2 - 1, 12);
    const mss = okOf(ev, 'MSS');
    expectNear(num(mss, 'factor'), f1.expected.n_MSS, 'n_MSS');
    expect(mss.values.pass).toBe(false);
    expect(mss.criterion).toEqual({ theory: 'tresca', strength: { Sy: 250e6 }, required: 2 });
    expect(ev.equation(de.cellId, 'SI')).toContain('\\frac{250}{114.35}');
  });

  const f9 = refCase('F-09');
  it(`${caseTitle(f9)} as cells with a material from the list (brittle theories)`, () => {
    const ev = makeSheet([
      { kind: 'stress', name: 'S', sx: '12 ksi', sy: '0 ksi', txy: '-8 ksi' },
      { kind: 'criterion', name: 'MNS', of: 'S', theory: 'max-normal', strength: { Sut: '30 ksi', Suc: '100 ksi' } },
      { kind: 'criterion', name: 'BCM', of: 'S', theory: 'coulomb-mohr', strength: { Sut: '30 ksi', Suc: '100 ksi' } },
      { kind: 'criterion', name: 'MM', of: 'S', theory: 'modified-mohr', strength: { Sut: '30 ksi', Suc: '100 ksi' } },
    ]);
    expectNear(num(okOf(ev, 'MNS'), 'factor'), f9.expected.n_MNS, 'n_MNS');
    expectNear(num(okOf(ev, 'BCM'), 'factor'), f9.expected.n_BCM, 'n_BCM');
    expectNear(num(okOf(ev, 'MM'), 'factor'), f9.expected.n_MM, 'n_MM');
    expect(okOf(ev, 'MNS').values.equivalent).toBeUndefined();
  });

  const c11 = refCase('C-11');
  it(`${caseTitle(c11)}: Mohr-Coulomb cell gives strength reduction as factor, radius ratio beside it`, () => {
    const ev = makeSheet([
      { kind: 'stress', name: 'Soil', sx: '-100 kPa', sy: '-250 kPa', txy: '0 kPa', sz: '-100 kPa' },
      { kind: 'criterion', name: 'MC', of: 'Soil', theory: 'mohr-coulomb', material: 'clay', required: '1.3' },
    ], materials);
    const r = okOf(ev, 'MC');
    expectNear(num(r, 'radiusRatio'), c11.expected.FS_radius, 'FS by radius');
    expect(num(r, 'factor')).toBeGreaterThan(1.3);
    expect(r.values.pass).toBe(true);
    expect(ev.equation(r.cellId, 'SI')).toContain('\\tan^2\\phi');
  });

  it('a hydrostatic state has no finite factor: null with unbounded beside it', () => {
    const ev = makeSheet([
      { kind: 'stress', name: 'H', sx: '-50 MPa', sy: '-50 MPa', txy: '0 MPa', sz: '-50 MPa' },
      { kind: 'criterion', name: 'C', of: 'H', theory: 'von-mises', strength: { Sy: '250 MPa' } },
    ]);
    const r = okOf(ev, 'C');
    expect(r.values.factor).toBeNull();
    expect(r.values.unbounded).toBe(true);
    expect(r.values.margin).toBeNull();
    expect(r.values.pass).toBe(true);
    expect(ev.equation(r.cellId, 'SI')).toContain('\\infty');
  });

  it('bad input: unknown material, material without the strength, missing strength, both, bad values', () => {
    const S = { kind: 'stress', name: 'S', sx: '80 MPa', sy: '0 MPa', txy: '0 MPa' };
    const ev = makeSheet([
      S,
      { kind: 'criterion', name: 'C1', of: 'S', theory: 'von-mises', material: 'unobtainium' },
      { kind: 'criterion', name: 'C2', of: 'S', theory: 'von-mises', material: 'nosy' },
      { kind: 'criterion', name: 'C3', of: 'S', theory: 'coulomb-mohr', strength: { Sut: '30 ksi' } },
      { kind: 'criterion', name: 'C4', of: 'S', theory: 'tresca', strength: { Sy: '250 MPa' }, material: 'a36' },
      { kind: 'criterion', name: 'C5', of: 'S', theory: 'max-normal', strength: { Sut: '30 ksi', Suc: '-90 ksi' } },
      { kind: 'criterion', name: 'C6', of: 'S', theory: 'tresca', strength: { Sy: '250 MPa' }, required: '-1' },
      { kind: 'criterion', name: 'C7', of: 'S', theory: 'tresca', strength: { Sy: '250 mm' } },
      { kind: 'criterion', name: 'C8', of: 'S', theory: 'rankine', strength: { Sy: '250 MPa' } },
      { kind: 'criterion', name: 'C9', of: 'S', theory: 'tresca' },
      { kind: 'criterion', name: 'C10', of: 'S', theory: 'mohr-coulomb', strength: { c: '10 kPa', phi: '30' } },
    ], materials);
    expect(errorOf(ev, 'C1')).toMatchObject({ code: 'unknown-material', message: 'material: no material "unobtainium" in the materials list' });
    expect(errorOf(ev, 'C2')).toMatchObject({ code: 'invalid-field', message: 'material: "nosy" has no Sy, which von-mises needs' });
    expect(errorOf(ev, 'C3')).toMatchObject({ code: 'invalid-field', message: 'strength.Suc: coulomb-mohr needs Suc' });
    expect(errorOf(ev, 'C4')).toMatchObject({ code: 'invalid-field', message: 'material: give either strength or material, not both' });
    expect(errorOf(ev, 'C5')).toMatchObject({ code: 'domain', message: expect.stringMatching(/^strength.Suc: must be positive/) });
    expect(errorOf(ev, 'C6')).toMatchObject({ code: 'domain', message: 'required: must be a positive factor' });
    expect(errorOf(ev, 'C7')).toMatchObject({ code: 'unit-mismatch', message: expect.stringMatching(/^strength.Sy: expected a stress.*got a length/) });
    expect(errorOf(ev, 'C8')).toMatchObject({ code: 'invalid-field', message: expect.stringMatching(/^theory: must be one of von-mises/) });
    expect(errorOf(ev, 'C9')).toMatchObject({ code: 'invalid-field', message: 'strength: is needed (or a material)' });
    expect(errorOf(ev, 'C10')).toMatchObject({ code: 'unit-mismatch', message: expect.stringMatching(/^strength.phi: expected an angle/) });
  });

  it('without a materials list a material id is unknown', () => {
    const ev = makeSheet([
      { kind: 'stress', name: 'S', sx: '80 MPa', sy: '0 MPa', txy: '0 MPa' },
      { kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', material: 'a36' },
    ]);
    expect(errorOf(ev, 'C').code).toBe('unknown-material');
    ev.setMaterials(materials);
    expect(num(okOf(ev, 'C'), 'factor')).toBeCloseTo(250 / 80, 12);
  });
});
