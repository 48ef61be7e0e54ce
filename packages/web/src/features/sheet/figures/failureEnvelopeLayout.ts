/**
 * Everything `FailureEnvelope` draws: the envelopes in the σA–σB plane with their styles and
 * markers, the stress point, the proportional load line to the envelope, the verdict and the
 * legend.
 */

import { viewWithAxes, type AxesLayout } from './axesLayout';
import { loadLineFactor, type ViewTransform } from './figureGeometry';
import { labelFontSize, seriesStyles, type SeriesStyle } from './figurePalette';
import type { DisplayUnit, Point2 } from './figureTypes';
import { formatFactor, formatStressNumber } from './formatQuantity';
import {
  estimateTextWidth,
  fanDirections,
  placeLabels,
  type LabelRequest,
  type PlacedLabel,
} from './placeLabels';
import { safetyStatus, type SafetyStatus } from './safetyStatus';

/** One failure envelope: a closed polyline in the σA–σB plane, Pa. */
export interface EnvelopeCurve {
  /** Theory id, e.g. `von-mises`; picks the line style. */
  theory: string;
  /** Legend text, e.g. "von Mises, Sy = 250 MPa". */
  label: string;
  /** Vertices (σA, σB) in Pa; the last joins back to the first. */
  points: Array<[number, number]>;
}

export interface FailureEnvelopeInput {
  envelopes: EnvelopeCurve[];
  point: { sA: number; sB: number };
  factor: number | null;
  unit: DisplayUnit;
  required?: number;
  title?: string;
  width: number;
  height?: number;
}

export interface EnvelopeDrawing {
  theory: string;
  label: string;
  style: SeriesStyle;
  /** Screen path, closed. */
  d: string;
  /** Marker positions along the outline (screen). */
  markers: Point2[];
  /** Where the load line crosses this envelope first (screen), if it does. */
  crossing: Point2 | null;
}

export interface LegendEntry {
  label: string;
  style: SeriesStyle;
  x: number;
  y: number;
}

export interface FailureEnvelopeLayout {
  width: number;
  height: number;
  view: ViewTransform;
  axes: AxesLayout;
  envelopes: EnvelopeDrawing[];
  origin: Point2;
  stressPoint: Point2;
  /** The load line: solid from the origin to the stress point, dashed on to the envelope. */
  loadLine: {
    applied: [Point2, Point2];
    extension: [Point2, Point2] | null;
    unbounded: boolean;
  } | null;
  /** Where the factor puts the point on the envelope (screen), if finite. */
  failurePoint: Point2 | null;
  status: SafetyStatus;
  statusDetail: string;
  labels: PlacedLabel[];
  captions: PlacedLabel[];
  legend: LegendEntry[];
  titleY: number;
  badgeY: number;
  description: string;
}

/** Line style per theory, so a theory looks the same in every figure of a sheet. */
const theoryStyleIndex: Record<string, number> = {
  'von-mises': 0,
  tresca: 1,
  'max-normal': 2,
  'coulomb-mohr': 3,
  'modified-mohr': 4,
  'mohr-coulomb': 5,
};

const legendRowHeight = 18;
/** Room for the line sample and marker before a legend entry's text. */
export const legendSampleWidth = 42;
const headerHeight = 30;

export function failureEnvelopeLayout(input: FailureEnvelopeInput): FailureEnvelopeLayout {
  const { envelopes, point, factor, unit, width } = input;
  const required = input.required ?? 1;
  const finiteFactor = factor !== null && Number.isFinite(factor) && factor > 0 ? factor : null;
  const isOrigin = point.sA === 0 && point.sB === 0;

  // Legend under the plot: two columns when every entry fits in half the width.
  const legendEntryWidth = (label: string) =>
    legendSampleWidth + estimateTextWidth(label, 11) * 0.9;
  const halfWidth = (width - 58) / 2;
  const legendColumns = envelopes.every((e) => legendEntryWidth(e.label) <= halfWidth - 12) ? 2 : 1;
  const legendRows = Math.ceil(envelopes.length / legendColumns);
  const legendHeight = legendRows * legendRowHeight + (legendRows > 0 ? 6 : 0);
  const height = input.height ?? 420 + legendHeight + (input.title ? 18 : 0);
  const top = (input.title ? 20 : 0) + headerHeight;
  const padding = { top, right: 10, bottom: 26 + legendHeight, left: 48 };

  // World: every envelope, the origin, the point and the failure point.
  const xs: number[] = [0, point.sA];
  const ys: number[] = [0, point.sB];
  for (const envelope of envelopes) {
    for (const [a, b] of envelope.points) {
      xs.push(a);
      ys.push(b);
    }
  }
  if (finiteFactor !== null) {
    xs.push(point.sA * finiteFactor);
    ys.push(point.sB * finiteFactor);
  }
  let xMin = Math.min(...xs);
  let xMax = Math.max(...xs);
  let yMin = Math.min(...ys);
  let yMax = Math.max(...ys);
  const span = Math.max(xMax - xMin, yMax - yMin) || 1 / unit.perPa;
  if (xMax - xMin < span * 0.05) [xMin, xMax] = [xMin - span * 0.1, xMax + span * 0.1];
  if (yMax - yMin < span * 0.05) [yMin, yMax] = [yMin - span * 0.1, yMax + span * 0.1];

  const { view, axes } = viewWithAxes(
    {
      world: { xMin, xMax, yMin, yMax },
      width,
      height,
      padding,
      margin: { top: 22, right: 22, bottom: 22, left: 22 },
    },
    {
      unit,
      xCaption: `σ1 (${unit.label})`,
      yCaption: `σ2 (${unit.label})`,
      ySign: 1,
      fontSize: labelFontSize,
    },
  );

  const origin = view.toScreen(0, 0);
  const stressPoint = view.toScreen(point.sA, point.sB);
  const styles = assignStyles(envelopes.map((e) => e.theory));
  const outlines = envelopes.map((envelope) =>
    envelope.points.map(([a, b]) => view.toScreen(a, b)),
  );
  const crossingFactors = envelopes.map((envelope) =>
    isOrigin ? null : loadLineFactor([point.sA, point.sB], envelope.points),
  );
  const drawings: EnvelopeDrawing[] = envelopes.map((envelope, index) => {
    const screen = outlines[index] ?? [];
    const crossingFactor = crossingFactors[index] ?? null;
    return {
      theory: envelope.theory,
      label: envelope.label,
      style: styles[index] as SeriesStyle,
      d: polylinePath(screen),
      markers: markersAlong(screen, 4, 0.125 + 0.07 * index),
      crossing:
        crossingFactor === null
          ? null
          : view.toScreen(point.sA * crossingFactor, point.sB * crossingFactor),
    };
  });

  // The load line: applied part solid, the way on to failure dashed; a ray to the frame when
  // the factor is unbounded.
  let loadLine: FailureEnvelopeLayout['loadLine'] = null;
  let failurePoint: Point2 | null = null;
  if (!isOrigin) {
    if (finiteFactor !== null) {
      failurePoint = view.toScreen(point.sA * finiteFactor, point.sB * finiteFactor);
      // Dashed on past the point as far as the failure point or the farthest envelope crossing.
      const reach = Math.max(finiteFactor, ...crossingFactors.map((f) => f ?? 0));
      loadLine = {
        applied: [origin, stressPoint],
        extension:
          reach > 1 ? [stressPoint, view.toScreen(point.sA * reach, point.sB * reach)] : null,
        unbounded: false,
      };
    } else {
      loadLine = {
        applied: [origin, stressPoint],
        extension: [stressPoint, rayToFrame(origin, stressPoint, axes.plot)],
        unbounded: true,
      };
    }
  }

  const status = safetyStatus(factor, required);
  const requiredText = formatFactor(required);
  const n = formatFactor(finiteFactor);
  const statusDetail =
    finiteFactor === null
      ? 'n unbounded'
      : status === 'pass'
        ? `n = ${n} ≥ ${requiredText}${input.required !== undefined ? ' required' : ''}`
        : status === 'low-margin'
          ? `n = ${n} < ${requiredText} required`
          : `n = ${n} < 1`;

  const reference = Math.max(Math.abs(point.sA), Math.abs(point.sB));
  const v = (valuePa: number) => formatStressNumber(valuePa, unit, { reference });
  const requests: LabelRequest[] = [];
  const pointDirection = isOrigin
    ? -Math.PI / 4
    : Math.atan2(stressPoint.y - origin.y, stressPoint.x - origin.x);
  requests.push({
    id: 'point',
    text: `(σ1, σ2) = (${v(point.sA)}, ${v(point.sB)}) ${unit.label}`,
    x: stressPoint.x,
    y: stressPoint.y,
    // Beside the load line rather than along it.
    directions: fanDirections(pointDirection + Math.PI / 2),
    fontSize: labelFontSize,
  });
  const factorText = finiteFactor === null ? 'n unbounded' : `n = ${n}`;
  const factorAnchor = failurePoint ?? loadLine?.extension?.[1] ?? origin;
  requests.push({
    id: 'factor',
    text: factorText,
    x: factorAnchor.x,
    y: factorAnchor.y,
    directions: fanDirections(pointDirection - Math.PI / 4),
    fontSize: labelFontSize,
  });

  const segments = [...axes.obstacleSegments];
  if (loadLine) {
    segments.push({
      x1: loadLine.applied[0].x,
      y1: loadLine.applied[0].y,
      x2: loadLine.applied[1].x,
      y2: loadLine.applied[1].y,
    });
    if (loadLine.extension) {
      const [a, b] = loadLine.extension;
      segments.push({ x1: a.x, y1: a.y, x2: b.x, y2: b.y });
    }
  }
  // The governing envelope's crossing is the failure point itself: one marker, not two.
  const crossings = drawings.flatMap((d) =>
    d.crossing &&
    !(failurePoint && Math.hypot(d.crossing.x - failurePoint.x, d.crossing.y - failurePoint.y) < 3)
      ? [d.crossing]
      : [],
  );
  const discs = [stressPoint, ...(failurePoint ? [failurePoint] : []), ...crossings].map((p) => ({
    cx: p.x,
    cy: p.y,
    r: 5,
  }));
  const placed = placeLabels([...requests, ...axes.captionRequests], {
    discs,
    segments,
    outlines,
    bounds: {
      x0: axes.plot.x0 + 2,
      y0: axes.plot.y0 + 2,
      x1: axes.plot.x1 - 2,
      y1: axes.plot.y1 - 2,
    },
  });

  const legendTop = axes.plot.y1 + 24;
  const columnWidth = (width - padding.left - padding.right) / legendColumns;
  const legend = drawings.map((drawing, index) => ({
    label: drawing.label,
    style: drawing.style,
    x: padding.left + (index % legendColumns) * columnWidth,
    y: legendTop + Math.floor(index / legendColumns) * legendRowHeight + 12,
  }));

  const description =
    `Failure envelopes ${envelopes.map((e) => e.label).join(', ')} in the σ1–σ2 plane; ` +
    `stress point (${v(point.sA)}, ${v(point.sB)}) ${unit.label}; ${factorText}; ` +
    `${status === 'low-margin' ? 'low margin' : status}.`;

  return {
    width,
    height,
    view,
    axes,
    envelopes: drawings,
    origin,
    stressPoint,
    loadLine,
    failurePoint,
    status,
    statusDetail,
    labels: placed.filter((label) => !label.id.endsWith('-caption')),
    captions: placed.filter((label) => label.id.endsWith('-caption')),
    legend,
    titleY: 16,
    badgeY: (input.title ? 20 : 0) + 4,
    description,
  };
}

/** Styles for the theories in order: a theory's own style unless another envelope took it. */
function assignStyles(theories: string[]): SeriesStyle[] {
  const used = new Set<number>();
  const wanted = theories.map((theory) => theoryStyleIndex[theory]);
  const result: number[] = [];
  wanted.forEach((index, i) => {
    if (index !== undefined && !used.has(index) && wanted.indexOf(index) === i) {
      used.add(index);
      result[i] = index;
    }
  });
  return theories.map((_, i) => {
    let index = result[i];
    if (index === undefined) {
      index = seriesStyles.findIndex((__, candidate) => !used.has(candidate));
      if (index < 0) index = i % seriesStyles.length; // more envelopes than styles
      used.add(index);
    }
    return seriesStyles[index] as SeriesStyle;
  });
}

function polylinePath(points: Point2[]): string {
  if (points.length === 0) return '';
  const round = (value: number) => Number(value.toFixed(2));
  return `${points.map((p, i) => `${i === 0 ? 'M' : 'L'}${round(p.x)} ${round(p.y)}`).join('')}Z`;
}

/** `count` points spaced evenly along the closed outline, starting at `offset` of its length. */
function markersAlong(points: Point2[], count: number, offset: number): Point2[] {
  if (points.length < 2) return [];
  const segments = points.map((p, i) => {
    const q = points[(i + 1) % points.length] as Point2;
    return { p, q, length: Math.hypot(q.x - p.x, q.y - p.y) };
  });
  const total = segments.reduce((sum, s) => sum + s.length, 0);
  if (total === 0) return [];
  const markers: Point2[] = [];
  for (let k = 0; k < count; k++) {
    let along = ((((offset + k / count) % 1) + 1) % 1) * total;
    for (const s of segments) {
      if (along <= s.length || s === segments[segments.length - 1]) {
        const t = s.length === 0 ? 0 : Math.min(1, along / s.length);
        markers.push({ x: s.p.x + (s.q.x - s.p.x) * t, y: s.p.y + (s.q.y - s.p.y) * t });
        break;
      }
      along -= s.length;
    }
  }
  return markers;
}

/** Where the ray from `from` through `through` leaves the plot box. */
function rayToFrame(
  from: Point2,
  through: Point2,
  plot: { x0: number; y0: number; x1: number; y1: number },
): Point2 {
  const dx = through.x - from.x;
  const dy = through.y - from.y;
  const limits = [
    dx > 0 ? (plot.x1 - from.x) / dx : dx < 0 ? (plot.x0 - from.x) / dx : Number.POSITIVE_INFINITY,
    dy > 0 ? (plot.y1 - from.y) / dy : dy < 0 ? (plot.y0 - from.y) / dy : Number.POSITIVE_INFINITY,
  ];
  const t = Math.max(1, Math.min(...limits));
  return { x: from.x + dx * t, y: from.y + dy * t };
}
