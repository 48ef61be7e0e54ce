import { describe, expect, it } from 'vitest';
import { caseTitle, expectNear, refCase } from '../../test/fixtures/cases';
import { stressInvariants } from '../stress/invariants';
import { errorOf, makeSheet, num, okOf } from '../test/makeSheet';
import { rotateAboutZ } from './rotate';

describe('rotate', () => {
  for (const id of ['T-02', 'T-05']) {
    const c = refCase(id);
    it(`${caseTitle(c)} as cells`, () => {
      const u = c.inputs.sx!.unit;
      const ev = makeSheet([
        { kind: 'stress', name: 'S', sx: `${c.inputs.sx!.value} ${u}`, sy: `${c.inputs.sy!.value} ${u}`, txy: `${c.inputs.txy!.value} ${u}` },
        { kind: 'rotate', name: 'R', of: 'S', angle: `${c.inputs.theta!.value} deg` },
      ]);
      const r = okOf(ev, 'R');
      expectNear(num(r, 'sx'), c.expected.sx1, 'sx1');
      expectNear(num(r, 'sy'), c.expected.sy1, 'sy1');
      expectNear(num(r, 'txy'), c.expected.txy1, 'txy1');
      expect(r.rotation?.angleRad).toBeCloseTo((c.inputs.theta!.value as number) * (Math.PI / 180), 12);
      const tex = ev.equation(r.cellId, 'SI')!;
      expect(tex).toContain('\\cos');
      expect(tex).toContain(`${2 * (c.inputs.theta!.value as number)}^{\\circ}`);
    });
  }

  it('turning a 3D state about z keeps its invariants and sz (common practice, no source)', () => {
    const t = { sx: 50e6, sy: -20e6, sz: 10e6, txy: 30e6, tyz: -10e6, tzx: 20e6 };
    const r = rotateAboutZ(t, 0.7);
    const a = stressInvariants(t);
    const b = stressInvariants(r);
    expect(b.I1).toBeCloseTo(a.I1, 3);
    expect(b.I2 / a.I2).toBeCloseTo(1, 12);
    expect(b.I3 / a.I3).toBeCloseTo(1, 12);
    expect(r.sz).toBe(t.sz);
  });

  it('bad input: of not a stress state, angle without unit, unknown of', () => {
    const ev = makeSheet([
      { kind: 'quantity', name: 'F', expr: '18 kN' },
      { kind: 'stress', name: 'S', sx: '1 MPa', sy: '0 MPa', txy: '0 MPa' },
      { kind: 'rotate', name: 'R1', of: 'F', angle: '30 deg' },
      { kind: 'rotate', name: 'R2', of: 'S', angle: '30' },
      { kind: 'rotate', name: 'R3', of: 'Nope', angle: '30 deg' },
      { kind: 'rotate', name: 'R4', of: 'S' },
    ]);
    expect(errorOf(ev, 'R1')).toMatchObject({ code: 'invalid-field', message: 'of: "F" is a quantity cell; give a stress, rosette, rotate or principal cell' });
    expect(errorOf(ev, 'R2')).toMatchObject({ code: 'unit-mismatch', message: expect.stringMatching(/^angle: expected an angle .*write the unit/) });
    expect(errorOf(ev, 'R3')).toMatchObject({ code: 'unknown-name', message: 'of: no cell named "Nope"' });
    expect(errorOf(ev, 'R4')).toMatchObject({ code: 'invalid-field', message: expect.stringMatching(/^angle: /) });
  });
});
