import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { FailureEnvelope, type FailureEnvelopeProps } from './FailureEnvelope';

afterEach(cleanup);

const MPa = 1e6;
const unit = { label: 'MPa', perPa: 1e-6 };
const square: Array<[number, number]> = [
  [250 * MPa, 250 * MPa],
  [-250 * MPa, 250 * MPa],
  [-250 * MPa, -250 * MPa],
  [250 * MPa, -250 * MPa],
];
const squareEnvelope = { theory: 'max-normal', label: 'Square ±250 MPa', points: square };
// A Tresca hexagon for Sy = 250 MPa (plane stress, σ3 = 0 taken into account).
const hexagon: Array<[number, number]> = [
  [250 * MPa, 0],
  [250 * MPa, 250 * MPa],
  [0, 250 * MPa],
  [-250 * MPa, 0],
  [-250 * MPa, -250 * MPa],
  [0, -250 * MPa],
];
const trescaEnvelope = { theory: 'tresca', label: 'Tresca, Sy = 250 MPa', points: hexagon };

function renderEnvelope(props: Partial<FailureEnvelopeProps> = {}) {
  return render(
    <FailureEnvelope
      envelopes={[squareEnvelope]}
      point={{ sA: 100 * MPa, sB: 50 * MPa }}
      factor={2.5}
      unit={unit}
      {...props}
    />,
  );
}

function position(container: HTMLElement, part: string) {
  const element = container.querySelector(`[data-part="${part}"]`);
  if (!element) throw new Error(`no ${part}`);
  return { x: Number(element.getAttribute('data-x')), y: Number(element.getAttribute('data-y')) };
}

function pathBox(d: string) {
  const numbers = (d.match(/-?\d+(\.\d+)?/g) ?? []).map(Number);
  const xs = numbers.filter((_, i) => i % 2 === 0);
  const ys = numbers.filter((_, i) => i % 2 === 1);
  return { width: Math.max(...xs) - Math.min(...xs), height: Math.max(...ys) - Math.min(...ys) };
}

describe('FailureEnvelope', () => {
  it('ends the load line on the envelope at n times the stress point: (100, 50) × 2.5', () => {
    const { container } = renderEnvelope();
    const stress = position(container, 'stress-point');
    const failure = position(container, 'failure-point');
    // failure = origin + 2.5 (stress − origin): recover the origin and find it where the axes cross.
    const origin = {
      x: (failure.x - 2.5 * stress.x) / -1.5,
      y: (failure.y - 2.5 * stress.y) / -1.5,
    };
    const lines = [...container.querySelectorAll('[data-part="axis-lines"] line')];
    const horizontal = lines.find((l) => l.getAttribute('y1') === l.getAttribute('y2'));
    const vertical = lines.find((l) => l.getAttribute('x1') === l.getAttribute('x2'));
    expect(origin.y).toBeCloseTo(Number(horizontal?.getAttribute('y1')), 6);
    expect(origin.x).toBeCloseTo(Number(vertical?.getAttribute('x1')), 6);
    // The failure point is on the square's right edge, and the dashed part runs to it.
    const extension = container.querySelector('[data-part="load-extension"]');
    expect(Number(extension?.getAttribute('x2'))).toBeCloseTo(failure.x, 6);
    expect(Number(extension?.getAttribute('y2'))).toBeCloseTo(failure.y, 6);
    expect(screen.getByText('n = 2.50')).toBeTruthy();
    expect(screen.getByText('(σ1, σ2) = (100, 50.0) MPa')).toBeTruthy();
  });

  it('keeps the envelope’s true shape: a square stays square', () => {
    const { container } = renderEnvelope();
    const d = container.querySelector('[data-envelope="max-normal"] path')?.getAttribute('d') ?? '';
    const box = pathBox(d);
    expect(box.width).toBeGreaterThan(100);
    expect(box.width).toBeCloseTo(box.height, 1);
  });

  it.each([
    {
      factor: 2.5,
      required: 1.5,
      word: 'Pass',
      glyph: 'check',
      detail: 'n = 2.50 ≥ 1.50 required',
    },
    {
      factor: 1.2,
      required: 1.5,
      word: 'Low margin',
      glyph: 'triangle',
      detail: 'n = 1.20 < 1.50 required',
    },
    { factor: 0.8, required: 1.5, word: 'Fail', glyph: 'cross', detail: 'n = 0.800 < 1' },
    { factor: 1.1, required: undefined, word: 'Pass', glyph: 'check', detail: 'n = 1.10 ≥ 1' },
  ])(
    'shows $word with a $glyph glyph for n = $factor',
    ({ factor, required, word, glyph, detail }) => {
      const { container } = renderEnvelope({ factor, required });
      const badge = container.querySelector('[data-part="status-badge"]');
      expect(badge?.querySelector('[data-part="status-word"]')?.textContent).toBe(word);
      expect(badge?.querySelector(`[data-glyph="${glyph}"]`)).not.toBeNull();
      expect(badge?.textContent).toContain(detail);
    },
  );

  it('says "n unbounded" and draws the load line on to the frame when n has no limit', () => {
    const { container } = renderEnvelope({ factor: null, required: 2 });
    const badge = container.querySelector('[data-part="status-badge"]');
    expect(badge?.querySelector('[data-part="status-word"]')?.textContent).toBe('Pass');
    expect(badge?.textContent).toContain('n unbounded');
    expect(container.querySelector('[data-part="failure-point"]')).toBeNull();
    expect(container.querySelector('[data-part="load-ray"]')).not.toBeNull();
    expect(container.querySelector('[data-label="factor"]')?.textContent).toBe('n unbounded');
  });

  it('marks the failure point between origin and stress point when n < 1', () => {
    const { container } = renderEnvelope({ point: { sA: 500 * MPa, sB: 0 }, factor: 0.5 });
    const stress = position(container, 'stress-point');
    const failure = position(container, 'failure-point');
    const axis = container.querySelector('[data-part="axis-lines"] line');
    const originX = Number(
      [...container.querySelectorAll('[data-part="axis-lines"] line')]
        .find((l) => l.getAttribute('x1') === l.getAttribute('x2'))
        ?.getAttribute('x1'),
    );
    expect(axis).not.toBeNull();
    expect(failure.x - originX).toBeCloseTo((stress.x - originX) / 2, 6);
    expect(container.querySelector('[data-part="load-extension"]')).toBeNull();
  });

  it('overlays several envelopes, each with its own dash, colour and marker, named in the legend', () => {
    const { container } = renderEnvelope({ envelopes: [squareEnvelope, trescaEnvelope] });
    const paths = [...container.querySelectorAll('[data-envelope] > path:first-child')];
    expect(paths).toHaveLength(2);
    const [a, b] = paths;
    expect(a?.getAttribute('stroke')).not.toBe(b?.getAttribute('stroke'));
    expect(a?.getAttribute('stroke-dasharray')).not.toBe(b?.getAttribute('stroke-dasharray'));
    const markerOf = (theory: string) =>
      container
        .querySelector(`[data-envelope="${theory}"] > path:nth-child(2)`)
        ?.getAttribute('d') ?? '';
    // Marker outlines differ in shape: compare their command letters.
    expect(markerOf('max-normal').replace(/[^A-Z]/g, '')).not.toBe(
      markerOf('tresca').replace(/[^A-Z]/g, ''),
    );
    const legend = [...container.querySelectorAll('[data-legend]')].map((g) => g.textContent);
    expect(legend).toEqual(['Square ±250 MPa', 'Tresca, Sy = 250 MPa']);
    // The load line meets the hexagon too (also at n = 2.5, on its right edge): hollow marks.
    expect(container.querySelectorAll('[data-part="crossings"] path').length).toBeGreaterThan(0);
  });

  it('handles a stress point at the origin without a load line', () => {
    const { container } = renderEnvelope({ point: { sA: 0, sB: 0 }, factor: null });
    expect(container.querySelector('[data-part="load-line"]')).toBeNull();
    expect(screen.getByRole('img').querySelector('desc')?.textContent).toContain('n unbounded');
  });
});
