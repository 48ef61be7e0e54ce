/**
 * Marker shapes as SVG path data, so a series is recognisable by shape alone (in greyscale
 * print and for colour-blind readers). Closed shapes may be filled; `cross` and `plus` are
 * strokes only.
 */

export type MarkerShape = 'circle' | 'square' | 'triangle' | 'diamond' | 'cross' | 'plus';

/** Shapes drawn as strokes only (filling them would draw nothing). */
export function isStrokeOnlyMarker(shape: MarkerShape): boolean {
  return shape === 'cross' || shape === 'plus';
}

/**
 * Path data of a marker of the given overall size (screen units) centred on (x, y). The shapes
 * are scaled to look about equally heavy: a triangle is drawn a little larger than a square.
 *
 * @example
 * markerPath('square', 10, 10, 6); // "M7 7H13V13H7Z"
 */
export function markerPath(shape: MarkerShape, x: number, y: number, size: number): string {
  const h = size / 2;
  const n = (value: number) => Number(value.toFixed(2));
  switch (shape) {
    case 'circle':
      return `M${n(x - h)} ${n(y)}A${n(h)} ${n(h)} 0 1 0 ${n(x + h)} ${n(y)}A${n(h)} ${n(h)} 0 1 0 ${n(x - h)} ${n(y)}Z`;
    case 'square':
      return `M${n(x - h)} ${n(y - h)}H${n(x + h)}V${n(y + h)}H${n(x - h)}Z`;
    case 'triangle': {
      const r = h * 1.25;
      return `M${n(x)} ${n(y - r)}L${n(x + r * 0.866)} ${n(y + r / 2)}L${n(x - r * 0.866)} ${n(y + r / 2)}Z`;
    }
    case 'diamond': {
      const r = h * 1.3;
      return `M${n(x)} ${n(y - r)}L${n(x + r)} ${n(y)}L${n(x)} ${n(y + r)}L${n(x - r)} ${n(y)}Z`;
    }
    case 'cross':
      return `M${n(x - h)} ${n(y - h)}L${n(x + h)} ${n(y + h)}M${n(x - h)} ${n(y + h)}L${n(x + h)} ${n(y - h)}`;
    case 'plus': {
      const r = h * 1.2;
      return `M${n(x - r)} ${n(y)}H${n(x + r)}M${n(x)} ${n(y - r)}V${n(y + r)}`;
    }
    default: {
      const unknown: never = shape;
      throw new Error(`unknown marker ${String(unknown)}`);
    }
  }
}
