import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { MohrCircles3D } from './MohrCircles3D';
import { isAdmissible } from './mohrCircles3DLayout';

afterEach(cleanup);

const MPa = 1e6;
const unit = { label: 'MPa', perPa: 1e-6 };

function labelTexts(container: HTMLElement): string[] {
  return [...container.querySelectorAll('[data-label]')].map((el) => el.textContent ?? '').sort();
}

function radius(container: HTMLElement, id: string): number {
  return Number(container.querySelector(`[data-circle="${id}"]`)?.getAttribute('r'));
}

describe('MohrCircles3D', () => {
  it('hatches the admissible region: the big circle with the two small ones cut out', () => {
    const { container } = render(
      <MohrCircles3D s1={85 * MPa} s2={0} s3={-45 * MPa} unit={unit} shearAxis="positive-down" />,
    );
    const region = container.querySelector('[data-part="admissible-region"]');
    expect(region).not.toBeNull();
    expect(region?.getAttribute('fill-rule')).toBe('evenodd');
    // Three closed sub-paths: the big circle and the two holes.
    expect(region?.getAttribute('d')?.match(/Z/g)?.length).toBe(3);
    const fill = region?.getAttribute('fill') ?? '';
    const patternId = /^url\(#(.+)\)$/.exec(fill)?.[1];
    expect(patternId).toBeTruthy();
    const pattern = container.querySelector(`pattern[id="${patternId}"]`);
    expect(pattern?.querySelector('line')).not.toBeNull();
  });

  it('draws the three circles in proportion: radii 65, 42.5 and 22.5 MPa', () => {
    const { container } = render(
      <MohrCircles3D s1={85 * MPa} s2={0} s3={-45 * MPa} unit={unit} shearAxis="positive-down" />,
    );
    const big = radius(container, 'c13');
    expect(big).toBeGreaterThan(50);
    expect(radius(container, 'c12') / big).toBeCloseTo(42.5 / 65, 9);
    expect(radius(container, 'c23') / big).toBeCloseTo(22.5 / 65, 9);
  });

  it('labels the principal points and τmax, sorting unsorted input', () => {
    const { container } = render(
      <MohrCircles3D s1={-45 * MPa} s2={85 * MPa} s3={0} unit={unit} shearAxis="clockwise-up" />,
    );
    expect(labelTexts(container)).toEqual(
      ['σ1 85.0 MPa', 'σ2 0.0 MPa', 'σ3 \u221245.0 MPa', 'τmax 65.0 MPa'].sort(),
    );
    expect(screen.getByText('τmax = (σ1 − σ3) / 2 = 65.0 MPa')).toBeTruthy();
  });

  it('says when the marked point cannot act on any plane', () => {
    const inside = render(
      <MohrCircles3D
        s1={85 * MPa}
        s2={0}
        s3={-45 * MPa}
        unit={unit}
        shearAxis="positive-down"
        point={{ sigma: 20 * MPa, tau: 50 * MPa }}
      />,
    );
    expect(labelTexts(inside.container)).toContain('(σ, τ) = (20.0, 50.0) MPa');
    expect(screen.queryByText(/lies outside the hatched region/)).toBeNull();
    cleanup();

    render(
      <MohrCircles3D
        s1={85 * MPa}
        s2={0}
        s3={-45 * MPa}
        unit={unit}
        shearAxis="positive-down"
        point={{ sigma: 30 * MPa, tau: 40 * MPa }}
      />,
    );
    expect(screen.getByText(/lies outside the hatched region/)).toBeTruthy();
  });

  it('has no hatched area when two principal stresses are equal', () => {
    const { container } = render(
      <MohrCircles3D
        s1={50 * MPa}
        s2={50 * MPa}
        s3={-20 * MPa}
        unit={unit}
        shearAxis="positive-down"
      />,
    );
    expect(container.querySelector('[data-part="admissible-region"]')).toBeNull();
    expect(container.querySelectorAll('[data-circle]').length).toBe(1);
    expect(screen.getByText(/lies on the circle itself/)).toBeTruthy();
  });

  it('draws a hydrostatic state as one point and says so', () => {
    const { container } = render(
      <MohrCircles3D
        s1={-30 * MPa}
        s2={-30 * MPa}
        s3={-30 * MPa}
        unit={unit}
        shearAxis="positive-down"
      />,
    );
    expect(container.querySelectorAll('[data-circle]').length).toBe(0);
    expect(labelTexts(container)).toEqual(['σ1 = σ2 = σ3 \u221230.0 MPa']);
    expect(screen.getByText(/The three circles are one point/)).toBeTruthy();
  });

  it('gives each figure its own hatch pattern id', () => {
    const { container } = render(
      <>
        <MohrCircles3D s1={3 * MPa} s2={1 * MPa} s3={0} unit={unit} shearAxis="positive-down" />
        <MohrCircles3D s1={3 * MPa} s2={2 * MPa} s3={0} unit={unit} shearAxis="positive-down" />
      </>,
    );
    const ids = [...container.querySelectorAll('pattern')].map((p) => p.id);
    expect(ids.length).toBe(2);
    expect(new Set(ids).size).toBe(2);
  });
});

describe('isAdmissible', () => {
  const [s1, s2, s3] = [85, 0, -45];

  it('accepts points between the circles and on their outlines', () => {
    expect(isAdmissible(20, 50, s1, s2, s3)).toBe(true);
    expect(isAdmissible(20, 65, s1, s2, s3, 1e-9)).toBe(true); // top of the big circle
    expect(isAdmissible(42.5, 42.5, s1, s2, s3, 1e-9)).toBe(true); // top of σ1–σ2
    expect(isAdmissible(85, 0, s1, s2, s3, 1e-9)).toBe(true); // σ1 itself
  });

  it('rejects points inside a small circle or outside the big one', () => {
    expect(isAdmissible(42.5, 20, s1, s2, s3)).toBe(false);
    expect(isAdmissible(-22.5, 10, s1, s2, s3)).toBe(false);
    expect(isAdmissible(20, 66, s1, s2, s3)).toBe(false);
  });
});
