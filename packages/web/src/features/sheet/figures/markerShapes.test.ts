import { describe, expect, it } from 'vitest';
import { isStrokeOnlyMarker, markerPath, type MarkerShape } from './markerShapes';

const shapes: MarkerShape[] = ['circle', 'square', 'triangle', 'diamond', 'cross', 'plus'];

/** Every coordinate pair after M/L commands, to check the extent of a shape. */
function coordinates(d: string): number[] {
  return (d.match(/-?\d+(\.\d+)?/g) ?? []).map(Number);
}

describe('markerPath', () => {
  it('draws a square of the given size around the centre', () => {
    expect(markerPath('square', 10, 10, 6)).toBe('M7 7H13V13H7Z');
  });

  it('gives every shape a different outline', () => {
    const paths = shapes.map((shape) => markerPath(shape, 0, 0, 8));
    expect(new Set(paths).size).toBe(shapes.length);
  });

  it('keeps every shape near its centre', () => {
    for (const shape of shapes) {
      for (const value of coordinates(markerPath(shape, 100, 100, 8))) {
        // Arc radii and flags are small numbers; coordinates lie within 100 ± 6.
        expect(value < 10 || Math.abs(value - 100) <= 6).toBe(true);
      }
    }
  });

  it('marks crosses and pluses as stroke-only', () => {
    expect(shapes.filter(isStrokeOnlyMarker)).toEqual(['cross', 'plus']);
  });
});
