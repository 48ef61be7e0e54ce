import { createEvaluator } from '@sheaf/engine';
import katex from 'katex';
import { describe, expect, it } from 'vitest';
import { equationSteps, type EquationRow } from './equationSteps';

describe('equationSteps', () => {
  it('sets each step of an aligned row on its own, under its left-hand side', () => {
    const latex = String.raw`\begin{aligned}n &= \frac{S_y}{\sigma'} = \frac{250}{134.88} = 1.853 \\ \sigma_y &= 0\,\mathrm{MPa}\end{aligned}`;
    expect(equationSteps(latex)).toEqual([
      { lhs: 'n', steps: [String.raw`\frac{S_y}{\sigma'}`, String.raw`\frac{250}{134.88}`, '1.853'] },
      { lhs: String.raw`\sigma_y`, steps: [String.raw`0\,\mathrm{MPa}`] },
    ]);
  });

  it('leaves equals signs inside braces, \\left…\\right and \\text alone', () => {
    const latex = String.raw`\begin{aligned}x &= \left(a = b\right) + \text{c = d} = {e = f} = 3\end{aligned}`;
    expect(equationSteps(latex)).toEqual([{ lhs: 'x', steps: [String.raw`\left(a = b\right) + \text{c = d}`, '{e = f}', '3'] }]);
  });

  it('keeps whole what has no "lhs &=" to align on, and what is not one aligned block', () => {
    const leading = String.raw`\begin{aligned}&\sigma^3 - I_1\sigma^2 = 0,\quad I_1 = 103 \\ \sigma_1 &= 1\end{aligned}`;
    expect(equationSteps(leading)).toEqual([{ line: String.raw`\sigma^3 - I_1\sigma^2 = 0,\quad I_1 = 103` }, { lhs: String.raw`\sigma_1`, steps: ['1'] }]);
    const inline = String.raw`\mathrm{A} = \mathrm{b}\cdot\mathrm{t} = 480\,\mathrm{mm}^{2}`;
    expect(equationSteps(inline)).toEqual([{ line: inline }]);
    const broken = String.raw`\begin{aligned}x &= {a = b = c\end{aligned}`;
    expect(equationSteps(broken)).toEqual([{ line: broken }]);
  });

  it('splits every equation the engine writes into pieces KaTeX sets, losing nothing', () => {
    // The weld-toe lug of the demo (our own numbers): every kind that writes an aligned equation.
    const cells = [
      { id: 'p', kind: 'quantity', name: 'P', expr: '18 kN' },
      { id: 's', kind: 'stress', name: 'S', sx: 'P / (40 mm * 12 mm) + 315 N*m / (3200 mm^3)', sy: '0 MPa', txy: 'P / (40 mm * 12 mm)' },
      { id: 's3', kind: 'stress', name: 'S3', sx: '120 MPa', sy: '-35 MPa', txy: '42 MPa', sz: '18 MPa', tyz: '-12 MPa', tzx: '25 MPa' },
      { id: 'r', kind: 'rotate', name: 'R', of: 'S', angle: '45 deg' },
      { id: 'k', kind: 'principal', name: 'K', of: 'S' },
      { id: 'k3', kind: 'principal', name: 'K3', of: 'S3' },
      { id: 'c', kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
    ];
    const evaluator = createEvaluator({ cells });
    const pieces = (row: EquationRow) => ('line' in row ? [row.line] : [row.lhs, ...row.steps.map((step) => `= ${step}`)]);
    for (const cell of cells) {
      const latex = evaluator.equation(cell.id, 'SI')!;
      const rows = equationSteps(latex);
      for (const piece of rows.flatMap(pieces)) expect(() => katex.renderToString(piece, { throwOnError: true })).not.toThrow();
      // Only the alignment and the line breaks were taken out.
      const strip = (text: string) => text.replace(/\\begin\{aligned\}|\\end\{aligned\}|\\\\|&|\s/g, '');
      expect(rows.flatMap(pieces).map(strip).join('')).toBe(strip(latex));
    }
    // The check's factor: the formula, the numbers, the factor, one under the other.
    expect(equationSteps(evaluator.equation('c', 'SI')!)[1]).toEqual({ lhs: 'n', steps: [String.raw`\frac{S_y}{\sigma'}`, expect.stringMatching(/^\\frac\{250\}\{[\d.]+\}$/), expect.stringMatching(/^[\d.]+$/)] });
  });
});
