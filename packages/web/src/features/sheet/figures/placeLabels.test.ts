import { describe, expect, it } from 'vitest';
import {
  boxCrossesRing,
  boxesOverlap,
  estimateTextWidth,
  fanDirections,
  placeLabels,
  segmentCrossesBox,
} from './placeLabels';

const fontSize = 11;

describe('placeLabels', () => {
  it('puts a label on its preferred side when nothing is in the way', () => {
    const [label] = placeLabels([
      { id: 'p1', text: 'p1 85.0 MPa', x: 100, y: 100, directions: fanDirections(0), fontSize },
    ]);
    expect(label?.box.x0).toBeCloseTo(107, 9); // 7 units right of the point
    expect(label?.clear).toBe(true);
  });

  it('keeps two labels of the same point apart', () => {
    const labels = placeLabels([
      {
        id: 'a',
        text: 'X (80.0, 25.0) MPa',
        x: 200,
        y: 100,
        directions: fanDirections(0),
        fontSize,
      },
      { id: 'b', text: 'p1 85.0 MPa', x: 200, y: 100, directions: fanDirections(0), fontSize },
    ]);
    const [a, b] = labels;
    expect(a && b && boxesOverlap(a.box, b.box)).toBe(false);
  });

  it('moves a label off a circle outline when another side is free', () => {
    const ring = { cx: 100, cy: 100, r: 50 };
    // A point on the circle's right; straight right would be fine, so ask for "up" first.
    const [label] = placeLabels(
      [
        {
          id: 'x',
          text: 'X (1.00, 2.00)',
          x: 150,
          y: 100,
          directions: fanDirections(-Math.PI / 2),
          fontSize,
        },
      ],
      { rings: [ring] },
    );
    expect(label && boxCrossesRing(label.box, ring)).toBe(false);
  });

  it("keeps a label nearer its own marker than a neighbour's", () => {
    // A neighbour sits just right of the point: the label goes to the left instead.
    const neighbour = { cx: 130, cy: 100, r: 4 };
    const [label] = placeLabels(
      [{ id: 'a', text: 'p1 80.2 MPa', x: 100, y: 100, directions: fanDirections(0), fontSize }],
      { discs: [{ cx: 100, cy: 100, r: 4 }, neighbour] },
    );
    expect(label).toBeDefined();
    const { box } = label as NonNullable<typeof label>;
    const middle = { x: (box.x0 + box.x1) / 2, y: (box.y0 + box.y1) / 2 };
    const toOwn = Math.hypot(middle.x - 100, middle.y - 100);
    const toNeighbour = Math.hypot(middle.x - neighbour.cx, middle.y - neighbour.cy);
    expect(toOwn).toBeLessThan(toNeighbour);
    // Plain "right of the point" (x0 = 107, through the neighbour) was the first choice.
    expect(box.x0).not.toBeCloseTo(107, 6);
  });

  it('counts a many-sided outline as one line, not one per side', () => {
    // A fine polygon just right of the point and one plain line just left of it: crossing the
    // polygon once must not cost more than crossing the line.
    const polygon = Array.from({ length: 60 }, (_, i) => {
      const t = (2 * Math.PI * i) / 60;
      return { x: 160 + 40 * Math.cos(t), y: 100 + 40 * Math.sin(t) };
    });
    const [label] = placeLabels(
      [{ id: 'a', text: 'n = 2.50', x: 100, y: 100, directions: [0, Math.PI], fontSize }],
      {
        outlines: [polygon],
        segments: [{ x1: 75, y1: 0, x2: 75, y2: 200 }],
      },
    );
    // Both sides cost one crossing; the first direction (right) wins.
    expect(label && label.x).toBeGreaterThan(100);
  });

  it('stays inside the bounds', () => {
    const bounds = { x0: 0, y0: 0, x1: 300, y1: 200 };
    const [label] = placeLabels(
      [{ id: 'edge', text: 'p1 85.0 MPa', x: 295, y: 100, directions: fanDirections(0), fontSize }],
      { bounds },
    );
    expect(label?.box.x1).toBeLessThanOrEqual(300);
    expect(label?.box.x0).toBeGreaterThanOrEqual(0);
  });

  it('reports when no candidate was free', () => {
    const [label] = placeLabels(
      [{ id: 'boxed', text: 'X', x: 50, y: 50, directions: fanDirections(0), fontSize }],
      { boxes: [{ x0: -100, y0: -100, x1: 200, y1: 200 }] },
    );
    expect(label?.clear).toBe(false);
  });
});

describe('geometry of label boxes', () => {
  it('estimates mono text at about 0.6 em per character', () => {
    expect(estimateTextWidth('0123456789', 10)).toBeCloseTo(61, 9);
  });

  it('detects a segment through a box and misses one beside it', () => {
    const box = { x0: 0, y0: 0, x1: 10, y1: 10 };
    expect(segmentCrossesBox({ x1: -5, y1: 5, x2: 15, y2: 5 }, box)).toBe(true);
    expect(segmentCrossesBox({ x1: -5, y1: 12, x2: 15, y2: 12 }, box)).toBe(false);
    expect(segmentCrossesBox({ x1: -5, y1: -5, x2: 20, y2: -1 }, box)).toBe(false);
  });

  it('detects a ring passing through a box but not one enclosing it', () => {
    expect(boxCrossesRing({ x0: 45, y0: -5, x1: 55, y1: 5 }, { cx: 0, cy: 0, r: 50 })).toBe(true);
    expect(boxCrossesRing({ x0: -5, y0: -5, x1: 5, y1: 5 }, { cx: 0, cy: 0, r: 50 })).toBe(false);
  });
});
