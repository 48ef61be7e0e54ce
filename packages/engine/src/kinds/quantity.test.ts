import { describe, expect, it } from 'vitest';
import { caseTitle, expectNear, refCase } from '../../test/fixtures/cases';
import { DIMENSIONS } from '../units/dimension';
import { errorOf, makeSheet, num, okOf } from '../test/makeSheet';

describe('quantity', () => {
  it('keeps SI base numbers and the dimension', () => {
    const ev = makeSheet([
      { kind: 'quantity', name: 'F', expr: '18 kN' },
      { kind: 'quantity', name: 'A', expr: '40 mm * 12 mm' },
      { kind: 'quantity', name: 'sigma', expr: 'F / A' },
      { kind: 'quantity', name: 'n', expr: '250 MPa / sigma' },
    ]);
    expect(okOf(ev, 'F').values.value).toBe(18000);
    expect(okOf(ev, 'A').measures.value).toEqual(DIMENSIONS.area);
    expect(num(okOf(ev, 'sigma'), 'value')).toBeCloseTo(37.5e6, 6);
    expect(okOf(ev, 'sigma').measures.value).toEqual(DIMENSIONS.pressure);
    expect(num(okOf(ev, 'n'), 'value')).toBeCloseTo(6.6667, 4);
    expect(ev.equation(ev.idOf('sigma')!, 'SI')).toContain('37.5\\,\\mathrm{MPa}');
  });

  const v1 = refCase('V-01');
  it(`${caseTitle(v1)}: thin-wall allowable pressure as quantity cells in US units`, () => {
    const ev = makeSheet([
      { kind: 'quantity', name: 'r', expr: '24 in' },
      { kind: 'quantity', name: 't', expr: '0.5 in' },
      { kind: 'quantity', name: 'Sallow', expr: '20 ksi' },
      { kind: 'quantity', name: 'p_cyl', expr: 'Sallow * t / r' },
      { kind: 'quantity', name: 'p_sph', expr: '2 * Sallow * t / r' },
    ]);
    expectNear(num(okOf(ev, 'p_cyl'), 'value'), v1.expected.p_cylinder, 'cylinder');
    expectNear(num(okOf(ev, 'p_sph'), 'value'), v1.expected.p_sphere, 'sphere');
  });

  const v3 = refCase('V-03');
  it(`${caseTitle(v3)}: stresses and pressure from gauges and G`, () => {
    // Closed cylinder: sigma_long = sigma_hoop / 2, and e_hoop - e_long = (sigma_hoop - sigma_long) / (2G).
    const ev = makeSheet([
      { kind: 'quantity', name: 'G', expr: '11.2e6 psi' },
      { kind: 'quantity', name: 'de', expr: '255e-6 - 60e-6' },
      { kind: 'quantity', name: 's_hoop', expr: '4 * G * de' },
      { kind: 'quantity', name: 's_long', expr: 's_hoop / 2' },
      { kind: 'quantity', name: 'p', expr: 's_hoop * 0.75 in / 12 in' },
    ]);
    expectNear(num(okOf(ev, 's_hoop'), 'value'), v3.expected.s_hoop, 'hoop');
    expectNear(num(okOf(ev, 's_long'), 'value'), v3.expected.s_long, 'long');
    expectNear(num(okOf(ev, 'p'), 'value'), v3.expected.p, 'p');
  });

  it('bad input gets the right code and names the field', () => {
    const ev = makeSheet([
      { kind: 'quantity', name: 'a', expr: '2 +' },
      { kind: 'quantity', name: 'b', expr: 'phi * 2' },
      { kind: 'quantity', name: 'c', expr: '2 MPa + 3 m' },
      { kind: 'quantity', name: 'd', expr: 'evaluate("1 + 1")' },
      { kind: 'quantity', name: 'e', expr: 'sqrt(-4)' },
      { kind: 'quantity', name: 'f', expr: 12 },
      { kind: 'quantity', name: 'g', expr: '' },
      { kind: 'quantity', name: 'max', expr: '1' },
      { kind: 'quantity', name: 'h', expr: '[1, 2]' },
    ]);
    expect(errorOf(ev, 'a')).toMatchObject({ code: 'parse', message: expect.stringMatching(/^expr: /) });
    expect(errorOf(ev, 'b')).toMatchObject({ code: 'unknown-name', message: 'expr: no cell named "phi"' });
    expect(errorOf(ev, 'c')).toMatchObject({ code: 'unit-mismatch', message: expect.stringMatching(/^expr: Units do not match/) });
    expect(errorOf(ev, 'd')).toMatchObject({ code: 'forbidden' });
    expect(errorOf(ev, 'e')).toMatchObject({ code: 'domain', message: expect.stringMatching(/^expr: is not a real number/) });
    expect(errorOf(ev, 'f')).toMatchObject({ code: 'invalid-field', message: expect.stringMatching(/^expr: must be a string/) });
    expect(errorOf(ev, 'g')).toMatchObject({ code: 'parse', message: 'expr: is empty' });
    expect(errorOf(ev, 'max')).toMatchObject({ code: 'invalid-field', message: 'name: is the name of a function; choose another name' });
    expect(errorOf(ev, 'h')).toMatchObject({ code: 'invalid-field', message: 'expr: gives a DenseMatrix, not a number or quantity' });
  });
});
