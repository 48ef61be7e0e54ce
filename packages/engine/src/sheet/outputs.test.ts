import katex from 'katex';
import { describe, expect, it } from 'vitest';
import type { CellResult } from '../kinds/result';
import { KIND_IDS } from '../kinds/kindIds';
import { createEvaluator, type CellInput } from './createEvaluator';
import { formatResult } from './formatResult';
import { machineOutput } from './machineOutput';
import { envelopeOf, envelopesFor, mohrOf } from './plots';

/** The example sheet of the format contract (sheet-format.md), plus one of every other kind. */
const cells: CellInput[] = [
  { id: 'k1', kind: 'note', text: 'Load case LC2, $F = 18\\,kN$ at 30°' },
  { id: 'k2', kind: 'quantity', name: 'F', expr: '18 kN' },
  { id: 'k3', kind: 'quantity', name: 'A', expr: '40 mm * 12 mm' },
  { id: 'k4', kind: 'stress', name: 'S', sx: 'F / A', sy: '0 MPa', txy: '22 MPa' },
  { id: 'k5', kind: 'rotate', name: 'R', of: 'S', angle: '30 deg' },
  { id: 'k6', kind: 'principal', name: 'P', of: 'S' },
  { id: 'k7', kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
  { id: 'k8', kind: 'quantity', name: 'Q', expr: '2 MPa + 3 m' },
  { id: 'k9', kind: 'rosette', name: 'G', layout: 'delta', ea: '60e-6', eb: '135e-6', ec: '264e-6', E: '200 GPa', nu: '0.3' },
  { id: 'k10', kind: 'pointset', name: 'PS', source: { rows: [[80, -40, 25], [0, 0, 0]] }, columns: { sx: 0, sy: 1, txy: 2 }, theory: 'tresca', strength: { Sy: '250 MPa' } },
  { id: 'k11', kind: 'criterion', name: 'H', of: 'S', theory: 'mohr-coulomb', strength: { c: '20 MPa', phi: '30 deg' } },
];


/** A number of an ok result (fails the test otherwise). */
function numberOf(r: CellResult | undefined, key: string): number {
  if (!r || !r.ok) throw new Error(`expected a value, got ${JSON.stringify(r)}`);
  return r.values[key] as number;
}

describe('machine output (sheet-format.md, "sheaf eval FILE --json")', () => {
  const ev = createEvaluator({ cells });
  const out = machineOutput(ev.cells, ev.results);

  it('one entry per named cell with SI base numbers; errors as code and message', () => {
    expect(Object.keys(out.cells)).toEqual(['F', 'A', 'S', 'R', 'P', 'C', 'Q', 'G', 'PS', 'H']);
    const p = out.cells.P!.values!;
    // Recomputed by hand from sx = 37.5 MPa, txy = 22 MPa: centre 18.75, radius sqrt(18.75² + 22²) = 28.906 MPa.
    expect(p.p1 as number).toBeCloseTo(47656098, 0);
    expect(p.p2 as number).toBeCloseTo(-10156098, 0);
    expect(p.thetaP as number).toBeCloseTo(0.43249, 5);
    expect(out.cells.C).toMatchObject({ kind: 'criterion', values: { pass: true } });
    expect(out.cells.C!.values!.equivalent as number).toBeCloseTo(53462604, 0);
    expect(out.cells.C!.values!.factor as number).toBeCloseTo(4.676, 3);
    expect(out.cells.Q).toEqual({ kind: 'quantity', error: { code: 'unit-mismatch', message: 'expr: Units do not match' } });
    expect(out.cells.PS!.values).toMatchObject({ count: 2, worstRow: 0 });
  });

  it('is plain JSON: it survives a round trip unchanged', () => {
    expect(JSON.parse(JSON.stringify(out))).toEqual(out);
  });

  it('an unbounded factor is null with unbounded: true', () => {
    const h = createEvaluator({
      cells: [
        { id: 'h', kind: 'stress', name: 'H', sx: '-5 MPa', sy: '-5 MPa', txy: '0 MPa', sz: '-5 MPa' },
        { id: 'c', kind: 'criterion', name: 'C', of: 'H', theory: 'von-mises', strength: { Sy: '250 MPa' } },
      ],
    });
    expect(machineOutput(h.cells, h.results).cells.C!.values).toMatchObject({ factor: null, unbounded: true });
  });
});

describe('formatting for a unit system', () => {
  const ev = createEvaluator({ cells });
  it('SI and US', () => {
    const p = ev.resultByName('P')!;
    if (!p.ok) throw new Error('P failed');
    expect(formatResult(p, 'SI').p1!.text).toBe('47.656 MPa');
    expect(formatResult(p, 'US').p1!.text).toBe('6.9119 ksi');
    expect(formatResult(p, 'SI').thetaP!.text).toBe('24.78°');
    expect(formatResult(p, 'SI').I2!.text).toBe('-484 MPa²');
    const c = ev.resultByName('C')!;
    if (!c.ok) throw new Error('C failed');
    expect(formatResult(c, 'SI').pass!.text).toBe('pass');
    expect(formatResult(c, 'SI').factor!.text).toBe('4.6762');
    const g = ev.resultByName('G')!;
    if (!g.ok) throw new Error('G failed');
    expect(formatResult(g, 'US').ey!.text).toBe('246 µε');
    const f = ev.resultByName('F')!;
    if (!f.ok) throw new Error('F failed');
    expect(formatResult(f, 'US').value!.text).toBe('4.0466 kip');
  });
});

describe('substituted equations', () => {
  const ev = createEvaluator({ cells });
  it('every kind with an equation gives LaTeX that KaTeX renders, in both unit systems', () => {
    const seen = new Set<string>();
    for (const cell of cells) {
      for (const system of ['SI', 'US'] as const) {
        const tex = ev.equation(cell.id, system);
        const r = ev.results.get(cell.id)!;
        if (!r.ok || r.kind === 'note') {
          expect(tex).toBeNull();
          continue;
        }
        expect(tex, cell.id).not.toBeNull();
        expect(() => katex.renderToString(tex!, { throwOnError: true, displayMode: true }), `${cell.id}: ${tex}`).not.toThrow();
        seen.add(r.kind);
      }
    }
    expect([...seen].sort()).toEqual(KIND_IDS.filter((k) => k !== 'note').sort());
  });

  it('principal shows the formula with the numbers put in', () => {
    expect(ev.equation('k6', 'SI')).toContain(
      'p_{1,2} &= \\frac{\\sigma_x+\\sigma_y}{2} \\pm \\sqrt{\\left(\\frac{\\sigma_x-\\sigma_y}{2}\\right)^2+\\tau_{xy}^2} = \\frac{37.5+0}{2} \\pm \\sqrt{\\left(\\frac{37.5-0}{2}\\right)^2+22^2} = 47.656\\,\\mathrm{MPa},\\ -10.156\\,\\mathrm{MPa}',
    );
  });
});

describe('plot data from results', () => {
  const ev = createEvaluator({ cells });
  it('Mohr geometry: the plane circle with the rotated pair for a rotate cell, three circles always', () => {
    const m = mohrOf(ev.resultByName('R'))!;
    expect(m.plane!.center).toBeCloseTo(18.75e6, 3);
    expect(m.plane!.rotated!.angleRad).toBeCloseTo(Math.PI / 6, 12);
    expect(m.plane!.rotated!.xFace.sigma).toBeCloseTo(numberOf(ev.resultByName('R'), 'sx'), 3);
    expect(m.circles.circles[2].radius).toBeCloseTo(Math.hypot(18.75e6, 22e6), 3);
    expect(mohrOf(ev.resultByName('F'))).toBeNull();
    expect(mohrOf(ev.resultByName('Q'))).toBeNull();
  });

  it('envelope with the load line to factor × (p1, p2); overlay of several theories', () => {
    const e = envelopeOf(ev.resultByName('C'))!;
    expect(e.theory).toBe('von-mises');
    expect(e.envelope.principalPlane[0]!.length).toBe(121);
    expect(e.loadLine!.point.sA).toBeCloseTo(18.75e6 + Math.hypot(18.75e6, 22e6), 3);
    expect(e.loadLine!.onEnvelope!.sA).toBeCloseTo(e.loadLine!.point.sA * e.loadLine!.factor, 3);
    expect(e.loadLine!.factor).toBeCloseTo(4.6762, 4);
    const mc = envelopeOf(ev.resultByName('H'))!;
    expect(mc.envelope.mohrPlane).toHaveLength(2);
    expect(envelopesFor(['von-mises', 'tresca', 'max-normal'], { Sy: 250e6 }).map((x) => x.theory)).toEqual(['von-mises', 'tresca']);
  });
});
