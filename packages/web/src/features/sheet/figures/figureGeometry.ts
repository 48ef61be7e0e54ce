/**
 * Pure geometry of the sheet figures: the world↔screen transform with equal aspect ratio, the
 * mapping of stress points onto a Mohr's-circle plot for each shear-axis convention, the element
 * rotation that belongs to a dragged point, and where a proportional load line leaves a failure
 * envelope.
 *
 * Sign convention of the numbers (the sheet's): tension positive; τxy positive when it acts in
 * +y on the +x face; angles counterclockwise from x. World coordinates are y-up; screen (SVG)
 * coordinates are y-down.
 */

import type { Point2, ShearAxisConvention } from './figureTypes';

// ---------------------------------------------------------------------------------------------
// World ↔ screen

/** A rectangle in world coordinates (y up). */
export interface WorldBox {
  xMin: number;
  xMax: number;
  yMin: number;
  yMax: number;
}

/** Space in screen units (px) around a rectangle. */
export interface Insets {
  top: number;
  right: number;
  bottom: number;
  left: number;
}

/** A rectangle in screen coordinates (y down). */
export interface ScreenBox {
  left: number;
  top: number;
  width: number;
  height: number;
}

export interface ViewTransformOptions {
  /** The world rectangle that must be visible; it is centred in the plot. */
  world: WorldBox;
  /** Size of the whole figure in screen units. */
  width: number;
  height: number;
  /** Space for tick labels, title and footer: the plot box is what is left. */
  padding: Insets;
  /** Extra space inside the plot box around `world`, e.g. room for point labels. */
  margin?: Insets;
}

/**
 * A world↔screen mapping with one scale for both axes, so a circle in stress space is a circle
 * on screen.
 */
export interface ViewTransform {
  /** Screen units per world unit, the same horizontally and vertically. */
  scale: number;
  /** The plot box on screen. */
  plot: ScreenBox;
  /** The world rectangle that the whole plot box shows (at least `world`). */
  visible: WorldBox;
  toScreen(x: number, y: number): Point2;
  toWorld(screenX: number, screenY: number): Point2;
}

const noInsets: Insets = { top: 0, right: 0, bottom: 0, left: 0 };

/**
 * Fit `world` into the plot box with equal aspect ratio, centred; the spare room in the other
 * direction widens the visible range. A zero-width world box gets a unit span so the scale
 * stays finite.
 *
 * @example
 * const view = createViewTransform({ world: { xMin: -1, xMax: 1, yMin: -1, yMax: 1 },
 *   width: 300, height: 200, padding: { top: 0, right: 0, bottom: 0, left: 0 } });
 * view.scale; // 100 (the height limits), so x from -1.5 to 1.5 is visible
 */
export function createViewTransform(options: ViewTransformOptions): ViewTransform {
  const { world, width, height, padding } = options;
  const margin = options.margin ?? noInsets;
  const plot: ScreenBox = {
    left: padding.left,
    top: padding.top,
    width: Math.max(1, width - padding.left - padding.right),
    height: Math.max(1, height - padding.top - padding.bottom),
  };
  const innerWidth = Math.max(1, plot.width - margin.left - margin.right);
  const innerHeight = Math.max(1, plot.height - margin.top - margin.bottom);
  const spanX = world.xMax - world.xMin || 1;
  const spanY = world.yMax - world.yMin || 1;
  const scale = Math.min(innerWidth / spanX, innerHeight / spanY);

  // The world box's centre sits at the centre of the inner box.
  const centreX = (world.xMin + world.xMax) / 2;
  const centreY = (world.yMin + world.yMax) / 2;
  const screenCentreX = plot.left + margin.left + innerWidth / 2;
  const screenCentreY = plot.top + margin.top + innerHeight / 2;

  const toScreen = (x: number, y: number): Point2 => ({
    x: screenCentreX + (x - centreX) * scale,
    y: screenCentreY - (y - centreY) * scale,
  });
  const toWorld = (screenX: number, screenY: number): Point2 => ({
    x: centreX + (screenX - screenCentreX) / scale,
    y: centreY - (screenY - screenCentreY) / scale,
  });
  const topLeft = toWorld(plot.left, plot.top);
  const bottomRight = toWorld(plot.left + plot.width, plot.top + plot.height);
  return {
    scale,
    plot,
    visible: { xMin: topLeft.x, xMax: bottomRight.x, yMin: bottomRight.y, yMax: topLeft.y },
    toScreen,
    toWorld,
  };
}

/**
 * Pointer position (client pixels) to SVG user units for an `<svg>` with a `viewBox` at the
 * origin and the default `preserveAspectRatio="xMidYMid meet"`: the drawing is scaled evenly and
 * centred in the element's box.
 */
export function clientToViewBox(
  clientX: number,
  clientY: number,
  rect: { left: number; top: number; width: number; height: number },
  viewBox: { width: number; height: number },
): Point2 {
  const scale = Math.min(rect.width / viewBox.width, rect.height / viewBox.height) || 1;
  const offsetX = (rect.width - viewBox.width * scale) / 2;
  const offsetY = (rect.height - viewBox.height * scale) / 2;
  return {
    x: (clientX - rect.left - offsetX) / scale,
    y: (clientY - rect.top - offsetY) / scale,
  };
}

/**
 * A horizontal range widened to take in 0 when the result is at most `ratio` times as wide
 * (seeing which side of zero a stress lies helps, but not at the cost of a tiny drawing).
 *
 * @example
 * rangeWithOriginIfClose(40, 80);  // [0, 80]: twice as wide
 * rangeWithOriginIfClose(476, 504); // [476, 504]: zero is far away
 */
export function rangeWithOriginIfClose(min: number, max: number, ratio = 2): [number, number] {
  const width = max - min;
  if (min > 0 && max <= ratio * width) return [0, max];
  if (max < 0 && -min <= ratio * width) return [min, 0];
  return [min, max];
}

// ---------------------------------------------------------------------------------------------
// Mohr's circle of a plane state

/** A plane stress state in Pa, sheet sign convention. */
export interface PlaneStress {
  sx: number;
  sy: number;
  txy: number;
}

export interface MohrPlaneGeometry {
  /** Centre (σx + σy) / 2, Pa. */
  centre: number;
  /** Radius √(((σx − σy)/2)² + τxy²) = in-plane maximum shear, Pa. */
  radius: number;
  /** In-plane principal stresses, p1 ≥ p2, Pa. */
  p1: number;
  p2: number;
  /** Angle from x to the p1 direction, counterclockwise, in (−π/2, π/2], rad. */
  thetaP: number;
}

/**
 * Centre, radius and principal values of the plane state's Mohr's circle
 * (tan 2θp = 2τxy / (σx − σy)).
 *
 * @example
 * mohrPlaneGeometry({ sx: 80e6, sy: -40e6, txy: 25e6 });
 * // centre 20e6, radius 65e6, p1 85e6, p2 -45e6, thetaP 0.1974 rad (11.3°)
 */
export function mohrPlaneGeometry(state: PlaneStress): MohrPlaneGeometry {
  const centre = (state.sx + state.sy) / 2;
  const halfDifference = (state.sx - state.sy) / 2;
  const radius = Math.hypot(halfDifference, state.txy);
  const thetaP = normalizeHalfTurn(Math.atan2(state.txy, halfDifference) / 2);
  return { centre, radius, p1: centre + radius, p2: centre - radius, thetaP };
}

/**
 * Plot height (world y, up) of a Mohr point labelled (σ, τ).
 *
 * A point's label τ is the shear in the sheet convention on the face it stands for: τxy for the
 * x face (point X), −τxy for the y face (point Y), and generally τx'y' for the x' face of axes
 * turned by θ (point X').
 *
 * - `positive-down`: the τ axis points down and reads τ directly, so the point is drawn at
 *   y = −τ (a positive τxy is plotted below the σ axis).
 * - `clockwise-up`: the axis reads τcw, the face shear taken positive when it turns the element
 *   clockwise, and draws it upward. Positive τxy on the +x face (with −τxy on the −x face) turns
 *   the element counterclockwise, so on the x face τcw = −τxy; on the y face the pair turns it
 *   clockwise, so τcw = +τxy = −(label τ of Y). Hence τcw = −τ for every point, drawn at y = τcw.
 *
 * Both therefore draw every point at y = −τ: the conventions differ in which way the axis points
 * and what its ticks read (`shearAxisReading`), never in where a point sits or what it is
 * labelled.
 */
export function mohrPlotY(tauLabel: number, convention: ShearAxisConvention): number {
  switch (convention) {
    case 'positive-down':
      return -tauLabel;
    case 'clockwise-up': {
      const clockwiseShear = -tauLabel;
      return clockwiseShear;
    }
    default:
      return assertNever(convention);
  }
}

/**
 * What the τ axis reads at plot height `plotY` (world y, up): τ positive downward for
 * `positive-down`, τcw positive upward for `clockwise-up`. The tick labels are these readings.
 */
export function shearAxisReading(plotY: number, convention: ShearAxisConvention): number {
  switch (convention) {
    case 'positive-down':
      return -plotY;
    case 'clockwise-up':
      return plotY;
    default:
      return assertNever(convention);
  }
}

/** Which way the τ axis's positive end points on screen. */
export function shearAxisPositiveDirection(convention: ShearAxisConvention): 'up' | 'down' {
  return shearAxisReading(1, convention) > 0 ? 'up' : 'down';
}

/** World position of the Mohr point labelled (σ, τ). */
export function mohrPlotPoint(
  sigma: number,
  tauLabel: number,
  convention: ShearAxisConvention,
): Point2 {
  return { x: sigma, y: mohrPlotY(tauLabel, convention) };
}

/**
 * Turning sense on the plot when the element turns counterclockwise: +1 when X' moves
 * counterclockwise (on screen) by 2θ as the element turns by θ, −1 when it moves clockwise.
 *
 * Derivation: with φ = atan2(τxy, σx − C), the rotated x face has σx' = C + R cos(φ − 2θ) and
 * τx'y' = R sin(φ − 2θ). Its point is drawn at (C + R cos(φ − 2θ), k R sin(φ − 2θ)) with
 * k = mohrPlotY(1), so its plot angle is k (φ − 2θ) and moves by −2kθ.
 */
export function mohrRotationSense(convention: ShearAxisConvention): 1 | -1 {
  return mohrPlotY(1, convention) < 0 ? 1 : -1;
}

/**
 * The element rotation θ (rad, counterclockwise, in (−π/2, π/2]) that brings the x-face point X
 * of `state` to the plot direction of `plotPoint` (world coordinates; only its direction from
 * the centre counts). `null` at the centre or for a circle of zero radius.
 *
 * Inverts the relation in `mohrRotationSense`: plot angle ψ = k (φ − 2θ), so θ = (φ − kψ) / 2
 * (k = ±1 is its own inverse). Dragging X' onto p1 therefore gives θ = θp.
 */
export function rotationFromPlotPoint(
  state: PlaneStress,
  plotPoint: Point2,
  convention: ShearAxisConvention,
): number | null {
  const { centre, radius } = mohrPlaneGeometry(state);
  const dx = plotPoint.x - centre;
  const dy = plotPoint.y;
  if (radius === 0 || Math.hypot(dx, dy) === 0) return null;
  const k = mohrPlotY(1, convention);
  const phi = Math.atan2(state.txy, state.sx - centre);
  const psi = Math.atan2(dy, dx);
  return normalizeHalfTurn((phi - k * psi) / 2);
}

/**
 * An angle folded into (−π/2, π/2]. A stress state repeats every half turn, so this is the
 * whole range of distinct rotations.
 */
export function normalizeHalfTurn(angleRad: number): number {
  let a = angleRad % Math.PI;
  if (a <= -Math.PI / 2) a += Math.PI;
  if (a > Math.PI / 2) a -= Math.PI;
  // Snap rounding noise at the ends (e.g. π/2 + 1e-16) to the included end.
  if (Math.abs(a + Math.PI / 2) < 1e-12) a = Math.PI / 2;
  return a;
}

// ---------------------------------------------------------------------------------------------
// Proportional load line and a failure envelope

/**
 * The factor n at which the load line from the origin through `point` meets the closed polyline
 * `polygon` first: the smallest n > 0 with n·point on one of its segments (the segment from the
 * last vertex back to the first included). `null` when the point is the origin or the ray misses
 * (an envelope open in that direction).
 *
 * @example
 * const square: Array<[number, number]> = [[250, 250], [-250, 250], [-250, -250], [250, -250]];
 * loadLineFactor([100, 50], square); // 2.5
 */
export function loadLineFactor(
  point: readonly [number, number],
  polygon: ReadonlyArray<readonly [number, number]>,
): number | null {
  const [dx, dy] = point;
  const size = Math.max(Math.abs(dx), Math.abs(dy));
  if (size === 0 || !Number.isFinite(size) || polygon.length < 2) return null;

  let best: number | null = null;
  for (let i = 0; i < polygon.length; i++) {
    const a = polygon[i];
    const b = polygon[(i + 1) % polygon.length];
    if (a === undefined || b === undefined) continue;
    const ex = b[0] - a[0];
    const ey = b[1] - a[1];
    // Solve t·d = a + u·e for t (along the ray) and u (along the segment).
    const denominator = dx * ey - dy * ex;
    const segmentScale = Math.max(Math.abs(ex), Math.abs(ey));
    if (Math.abs(denominator) <= 1e-12 * size * segmentScale) continue; // parallel or empty
    const t = (a[0] * ey - a[1] * ex) / denominator;
    const u = (a[0] * dy - a[1] * dx) / denominator;
    if (t > 1e-12 && u >= -1e-9 && u <= 1 + 1e-9 && (best === null || t < best)) best = t;
  }
  return best;
}

function assertNever(value: never): never {
  throw new Error(`unexpected value ${String(value)}`);
}
