/**
 * Everything `MohrCircles3D` draws, from the three principal stresses: the three circles, the
 * admissible region between them, the principal points, the absolute maximum shear and an
 * optional (σ, τ) point on some plane.
 */

import { viewWithAxes, type AxesLayout } from './axesLayout';
import {
  mohrPlotY,
  rangeWithOriginIfClose,
  shearAxisPositiveDirection,
  type ViewTransform,
} from './figureGeometry';
import { labelFontSize } from './figurePalette';
import type { DisplayUnit, Point2, ShearAxisConvention } from './figureTypes';
import { displayResolution, formatStress, formatStressNumber } from './formatQuantity';
import { fanDirections, placeLabels, type LabelRequest, type PlacedLabel } from './placeLabels';

export interface MohrCircles3DInput {
  s1: number;
  s2: number;
  s3: number;
  unit: DisplayUnit;
  shearAxis: ShearAxisConvention;
  point?: { sigma: number; tau: number };
  title?: string;
  width: number;
  height: number;
}

export type PrincipalCircleId = 'c13' | 'c12' | 'c23';

export interface PrincipalCircle {
  id: PrincipalCircleId;
  /** Centre and radius in Pa. */
  centre: number;
  radius: number;
  /** Screen centre and radius. */
  cx: number;
  cy: number;
  r: number;
}

export interface MohrCircles3DLayout {
  /** The principal stresses sorted s1 ≥ s2 ≥ s3, Pa. */
  principal: [number, number, number];
  /** (s1 − s3) / 2, Pa. */
  tauMax: number;
  view: ViewTransform;
  axes: AxesLayout;
  circles: PrincipalCircle[];
  /**
   * The admissible region as one path: the big circle and the two small ones, to be filled with
   * `fill-rule="evenodd"` so the small circles' insides stay empty. Null when it has no area.
   */
  regionPath: string | null;
  points: Array<{ id: string; screen: Point2 }>;
  /** Where the optional point lies: inside the region (on some plane), or not. */
  pointAdmissible: boolean | null;
  labels: PlacedLabel[];
  captions: PlacedLabel[];
  titleY: number;
  footer: Array<{ text: string; y: number }>;
  description: string;
}

const footerLineHeight = 15;
const footerLines = 3;

export function mohrCircles3DLayout(input: MohrCircles3DInput): MohrCircles3DLayout {
  const { unit, shearAxis, point, width, height } = input;
  // Sorted defensively: the figure must not draw nonsense from unsorted input.
  const [s1, s2, s3] = [input.s1, input.s2, input.s3].sort((a, b) => b - a) as [
    number,
    number,
    number,
  ];
  const tauMax = (s1 - s3) / 2;
  const magnitude = Math.max(
    Math.abs(s1),
    Math.abs(s3),
    Math.abs(point?.sigma ?? 0),
    Math.abs(point?.tau ?? 0),
  );
  // Differences the labels cannot resolve count as equal (see `displayResolution`).
  const tolerance = displayResolution * magnitude;
  const hydrostatic = tauMax <= tolerance;

  const half = hydrostatic ? (s1 !== 0 ? Math.abs(s1) / 2 : 1 / unit.perPa) : tauMax;
  const centre = (s1 + s3) / 2;
  let [xMin, xMax] = rangeWithOriginIfClose(centre - half, centre + half, 1.6);
  let yHalf = half;
  if (point) {
    xMin = Math.min(xMin, point.sigma);
    xMax = Math.max(xMax, point.sigma);
    yHalf = Math.max(yHalf, Math.abs(point.tau));
  }
  const down = shearAxisPositiveDirection(shearAxis) === 'down';
  const padding = {
    top: input.title ? 26 : 10,
    right: 10,
    bottom: 24 + footerLines * footerLineHeight,
    left: 44,
  };
  const { view, axes } = viewWithAxes(
    {
      world: { xMin, xMax, yMin: -yHalf, yMax: yHalf },
      width,
      height,
      padding,
      // Room above and below for the τmax label and the τ caption at the axis's positive end.
      margin: { top: 40, right: 70, bottom: 40, left: 70 },
    },
    {
      unit,
      xCaption: `σ (${unit.label})`,
      yCaption: down
        ? `τ (${unit.label}) positive down`
        : `τ (${unit.label}) clockwise positive, up`,
      ySign: down ? -1 : 1,
      fontSize: labelFontSize,
    },
  );

  const circle = (id: PrincipalCircleId, a: number, b: number): PrincipalCircle => {
    const c = (a + b) / 2;
    const radius = Math.abs(a - b) / 2;
    const screen = view.toScreen(c, 0);
    return { id, centre: c, radius, cx: screen.x, cy: screen.y, r: radius * view.scale };
  };
  const big = hydrostatic ? null : circle('c13', s1, s3);
  // A small circle of no size is a point, and the other one then is the big circle: neither is
  // drawn, and the admissible region has no area (two principal stresses are equal).
  const small = hydrostatic
    ? []
    : [circle('c12', s1, s2), circle('c23', s2, s3)].filter(
        (c) => c.radius > tolerance && c.radius < tauMax - tolerance,
      );
  const circles = big ? [big, ...small] : [];
  const regionHasArea = big !== null && small.length === 2;
  const regionPath = regionHasArea ? circles.map(circlePath).join('') : null;

  const n = (valuePa: number) => formatStressNumber(valuePa, unit, { reference: magnitude });
  const requests: LabelRequest[] = [];
  const points: MohrCircles3DLayout['points'] = [];
  const principalIds = ['s1', 's2', 's3'] as const;
  const principalLabels = hydrostatic
    ? [{ id: 's1', text: `σ1 = σ2 = σ3 ${n(s1)} ${unit.label}`, value: s1, base: -Math.PI / 4 }]
    : principalIds.map((id, index) => {
        const value = [s1, s2, s3][index] as number;
        // σ2 sits between the small circles: its label goes above or below the axis.
        const base = index === 0 ? 0 : index === 2 ? Math.PI : Math.PI / 2;
        return { id, text: `σ${index + 1} ${n(value)} ${unit.label}`, value, base };
      });
  for (const label of principalLabels) {
    const screen = view.toScreen(label.value, 0);
    points.push({ id: label.id, screen });
    requests.push({
      id: label.id,
      text: label.text,
      x: screen.x,
      y: screen.y,
      directions: fanDirections(label.base),
      fontSize: labelFontSize,
    });
  }
  if (!hydrostatic) {
    // The absolute maximum shear: the top of the big circle.
    const top = view.toScreen(centre, tauMax);
    points.push({ id: 'tauMax', screen: top });
    requests.push({
      id: 'tauMax',
      text: `τmax ${n(tauMax)} ${unit.label}`,
      x: top.x,
      y: top.y,
      directions: fanDirections(-Math.PI / 2),
      fontSize: labelFontSize,
    });
  }

  let pointAdmissible: boolean | null = null;
  if (point) {
    const screen = view.toScreen(point.sigma, mohrPlotY(point.tau, shearAxis));
    points.push({ id: 'point', screen });
    pointAdmissible = isAdmissible(point.sigma, Math.abs(point.tau), s1, s2, s3, tolerance);
    requests.push({
      id: 'point',
      text: `(σ, τ) = (${n(point.sigma)}, ${n(point.tau)}) ${unit.label}`,
      x: screen.x,
      y: screen.y,
      directions: fanDirections(Math.PI / 4),
      fontSize: labelFontSize,
    });
  }

  const placed = placeLabels([...requests, ...axes.captionRequests], {
    rings: circles.filter((c) => c.r > 0).map((c) => ({ cx: c.cx, cy: c.cy, r: c.r })),
    discs: points.map((p) => ({ cx: p.screen.x, cy: p.screen.y, r: 5 })),
    segments: axes.obstacleSegments,
    bounds: {
      x0: axes.plot.x0 + 2,
      y0: axes.plot.y0 + 2,
      x1: axes.plot.x1 - 2,
      y1: axes.plot.y1 - 2,
    },
  });

  const stress = (valuePa: number) => formatStress(valuePa, unit, { reference: magnitude });
  const first = hydrostatic
    ? `Hydrostatic: σ1 = σ2 = σ3 = ${stress(s1)}. The three circles are one point; no plane carries shear.`
    : `τmax = (σ1 − σ3) / 2 = ${stress(tauMax)}`;
  const second = hydrostatic
    ? ''
    : !regionHasArea
      ? 'Two principal stresses are equal: every plane’s (σ, τ) lies on the circle itself.'
      : 'Hatched: the (σ, τ) pairs found on some plane through the point.';
  const pointNote =
    pointAdmissible === false
      ? 'The marked (σ, τ) lies outside the hatched region: no plane carries that pair.'
      : '';
  const footerTop = height - footerLines * footerLineHeight + 4;
  const footer = [first, second, pointNote]
    .filter((text) => text !== '')
    .map((text, index) => ({ text, y: footerTop + index * footerLineHeight + 8 }));

  const description = hydrostatic
    ? `Mohr's circles of a hydrostatic state at ${stress(s1)}: a single point.`
    : `Mohr's circles of the principal stresses σ1 ${stress(s1)}, σ2 ${stress(s2)}, σ3 ${stress(s3)}; ` +
      `maximum shear ${stress(tauMax)}.`;

  return {
    principal: [s1, s2, s3],
    tauMax,
    view,
    axes,
    circles,
    regionPath,
    points,
    pointAdmissible,
    labels: placed.filter((label) => !label.id.endsWith('-caption')),
    captions: placed.filter((label) => label.id.endsWith('-caption')),
    titleY: 16,
    footer,
    description,
  };
}

/** A full circle as two arcs, so the region path can hold several circles. */
function circlePath(c: { cx: number; cy: number; r: number }): string {
  const round = (v: number) => Number(v.toFixed(2));
  const { cx, cy, r } = c;
  return (
    `M${round(cx - r)} ${round(cy)}` +
    `A${round(r)} ${round(r)} 0 1 0 ${round(cx + r)} ${round(cy)}` +
    `A${round(r)} ${round(r)} 0 1 0 ${round(cx - r)} ${round(cy)}Z`
  );
}

/**
 * Whether (σ, |τ|) can act on some plane: inside or on the s1–s3 circle and outside or on the
 * two smaller ones (the classical Mohr construction in three dimensions).
 */
export function isAdmissible(
  sigma: number,
  tauMagnitude: number,
  s1: number,
  s2: number,
  s3: number,
  tolerance = 0,
): boolean {
  const distance = (a: number, b: number) =>
    Math.hypot(sigma - (a + b) / 2, tauMagnitude) - Math.abs(a - b) / 2;
  return (
    distance(s1, s3) <= tolerance &&
    distance(s1, s2) >= -tolerance &&
    distance(s2, s3) >= -tolerance
  );
}
