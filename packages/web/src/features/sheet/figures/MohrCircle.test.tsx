import { cleanup, fireEvent, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { MohrCircle, type MohrCircleProps } from './MohrCircle';
import type { ShearAxisConvention } from './figureTypes';

afterEach(cleanup);

const MPa = 1e6;
const degree = Math.PI / 180;
const unit = { label: 'MPa', perPa: 1e-6 };

// Common practice for plane stress (no single published source): σx = 80, σy = −40,
// τxy = 25 MPa gives C = 20, R = 65, p1 = 85, p2 = −45 MPa and θp = 11.31°.
const state = { sx: 80 * MPa, sy: -40 * MPa, txy: 25 * MPa };

/** The plane-stress transformation equations, written out for the test. */
function rotated(theta: number) {
  const mean = (state.sx + state.sy) / 2;
  const half = (state.sx - state.sy) / 2;
  const c = Math.cos(2 * theta);
  const s = Math.sin(2 * theta);
  return {
    angleRad: theta,
    sxr: mean + half * c + state.txy * s,
    syr: mean - half * c - state.txy * s,
    txyr: -half * s + state.txy * c,
  };
}

function renderCircle(props: Partial<MohrCircleProps> = {}) {
  return render(<MohrCircle {...state} unit={unit} shearAxis="positive-down" {...props} />);
}

function pointAt(container: HTMLElement, id: string) {
  const element = container.querySelector(`[data-point="${id}"]`);
  if (!element) throw new Error(`no point ${id}`);
  return { x: Number(element.getAttribute('data-x')), y: Number(element.getAttribute('data-y')) };
}

function labelTexts(container: HTMLElement): string[] {
  return [...container.querySelectorAll('[data-label]')].map((el) => el.textContent ?? '').sort();
}

describe('MohrCircle', () => {
  it('labels every point of the worked state with its values and unit', () => {
    const { container } = renderCircle();
    expect(labelTexts(container)).toEqual(
      [
        'X (80.0, 25.0) MPa',
        'Y (\u221240.0, \u221225.0) MPa',
        'p1 85.0 MPa',
        'p2 \u221245.0 MPa',
        'C 20.0 MPa',
        'τmax (20.0, \u221265.0) MPa',
        'τmax (20.0, 65.0) MPa',
      ].sort(),
    );
    expect(screen.getByText(/R = τmax in-plane = 65\.0 MPa/)).toBeTruthy();
    expect(screen.getByText(/θp = 11\.3°/)).toBeTruthy();
  });

  it('draws a round circle: X, p1 and the top point all lie one radius from C', () => {
    const { container } = renderCircle();
    const circle = container.querySelector('[data-part="circle"] circle');
    const r = Number(circle?.getAttribute('r'));
    const centre = pointAt(container, 'C');
    expect(r).toBeGreaterThan(50);
    for (const id of ['X', 'Y', 'p1', 'p2', 'top', 'bottom']) {
      const p = pointAt(container, id);
      expect(Math.hypot(p.x - centre.x, p.y - centre.y)).toBeCloseTo(r, 6);
    }
    // The x-face point of a positive τxy is below the σ axis (screen y grows downward).
    expect(pointAt(container, 'X').y).toBeGreaterThan(centre.y);
    // p1 − C spans 65 MPa horizontally; the top point spans 65 MPa vertically.
    expect(pointAt(container, 'p1').x - centre.x).toBeCloseTo(
      centre.y - pointAt(container, 'top').y,
      6,
    );
  });

  it('mirrors the τ axis when the convention switches, but never moves a point or changes a label', () => {
    const down = renderCircle({ shearAxis: 'positive-down' }).container;
    const up = render(<MohrCircle {...state} unit={unit} shearAxis="clockwise-up" />).container;

    for (const id of ['X', 'Y', 'p1', 'p2', 'top', 'bottom', 'C']) {
      expect(pointAt(up, id)).toEqual(pointAt(down, id));
    }
    expect(labelTexts(up)).toEqual(labelTexts(down));

    // Tick readings: the tick at a given height reads +v in one convention and −v in the other.
    const ticks = (container: HTMLElement) =>
      new Map(
        [...container.querySelectorAll('text[data-axis="y"]')].map((el) => [
          Number(el.getAttribute('y')).toFixed(3),
          Number(el.getAttribute('data-value')),
        ]),
      );
    const downTicks = ticks(down);
    const upTicks = ticks(up);
    expect(downTicks.size).toBeGreaterThan(2);
    let mirrored = 0;
    for (const [y, value] of downTicks) {
      const other = upTicks.get(y);
      if (other === undefined) continue;
      expect(other).toBe(value === 0 ? 0 : -value);
      mirrored += value === 0 ? 0 : 1;
    }
    expect(mirrored).toBeGreaterThan(1);
    // Below the σ axis the positive-down axis reads positive values.
    const yOfX = pointAt(down, 'X').y;
    const readingBelow = [...downTicks].find(([y]) => Number(y) > yOfX)?.[1];
    expect(readingBelow).toBeGreaterThan(0);

    expect(down.querySelector('[data-part="y-caption"]')?.textContent).toBe(
      'τ (MPa) positive down',
    );
    expect(up.querySelector('[data-part="y-caption"]')?.textContent).toBe(
      'τ (MPa) clockwise positive, up',
    );
  });

  it('draws the rotated diameter X′–Y′ and the 2θ arc', () => {
    const { container } = renderCircle({ rotated: rotated(30 * degree) });
    expect(labelTexts(container)).toContain('X′ (71.7, \u221239.5) MPa');
    expect(labelTexts(container)).toContain('Y′ (\u221231.7, 39.5) MPa');
    expect(labelTexts(container)).toContain('2θ = 60.0°');
    expect(container.querySelector('[data-part="angle-arc"] path')).not.toBeNull();
    // X′ is 60° counterclockwise from X around C on screen.
    const c = pointAt(container, 'C');
    const x = pointAt(container, 'X');
    const xr = pointAt(container, 'Xr');
    const angle = (p: { x: number; y: number }) => Math.atan2(-(p.y - c.y), p.x - c.x);
    expect((angle(xr) - angle(x)) / degree).toBeCloseTo(60, 6);
  });

  it('has no handle without onRotate', () => {
    renderCircle({ rotated: rotated(30 * degree) });
    expect(screen.queryByRole('slider')).toBeNull();
  });

  describe.each<ShearAxisConvention>(['positive-down', 'clockwise-up'])(
    'dragging X′ (%s)',
    (shearAxis) => {
      it('reports θ = θp when X′ is dropped on p1', () => {
        const onRotate = vi.fn();
        const { container } = renderCircle({ shearAxis, rotated: rotated(30 * degree), onRotate });
        const svg = container.querySelector('svg') as SVGSVGElement;
        // The drawing fills a 560 × 440 box at the page origin: client pixels = SVG units.
        svg.getBoundingClientRect = () => ({ left: 0, top: 0, width: 560, height: 440 }) as DOMRect;
        const handle = screen.getByRole('slider');
        const p1 = pointAt(container, 'p1');

        fireEvent.pointerDown(handle, { pointerId: 7, button: 0, clientX: 0, clientY: 0 });
        fireEvent.pointerMove(handle, { pointerId: 7, clientX: p1.x, clientY: p1.y });
        fireEvent.pointerUp(handle, { pointerId: 7, clientX: p1.x, clientY: p1.y });

        expect(onRotate).toHaveBeenCalledTimes(1);
        const theta = onRotate.mock.calls[0]?.[0] as number;
        expect(theta / degree).toBeCloseTo(11.3099, 3);
      });

      it('reports θp + 45° at the top of the circle and ignores moves after release', () => {
        const onRotate = vi.fn();
        const { container } = renderCircle({ shearAxis, rotated: rotated(0), onRotate });
        const svg = container.querySelector('svg') as SVGSVGElement;
        svg.getBoundingClientRect = () => ({ left: 0, top: 0, width: 560, height: 440 }) as DOMRect;
        const handle = screen.getByRole('slider');
        const top = pointAt(container, 'top');

        fireEvent.pointerDown(handle, { pointerId: 3, button: 0 });
        fireEvent.pointerMove(handle, { pointerId: 3, clientX: top.x, clientY: top.y });
        fireEvent.pointerUp(handle, { pointerId: 3 });
        fireEvent.pointerMove(handle, { pointerId: 3, clientX: 10, clientY: 10 });

        expect(onRotate).toHaveBeenCalledTimes(1);
        expect((onRotate.mock.calls[0]?.[0] as number) / degree).toBeCloseTo(11.3099 + 45, 3);
      });
    },
  );

  it('turns θ by 1° per arrow key, 10° per page key, and back to 0° with Home', () => {
    const onRotate = vi.fn();
    renderCircle({ rotated: rotated(30 * degree), onRotate });
    const handle = screen.getByRole('slider');
    expect(handle.getAttribute('aria-valuenow')).toBe('30');
    expect(handle.getAttribute('aria-valuetext')).toBe('θ = 30.0°');

    fireEvent.keyDown(handle, { key: 'ArrowUp' });
    fireEvent.keyDown(handle, { key: 'ArrowRight' });
    fireEvent.keyDown(handle, { key: 'ArrowDown' });
    fireEvent.keyDown(handle, { key: 'PageDown' });
    fireEvent.keyDown(handle, { key: 'Home' });
    fireEvent.keyDown(handle, { key: 'a' });

    const degrees = onRotate.mock.calls.map(([angle]) =>
      Number(((angle as number) / degree).toFixed(9)),
    );
    expect(degrees).toEqual([31, 31, 29, 20, 0]);
  });

  it('wraps the keyboard angle past 90° to −89°', () => {
    const onRotate = vi.fn();
    renderCircle({ rotated: rotated(90 * degree), onRotate });
    fireEvent.keyDown(screen.getByRole('slider'), { key: 'ArrowUp' });
    expect((onRotate.mock.calls[0]?.[0] as number) / degree).toBeCloseTo(-89, 9);
  });

  it('draws a hydrostatic state as a point and says so', () => {
    const onRotate = vi.fn();
    const { container } = render(
      <MohrCircle
        sx={20 * MPa}
        sy={20 * MPa}
        txy={0}
        rotated={{ angleRad: 0.3, sxr: 20 * MPa, syr: 20 * MPa, txyr: 0 }}
        unit={unit}
        shearAxis="positive-down"
        onRotate={onRotate}
      />,
    );
    expect(container.querySelector('[data-part="circle"]')).toBeNull();
    expect(screen.queryByRole('slider')).toBeNull();
    expect(labelTexts(container)).toEqual(['X = Y = C (20.0, 0.0) MPa']);
    expect(screen.getByText(/Hydrostatic in plane: σx = σy = 20\.0 MPa, τxy = 0\./)).toBeTruthy();
    expect(screen.getByText(/The circle is a point/)).toBeTruthy();
    const x = pointAt(container, 'X');
    const c = pointAt(container, 'C');
    expect(x).toEqual(c);
  });

  it('gives points on the same spot one label', () => {
    const { container } = render(
      <MohrCircle sx={0} sy={0} txy={50 * MPa} unit={unit} shearAxis="positive-down" />,
    );
    // Pure shear: Y sits on the top of the circle and X on its bottom.
    expect(labelTexts(container)).toEqual(
      [
        'X = τmax (0.0, 50.0) MPa',
        'Y = τmax (0.0, \u221250.0) MPa',
        'p1 50.0 MPa',
        'p2 \u221250.0 MPa',
        'C 0.0 MPa',
      ].sort(),
    );
  });

  it('treats a circle too small to show in three figures as a point', () => {
    const { container } = render(
      <MohrCircle
        sx={500 * MPa}
        sy={500.0001 * MPa}
        txy={0}
        unit={unit}
        shearAxis="positive-down"
      />,
    );
    expect(container.querySelector('[data-part="circle"]')).toBeNull();
    expect(screen.getByText(/τxy = 0 \(within display precision\)\./)).toBeTruthy();
  });

  it('names itself for assistive technology', () => {
    renderCircle({ title: 'Lug weld toe' });
    const figure = screen.getByRole('img', { name: 'Lug weld toe' });
    expect(figure.querySelector('desc')?.textContent).toContain('radius 65.0 MPa');
  });
});
