/**
 * Everything `MohrCircle` draws, computed from plain numbers: the equal-aspect view, the axes,
 * the circle, its named points with their labels, the rotated diameter and the 2θ arc.
 * Kept apart from the component so the geometry is testable without rendering.
 */

import { viewWithAxes, type AxesLayout } from './axesLayout';
import {
  mohrPlaneGeometry,
  mohrPlotPoint,
  mohrPlotY,
  mohrRotationSense,
  rangeWithOriginIfClose,
  shearAxisPositiveDirection,
  type MohrPlaneGeometry,
  type ViewTransform,
  type WorldBox,
} from './figureGeometry';
import { labelFontSize } from './figurePalette';
import type { DisplayUnit, Point2, ShearAxisConvention } from './figureTypes';
import { displayResolution, formatAngle, formatStress, formatStressNumber } from './formatQuantity';
import {
  estimateTextWidth,
  fanDirections,
  placeLabels,
  type LabelRequest,
  type PlacedLabel,
} from './placeLabels';

/** The state on axes turned by `angleRad` (counterclockwise), values in Pa. */
export interface RotatedPlaneState {
  angleRad: number;
  sxr: number;
  syr: number;
  txyr: number;
}

export interface MohrCircleInput {
  sx: number;
  sy: number;
  txy: number;
  rotated?: RotatedPlaneState;
  unit: DisplayUnit;
  shearAxis: ShearAxisConvention;
  title?: string;
  width: number;
  height: number;
}

export type MohrPointId = 'X' | 'Y' | 'p1' | 'p2' | 'top' | 'bottom' | 'C' | 'Xr' | 'Yr';

export interface MohrPlotPoint {
  id: MohrPointId;
  /** World position (σ, plot height), Pa. */
  world: Point2;
  /** Screen position. */
  screen: Point2;
  /** The point's label values (σ, τ) in Pa, sheet convention. */
  sigma: number;
  tau: number;
}

export interface MohrCircleLayout {
  geometry: MohrPlaneGeometry;
  /** True for a circle of zero radius (σx = σy, τxy = 0). */
  degenerate: boolean;
  view: ViewTransform;
  axes: AxesLayout;
  circle: { cx: number; cy: number; r: number };
  points: Partial<Record<MohrPointId, MohrPlotPoint>>;
  labels: PlacedLabel[];
  /** The axis captions, placed after the point labels. */
  captions: PlacedLabel[];
  /** SVG path of the 2θ arc and where its arrowhead points, or null when θ is about zero. */
  arc: { d: string; head: string } | null;
  titleY: number;
  footer: Array<{ text: string; y: number }>;
  description: string;
}

const footerLineHeight = 15;
const pointName: Record<MohrPointId, string> = {
  X: 'X',
  Y: 'Y',
  Xr: 'X′',
  Yr: 'Y′',
  p1: 'p1',
  p2: 'p2',
  top: 'τmax',
  bottom: 'τmax',
  C: 'C',
};
const footerLines = 2;

/** Lay out a Mohr's circle of the plane state (see `MohrCircle` for the meaning of the props). */
export function mohrCircleLayout(input: MohrCircleInput): MohrCircleLayout {
  const { sx, sy, txy, rotated, unit, shearAxis, width, height } = input;
  const geometry = mohrPlaneGeometry({ sx, sy, txy });
  const { centre, radius } = geometry;
  const magnitude = Math.max(Math.abs(sx), Math.abs(sy), Math.abs(txy), Math.abs(centre) + radius);
  // A circle smaller than the labels can resolve (three figures of the largest stress) is drawn
  // and reported as a point.
  const degenerate = radius <= displayResolution * magnitude;

  const reference = Math.max(magnitude, Math.abs(rotated?.sxr ?? 0), Math.abs(rotated?.syr ?? 0));
  const n = (valuePa: number) => formatStressNumber(valuePa, unit, { reference });
  const pair = (p: { sigma: number; tau: number }) => `(${n(p.sigma)}, ${n(p.tau)}) ${unit.label}`;
  const labelText: Record<MohrPointId, (p: { sigma: number; tau: number }) => string> = {
    X: (p) => (degenerate ? `X = Y = C ${pair(p)}` : `X ${pair(p)}`),
    Y: (p) => `Y ${pair(p)}`,
    Xr: (p) => `X′ ${pair(p)}`,
    Yr: (p) => `Y′ ${pair(p)}`,
    p1: (p) => `p1 ${n(p.sigma)} ${unit.label}`,
    p2: (p) => `p2 ${n(p.sigma)} ${unit.label}`,
    top: (p) => `τmax ${pair(p)}`,
    bottom: (p) => `τmax ${pair(p)}`,
    C: (p) => `C ${n(p.sigma)} ${unit.label}`,
  };

  // Room beside the circle for the widest side label (X, Y, X′, Y′, p1, p2), within reason.
  const sideLabels: Array<[MohrPointId, number, number]> = [
    ['X', sx, txy],
    ['Y', sy, -txy],
    ['p1', geometry.p1, 0],
    ['p2', geometry.p2, 0],
    ...(rotated
      ? ([
          ['Xr', rotated.sxr, rotated.txyr],
          ['Yr', rotated.syr, -rotated.txyr],
        ] as Array<[MohrPointId, number, number]>)
      : []),
  ];
  const widestSideLabel = Math.max(
    ...sideLabels.map(([id, sigma, tau]) =>
      estimateTextWidth(labelText[id]({ sigma, tau }), labelFontSize),
    ),
  );
  const padding = {
    top: input.title ? 26 : 10,
    right: 10,
    bottom: 24 + footerLines * footerLineHeight,
    left: 44,
  };
  const positiveDown = shearAxisPositiveDirection(shearAxis) === 'down';
  const sideMargin = Math.min(
    Math.max(widestSideLabel + 14, 56),
    0.27 * (width - padding.left - padding.right),
  );
  const { view, axes } = viewWithAxes(
    {
      world: mohrWorldBox(geometry, degenerate, unit),
      width,
      height,
      padding,
      // Room above and below for the τmax labels and the τ caption at the axis's positive end;
      // the same both ways so a change of convention moves nothing.
      margin: { top: 40, right: sideMargin, bottom: 40, left: sideMargin },
    },
    {
      unit,
      xCaption: `σ (${unit.label})`,
      yCaption: positiveDown
        ? `τ (${unit.label}) positive down`
        : `τ (${unit.label}) clockwise positive, up`,
      ySign: positiveDown ? -1 : 1,
      fontSize: labelFontSize,
    },
  );

  const centreScreen = view.toScreen(centre, 0);
  const circle = { cx: centreScreen.x, cy: centreScreen.y, r: radius * view.scale };

  // A point's label τ from its plot height: mohrPlotY is linear and odd, so τ = y / mohrPlotY(1).
  const tauAt = (plotY: number) => plotY / mohrPlotY(1, shearAxis);
  const point = (id: MohrPointId, sigma: number, tau: number): MohrPlotPoint => {
    const world = mohrPlotPoint(sigma, tau, shearAxis);
    return { id, world, screen: view.toScreen(world.x, world.y), sigma, tau: tau === 0 ? 0 : tau };
  };

  const points: Partial<Record<MohrPointId, MohrPlotPoint>> = {
    X: point('X', sx, txy),
    Y: point('Y', sy, -txy),
    C: point('C', centre, 0),
  };
  if (!degenerate) {
    points.p1 = point('p1', geometry.p1, 0);
    points.p2 = point('p2', geometry.p2, 0);
    points.top = point('top', centre, tauAt(radius));
    points.bottom = point('bottom', centre, tauAt(-radius));
    if (rotated) {
      points.Xr = point('Xr', rotated.sxr, rotated.txyr);
      points.Yr = point('Yr', rotated.syr, -rotated.txyr);
    }
  }

  const outward = (p: MohrPlotPoint) =>
    Math.atan2(p.screen.y - circle.cy, p.screen.x - circle.cx) || 0;
  const labelOrder: Array<{ id: MohrPointId; base: (p: MohrPlotPoint) => number }> = degenerate
    ? [{ id: 'X', base: () => -Math.PI / 4 }]
    : [
        { id: 'X', base: outward },
        { id: 'Y', base: outward },
        { id: 'Xr', base: outward },
        { id: 'Yr', base: outward },
        { id: 'p1', base: () => 0 },
        { id: 'p2', base: () => Math.PI },
        { id: 'top', base: () => -Math.PI / 2 },
        { id: 'bottom', base: () => Math.PI / 2 },
        { id: 'C', base: () => Math.PI / 2 },
      ];

  // Points that fall on the same spot (Y on the top of a pure-shear circle, X′ dragged onto p1)
  // share one label: "Y = τmax (0.0, −50.0) MPa".
  const groups: Array<{ id: MohrPointId; members: MohrPointId[]; base: number }> = [];
  for (const { id, base } of labelOrder) {
    const p = points[id];
    if (!p) continue;
    const same = groups.find((group) => {
      const q = points[group.id];
      return q !== undefined && Math.hypot(q.screen.x - p.screen.x, q.screen.y - p.screen.y) < 1;
    });
    if (same) same.members.push(id);
    else groups.push({ id, members: [id], base: base(p) });
  }
  const requests: LabelRequest[] = groups.map(({ id, members, base }) => {
    const p = points[id] as MohrPlotPoint;
    const single = members.every((member) => member === 'p1' || member === 'p2' || member === 'C');
    const text =
      members.length === 1
        ? labelText[id](p)
        : `${members.map((member) => pointName[member]).join(' = ')} ` +
          (single ? `${n(p.sigma)} ${unit.label}` : pair(p));
    return {
      id,
      text,
      x: p.screen.x,
      y: p.screen.y,
      directions: fanDirections(base),
      fontSize: labelFontSize,
    };
  });

  const arc =
    rotated && !degenerate ? rotationArc(circle, points, rotated.angleRad, shearAxis) : null;
  if (arc) {
    requests.push({
      id: 'arc',
      text: arc.label,
      x: arc.labelAt.x,
      y: arc.labelAt.y,
      directions: fanDirections(arc.labelDirection),
      gap: 3,
      fontSize: labelFontSize,
    });
  }

  const segments = [...axes.obstacleSegments];
  for (const [a, b] of [
    [points.X, points.Y],
    [points.Xr, points.Yr],
  ] as const) {
    if (a && b) segments.push({ x1: a.screen.x, y1: a.screen.y, x2: b.screen.x, y2: b.screen.y });
  }
  if (arc) segments.push(...arc.outline);
  const placed = placeLabels([...requests, ...axes.captionRequests], {
    rings: degenerate ? [] : [circle],
    discs: Object.values(points).map((p) => ({ cx: p.screen.x, cy: p.screen.y, r: 5 })),
    segments,
    bounds: {
      x0: axes.plot.x0 + 2,
      y0: axes.plot.y0 + 2,
      x1: axes.plot.x1 - 2,
      y1: axes.plot.y1 - 2,
    },
  });

  const footerTop = height - footerLines * footerLineHeight + 4;
  const stress = (valuePa: number) => formatStress(valuePa, unit, { reference });
  const footerText = degenerate
    ? [
        `Hydrostatic in plane: σx = σy = ${stress(centre)}, τxy = 0` +
          (radius === 0 ? '.' : ' (within display precision).'),
        'The circle is a point: every direction is principal, no plane carries shear.',
      ]
    : [
        [
          `C = ${stress(centre)}`,
          `R = τmax in-plane = ${stress(radius)}`,
          `θp = ${formatAngle(geometry.thetaP)}`,
          ...(rotated ? [`θ = ${formatAngle(rotated.angleRad)}`] : []),
        ].join('  ·  '),
        'Labels (σ, τ): X carries τxy, Y carries −τxy; tension positive, θ counterclockwise from x.',
      ];
  const footer = footerText.map((text, index) => ({
    text,
    y: footerTop + index * footerLineHeight + 8,
  }));

  const description = degenerate
    ? `Mohr's circle of a hydrostatic plane state: a point at σ = ${stress(centre)}.`
    : `Mohr's circle: centre ${stress(centre)}, radius ${stress(radius)}, ` +
      `p1 ${stress(geometry.p1)}, p2 ${stress(geometry.p2)}, θp ${formatAngle(geometry.thetaP)}.`;

  return {
    geometry,
    degenerate,
    view,
    axes,
    circle,
    points,
    labels: placed.filter((label) => !label.id.endsWith('-caption')),
    captions: placed.filter((label) => label.id.endsWith('-caption')),
    arc: arc ? { d: arc.d, head: arc.head } : null,
    titleY: 16,
    footer,
    description,
  };
}

/** The circle (or a small square round a point circle), taking in σ = 0 when it is close. */
function mohrWorldBox(
  geometry: MohrPlaneGeometry,
  degenerate: boolean,
  unit: DisplayUnit,
): WorldBox {
  const { centre, radius } = geometry;
  const half = degenerate ? (centre !== 0 ? Math.abs(centre) / 2 : 1 / unit.perPa) : radius;
  const [xMin, xMax] = rangeWithOriginIfClose(centre - half, centre + half, 1.6);
  return { xMin, xMax, yMin: -half, yMax: half };
}

/**
 * The arc from X to X′ around the centre, turning by 2θ in the plot's rotation sense, with an
 * arrowhead at X′'s end and a spot for its label.
 */
function rotationArc(
  circle: { cx: number; cy: number; r: number },
  points: Partial<Record<MohrPointId, MohrPlotPoint>>,
  angleRad: number,
  shearAxis: ShearAxisConvention,
): {
  d: string;
  head: string;
  label: string;
  labelAt: Point2;
  labelDirection: number;
  /** The arc as short segments, for the label placer. */
  outline: Array<{ x1: number; y1: number; x2: number; y2: number }>;
} | null {
  const x = points.X;
  if (!x || Math.abs(angleRad) < (0.5 * Math.PI) / 180) return null;
  // World angles (counterclockwise, y up) around the centre.
  const start = Math.atan2(-(x.screen.y - circle.cy), x.screen.x - circle.cx);
  const sweep = 2 * angleRad * mohrRotationSense(shearAxis);
  const end = start + sweep;
  const r = Math.max(16, circle.r * 0.32);
  const at = (angle: number, radius = r): Point2 => ({
    x: circle.cx + radius * Math.cos(angle),
    y: circle.cy - radius * Math.sin(angle),
  });
  const a = at(start);
  const b = at(end);
  const round = (v: number) => Number(v.toFixed(2));
  // SVG sweep flag 0 turns counterclockwise on screen, which is counterclockwise in the world.
  const sweepFlag = sweep > 0 ? 0 : 1;
  const largeArc = Math.abs(sweep) > Math.PI ? 1 : 0;
  const d = `M${round(a.x)} ${round(a.y)}A${round(r)} ${round(r)} 0 ${largeArc} ${sweepFlag} ${round(b.x)} ${round(b.y)}`;

  // Arrowhead along the tangent at the end, pointing in the direction of travel.
  const direction = Math.sign(sweep);
  const tangent = { x: -Math.sin(end) * direction, y: -Math.cos(end) * direction }; // screen
  const normal = { x: Math.cos(end), y: -Math.sin(end) };
  const size = 6;
  const tip = b;
  const back = { x: tip.x - tangent.x * size, y: tip.y - tangent.y * size };
  const head =
    `M${round(tip.x)} ${round(tip.y)}` +
    `L${round(back.x + normal.x * size * 0.45)} ${round(back.y + normal.y * size * 0.45)}` +
    `L${round(back.x - normal.x * size * 0.45)} ${round(back.y - normal.y * size * 0.45)}Z`;

  const outline = Array.from({ length: 8 }, (_, i) => {
    const p = at(start + (sweep * i) / 8);
    const q = at(start + (sweep * (i + 1)) / 8);
    return { x1: p.x, y1: p.y, x2: q.x, y2: q.y };
  });
  const middle = start + sweep / 2;
  return {
    d,
    head,
    label: `2θ = ${formatAngle(2 * angleRad)}`,
    labelAt: at(middle),
    labelDirection: -middle,
    outline,
  };
}
