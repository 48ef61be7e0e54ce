import { describe, expect, it } from 'vitest';
import {
  clientToViewBox,
  createViewTransform,
  loadLineFactor,
  mohrPlaneGeometry,
  mohrPlotPoint,
  mohrPlotY,
  mohrRotationSense,
  normalizeHalfTurn,
  rangeWithOriginIfClose,
  rotationFromPlotPoint,
  shearAxisPositiveDirection,
  shearAxisReading,
} from './figureGeometry';
import type { ShearAxisConvention } from './figureTypes';

const MPa = 1e6;
const degree = Math.PI / 180;
const conventions: ShearAxisConvention[] = ['positive-down', 'clockwise-up'];

// The worked numbers below are common practice for plane stress (no single published source):
// σx = 80 MPa, σy = −40 MPa, τxy = 25 MPa gives C = 20 MPa, R = √(60² + 25²) = 65 MPa,
// p1 = 85 MPa, p2 = −45 MPa and tan 2θp = 2·25 / (80 − (−40)) = 5/12, θp = 11.31°.
const state = { sx: 80 * MPa, sy: -40 * MPa, txy: 25 * MPa };

/** The plane-stress transformation equations, written out independently of the code under test. */
function rotate(s: typeof state, theta: number) {
  const mean = (s.sx + s.sy) / 2;
  const half = (s.sx - s.sy) / 2;
  const c = Math.cos(2 * theta);
  const n = Math.sin(2 * theta);
  return {
    sx: mean + half * c + s.txy * n,
    sy: mean - half * c - s.txy * n,
    txy: -half * n + s.txy * c,
  };
}

describe('mohrPlaneGeometry', () => {
  it('gives centre, radius, principal values and θp of the worked state', () => {
    const g = mohrPlaneGeometry(state);
    expect(g.centre / MPa).toBeCloseTo(20, 9);
    expect(g.radius / MPa).toBeCloseTo(65, 9);
    expect(g.p1 / MPa).toBeCloseTo(85, 9);
    expect(g.p2 / MPa).toBeCloseTo(-45, 9);
    expect(g.thetaP / degree).toBeCloseTo(11.3099, 3);
    // θp really is principal: the rotated shear vanishes and σx' = p1 (tolerance 1e-6 MPa).
    const turned = rotate(state, g.thetaP);
    expect(turned.txy / MPa).toBeCloseTo(0, 6);
    expect(turned.sx / MPa).toBeCloseTo(85, 6);
  });

  it('puts p1 along y when σy > σx and there is no shear', () => {
    const g = mohrPlaneGeometry({ sx: -10 * MPa, sy: 30 * MPa, txy: 0 });
    expect(g.thetaP).toBeCloseTo(Math.PI / 2, 12);
    expect(g.p1 / MPa).toBeCloseTo(30, 9);
  });

  it('has zero radius for a hydrostatic plane state', () => {
    const g = mohrPlaneGeometry({ sx: 20 * MPa, sy: 20 * MPa, txy: 0 });
    expect(g.radius).toBe(0);
    expect(g.centre / MPa).toBe(20);
  });
});

describe('shear-axis conventions', () => {
  it('plots a positive τxy on the x face below the σ axis in both conventions', () => {
    for (const convention of conventions) {
      const x = mohrPlotPoint(state.sx, state.txy, convention);
      const y = mohrPlotPoint(state.sy, -state.txy, convention);
      expect(x.y).toBeLessThan(0);
      expect(y.y).toBeGreaterThan(0);
    }
  });

  it('mirrors the τ axis: the same plot height reads opposite shear', () => {
    expect(shearAxisPositiveDirection('positive-down')).toBe('down');
    expect(shearAxisPositiveDirection('clockwise-up')).toBe('up');
    const below = mohrPlotY(25 * MPa, 'positive-down');
    expect(shearAxisReading(below, 'positive-down') / MPa).toBe(25);
    // In the clockwise-up reading the x face's positive τxy is a counterclockwise shear: −25.
    expect(shearAxisReading(below, 'clockwise-up') / MPa).toBe(-25);
    expect(mohrPlotY(25 * MPa, 'clockwise-up')).toBe(below);
  });

  it('turns the plot counterclockwise by 2θ when the element turns counterclockwise by θ', () => {
    for (const convention of conventions) {
      expect(mohrRotationSense(convention)).toBe(1);
      const g = mohrPlaneGeometry(state);
      const x = mohrPlotPoint(state.sx, state.txy, convention);
      const theta = 20 * degree;
      const turned = rotate(state, theta);
      const xTurned = mohrPlotPoint(turned.sx, turned.txy, convention);
      const before = Math.atan2(x.y, x.x - g.centre);
      const after = Math.atan2(xTurned.y, xTurned.x - g.centre);
      expect((after - before) / degree).toBeCloseTo(40, 9);
    }
  });
});

describe('rotationFromPlotPoint', () => {
  const g = mohrPlaneGeometry(state);

  it('gives θ = θp when X′ is dragged onto p1, in either convention', () => {
    for (const convention of conventions) {
      const theta = rotationFromPlotPoint(state, { x: g.p1, y: 0 }, convention);
      expect(theta).not.toBeNull();
      expect((theta as number) / degree).toBeCloseTo(11.3099, 3);
    }
  });

  it('gives θp − 90° at p2 and θp + 45° at the top of the circle', () => {
    const atP2 = rotationFromPlotPoint(state, { x: g.p2, y: 0 }, 'positive-down');
    expect((atP2 as number) / degree).toBeCloseTo(11.3099 - 90, 3);
    const atTop = rotationFromPlotPoint(state, { x: g.centre, y: g.radius }, 'positive-down');
    expect((atTop as number) / degree).toBeCloseTo(11.3099 + 45, 3);
    // The top point's face carries τx′y′ = −R: it is labelled (C, −R).
    expect(rotate(state, atTop as number).txy / MPa).toBeCloseTo(-65, 6);
  });

  it('inverts the transformation equations for any angle and only needs the direction', () => {
    for (const convention of conventions) {
      for (const deg of [-89, -60, -12.5, 0, 7, 33, 60, 90]) {
        const turned = rotate(state, deg * degree);
        const point = mohrPlotPoint(turned.sx, turned.txy, convention);
        const halfway = { x: (point.x + g.centre) / 2, y: point.y / 2 };
        expect((rotationFromPlotPoint(state, point, convention) as number) / degree).toBeCloseTo(
          deg,
          9,
        );
        expect((rotationFromPlotPoint(state, halfway, convention) as number) / degree).toBeCloseTo(
          deg,
          9,
        );
      }
    }
  });

  it('has no answer at the centre or for a point circle', () => {
    expect(rotationFromPlotPoint(state, { x: g.centre, y: 0 }, 'positive-down')).toBeNull();
    const hydrostatic = { sx: 5 * MPa, sy: 5 * MPa, txy: 0 };
    expect(rotationFromPlotPoint(hydrostatic, { x: 9 * MPa, y: 0 }, 'clockwise-up')).toBeNull();
  });
});

describe('normalizeHalfTurn', () => {
  it('folds angles into (−90°, 90°]', () => {
    expect(normalizeHalfTurn(91 * degree) / degree).toBeCloseTo(-89, 9);
    expect(normalizeHalfTurn(-90 * degree) / degree).toBeCloseTo(90, 9);
    expect(normalizeHalfTurn(90 * degree) / degree).toBeCloseTo(90, 9);
    expect(normalizeHalfTurn(-270.5 * degree) / degree).toBeCloseTo(-90.5 + 180, 9);
    expect(normalizeHalfTurn(0.3)).toBeCloseTo(0.3, 12);
  });
});

describe('createViewTransform', () => {
  const padding = { top: 10, right: 20, bottom: 30, left: 40 };

  it('uses one scale for both axes so circles stay round', () => {
    const view = createViewTransform({
      world: { xMin: -45, xMax: 85, yMin: -65, yMax: 65 },
      width: 500,
      height: 300,
      padding,
    });
    const origin = view.toScreen(0, 0);
    const right = view.toScreen(10, 0);
    const up = view.toScreen(0, 10);
    expect(right.x - origin.x).toBeCloseTo(origin.y - up.y, 12);
    expect(up.y).toBeLessThan(origin.y); // world y up, screen y down
    // Height is the limit: 260 px for 130 units.
    expect(view.scale).toBeCloseTo(2, 12);
  });

  it('centres the world box and widens the visible range in the spare direction', () => {
    const view = createViewTransform({
      world: { xMin: -1, xMax: 1, yMin: -1, yMax: 1 },
      width: 360,
      height: 240,
      padding,
    });
    // Plot box 300 × 200; scale 100; visible x ±1.5, y ±1.
    expect(view.scale).toBeCloseTo(100, 12);
    expect(view.visible.xMin).toBeCloseTo(-1.5, 12);
    expect(view.visible.xMax).toBeCloseTo(1.5, 12);
    expect(view.visible.yMin).toBeCloseTo(-1, 12);
    const centre = view.toScreen(0, 0);
    expect(centre.x).toBeCloseTo(40 + 150, 12);
    expect(centre.y).toBeCloseTo(10 + 100, 12);
  });

  it('keeps a margin free inside the plot box and round-trips points', () => {
    const view = createViewTransform({
      world: { xMin: 0, xMax: 100, yMin: 0, yMax: 50 },
      width: 400,
      height: 400,
      padding: { top: 0, right: 0, bottom: 0, left: 0 },
      margin: { top: 0, right: 50, bottom: 0, left: 50 },
    });
    expect(view.scale).toBeCloseTo(3, 12);
    expect(view.toScreen(0, 25).x).toBeCloseTo(50, 12);
    const back = view.toWorld(view.toScreen(12.5, -7).x, view.toScreen(12.5, -7).y);
    expect(back.x).toBeCloseTo(12.5, 12);
    expect(back.y).toBeCloseTo(-7, 12);
  });
});

describe('clientToViewBox', () => {
  it('undoes the even scaling and centring of preserveAspectRatio="xMidYMid meet"', () => {
    const rect = { left: 10, top: 20, width: 600, height: 300 };
    // viewBox 400 × 400 drawn at 0.75 scale, 150 px of spare width each side.
    const p = clientToViewBox(10 + 150 + 0.75 * 200, 20 + 0.75 * 100, rect, {
      width: 400,
      height: 400,
    });
    expect(p.x).toBeCloseTo(200, 12);
    expect(p.y).toBeCloseTo(100, 12);
  });
});

describe('loadLineFactor', () => {
  const square: Array<[number, number]> = [
    [250, 250],
    [-250, 250],
    [-250, -250],
    [250, -250],
  ];

  it('scales (100, 50) by 2.5 to reach a ±250 square', () => {
    expect(loadLineFactor([100, 50], square)).toBeCloseTo(2.5, 12);
  });

  it('gives a factor below one for a point outside', () => {
    expect(loadLineFactor([500, 0], square)).toBeCloseTo(0.5, 12);
  });

  it('finds the first crossing of a Tresca hexagon (n = Sy / (σA − σB) in the 4th quadrant)', () => {
    const sy = 250;
    const hexagon: Array<[number, number]> = [
      [sy, 0],
      [sy, sy],
      [0, sy],
      [-sy, 0],
      [-sy, -sy],
      [0, -sy],
    ];
    expect(loadLineFactor([100, -100], hexagon)).toBeCloseTo(250 / 200, 12);
    // Through a vertex.
    expect(loadLineFactor([50, 50], hexagon)).toBeCloseTo(5, 12);
  });

  it('returns null for the origin or when the ray misses', () => {
    expect(loadLineFactor([0, 0], square)).toBeNull();
    const rightHalf: Array<[number, number]> = [
      [100, -100],
      [100, 100],
      [200, 100],
      [200, -100],
    ];
    expect(loadLineFactor([-1, 0], rightHalf)).toBeNull();
    expect(loadLineFactor([1, 0], rightHalf)).toBeCloseTo(100, 12);
  });
});

describe('rangeWithOriginIfClose', () => {
  it('takes in zero when that at most doubles the range', () => {
    expect(rangeWithOriginIfClose(40, 80)).toEqual([0, 80]);
    expect(rangeWithOriginIfClose(-80, -40)).toEqual([-80, 0]);
    expect(rangeWithOriginIfClose(-45, 85)).toEqual([-45, 85]);
  });

  it('leaves a range far from zero alone', () => {
    expect(rangeWithOriginIfClose(476, 504)).toEqual([476, 504]);
    expect(rangeWithOriginIfClose(41, 80, 1.6)).toEqual([41, 80]);
  });
});
