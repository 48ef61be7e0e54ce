import { createEvaluator } from '@sheaf/engine';
import katex from 'katex';
import { describe, expect, it } from 'vitest';
import { stackSteps } from './stackSteps';

describe('stackSteps', () => {
  it('puts each step of an aligned row on its own line, aligned on the equals sign', () => {
    const latex = String.raw`\begin{aligned}n &= \frac{S_y}{\sigma'} = \frac{250}{134.88} = 1.853 \\ \sigma_y &= 0\,\mathrm{MPa}\end{aligned}`;
    expect(stackSteps(latex)).toBe(
      String.raw`\begin{aligned}n &= \frac{S_y}{\sigma'} \\ &= \frac{250}{134.88} \\ &= 1.853 \\  \sigma_y &= 0\,\mathrm{MPa}\end{aligned}`,
    );
  });

  it('leaves equals signs inside braces, \\left…\\right and \\text alone', () => {
    const latex = String.raw`\begin{aligned}x &= \left(a = b\right) + \text{c = d} = {e = f} = 3\end{aligned}`;
    expect(stackSteps(latex)).toBe(String.raw`\begin{aligned}x &= \left(a = b\right) + \text{c = d} \\ &= {e = f} \\ &= 3\end{aligned}`);
  });

  it('returns what it cannot improve unchanged: one step, no alignment at "=", not aligned, unbalanced', () => {
    const single = String.raw`\begin{aligned}\sigma_x &= 120\,\mathrm{MPa} \\ \tau_{xy} &= 42\,\mathrm{MPa}\end{aligned}`;
    expect(stackSteps(single)).toBe(single);
    const leading = String.raw`\begin{aligned}&\sigma^3 - I_1\sigma^2 = 0,\quad I_1 = 103 \\ \sigma_1 &= 1\end{aligned}`;
    expect(stackSteps(leading)).toBe(leading);
    const inline = String.raw`\mathrm{A} = \mathrm{b}\cdot\mathrm{t} = 480\,\mathrm{mm}^{2}`;
    expect(stackSteps(inline)).toBe(inline);
    const broken = String.raw`\begin{aligned}x &= {a = b = c\end{aligned}`;
    expect(stackSteps(broken)).toBe(broken);
  });

  it('keeps every equation of the engine valid for KaTeX, with one line per step', () => {
    // The weld-toe lug of the demo (our own numbers): every kind that writes an aligned equation.
    const cells = [
      { id: 'p', kind: 'quantity', name: 'P', expr: '18 kN' },
      { id: 's', kind: 'stress', name: 'S', sx: 'P / (40 mm * 12 mm) + 315 N*m / (3200 mm^3)', sy: '0 MPa', txy: 'P / (40 mm * 12 mm)' },
      { id: 'r', kind: 'rotate', name: 'R', of: 'S', angle: '45 deg' },
      { id: 'k', kind: 'principal', name: 'K', of: 'S' },
      { id: 'c', kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
    ];
    const evaluator = createEvaluator({ cells });
    for (const cell of cells.slice(1)) {
      const latex = evaluator.equation(cell.id, 'SI');
      expect(latex).toBeTypeOf('string');
      const stacked = stackSteps(latex!);
      expect(() => katex.renderToString(stacked, { displayMode: true, throwOnError: true })).not.toThrow();
      // Every "=" of the original is still there; only line breaks were added.
      expect(stacked.replace(/\s|\\\\|&/g, '')).toBe(latex!.replace(/\s|\\\\|&/g, ''));
    }
    // The check's factor row is three lines: the formula, the numbers, the factor.
    expect(stackSteps(evaluator.equation('c', 'SI')!)).toMatch(/n &= \\frac\{S_y\}\{\\sigma'\} \\\\ &= \\frac\{250\}\{[\d.]+\} \\\\ &= [\d.]+/);
  });
});
