/**
 * Layout of a figure's axes: a light frame round the plot box with tick labels outside it, a
 * faint grid, and the two axes drawn through the origin with arrowheads and captions (the
 * vertical one placed by the figure together with its point labels). Both axes
 * use the same tick step, as befits an equal-aspect plot.
 */

import {
  createViewTransform,
  type ViewTransform,
  type ViewTransformOptions,
} from './figureGeometry';
import type { DisplayUnit } from './figureTypes';
import { tickFontSize } from './figurePalette';
import { formatNumber } from './formatQuantity';
import { niceStep, stepDecimals, ticksForStep } from './niceTicks';
import { estimateTextWidth, labelHeight, type LabelRequest } from './placeLabels';

export interface AxesOptions {
  unit: DisplayUnit;
  /** Caption of the horizontal axis, e.g. "σ (MPa)". */
  xCaption: string;
  /** Caption at the positive end of the vertical axis. */
  yCaption: string;
  /**
   * What the vertical axis reads at world height y: `ySign · y`. −1 makes the axis point down
   * (its positive end at the bottom).
   */
  ySign: 1 | -1;
  fontSize: number;
  /** About this many screen units between ticks; default 64. */
  tickSpacing?: number;
}

export interface AxisTick {
  /** Screen position along the axis (x for the horizontal axis, y for the vertical one). */
  at: number;
  label: string;
  /** The reading in display units. */
  value: number;
}

export interface AxesLayout {
  plot: { x0: number; y0: number; x1: number; y1: number };
  xTicks: AxisTick[];
  yTicks: AxisTick[];
  /** Screen y of the horizontal axis (world y = 0), or null when 0 is out of view. */
  xAxisAt: number | null;
  /** Screen x of the vertical axis (world x = 0), or null when 0 is out of view. */
  yAxisAt: number | null;
  /** Which end of the vertical axis is positive. */
  yPositive: 'up' | 'down';
  /** The horizontal caption, right-aligned at the end of the row of tick labels. */
  xCaption: { text: string; x: number; y: number };
  /**
   * The vertical caption as a label request (id `y-caption`) beside the axis's positive end, to
   * be placed after the figure's own labels so it gives way to them.
   */
  captionRequests: LabelRequest[];
  /** Width of the widest tick label of the vertical axis, to size the left padding. */
  yTickLabelWidth: number;
  /** The axis lines, for the label placer. */
  obstacleSegments: Array<{ x1: number; y1: number; x2: number; y2: number }>;
}

export function axesLayout(view: ViewTransform, options: AxesOptions): AxesLayout {
  const { unit, ySign, fontSize } = options;
  const plot = {
    x0: view.plot.left,
    y0: view.plot.top,
    x1: view.plot.left + view.plot.width,
    y1: view.plot.top + view.plot.height,
  };
  const { visible } = view;

  // One step for both axes, chosen on the longer side, widened until the longest tick label
  // fits between two ticks.
  const longer = view.plot.width >= view.plot.height;
  const span = (longer ? visible.xMax - visible.xMin : visible.yMax - visible.yMin) * unit.perPa;
  const pixels = longer ? view.plot.width : view.plot.height;
  let spacing = options.tickSpacing ?? 64;
  let step = niceStep(span, Math.max(2, pixels / spacing));
  for (let attempt = 0; attempt < 4; attempt++) {
    const decimalsNow = stepDecimals(step);
    const widest = Math.max(
      ...[visible.xMin, visible.xMax].map((x) =>
        estimateTextWidth(formatNumber(x * unit.perPa, { decimals: decimalsNow }), tickFontSize),
      ),
    );
    if ((step / unit.perPa) * view.scale >= widest + 12) break;
    spacing = widest + 16;
    step = niceStep(span, Math.max(1, pixels / spacing));
  }
  const decimals = stepDecimals(step);
  // Exactly the step's decimals, never an exponent: a tiny circle far from zero still gets
  // readable (if long) ticks such as 500.00002.
  const tickLabel = (value: number) => formatNumber(value, { decimals });

  // The horizontal caption closes the row of tick labels under the frame, at its right end;
  // tick labels it would cover are left out.
  const xCaptionWidth = estimateTextWidth(options.xCaption, fontSize) * 0.9;
  const xCaption = { text: options.xCaption, x: plot.x1, y: plot.y1 + 6 + tickFontSize };
  const xTicks = ticksForStep(visible.xMin * unit.perPa, visible.xMax * unit.perPa, step)
    .map((value) => ({
      value,
      label: tickLabel(value),
      at: view.toScreen(value / unit.perPa, 0).x,
    }))
    .filter(
      (tick) =>
        tick.at + estimateTextWidth(tick.label, tickFontSize) / 2 + 8 < plot.x1 - xCaptionWidth,
    );
  const readingLow = ySign * visible.yMin * unit.perPa;
  const readingHigh = ySign * visible.yMax * unit.perPa;
  const yTicks = ticksForStep(readingLow, readingHigh, step).map((value) => ({
    value,
    label: tickLabel(value),
    at: view.toScreen(0, (ySign * value) / unit.perPa).y,
  }));

  const origin = view.toScreen(0, 0);
  const inside = (v: number, a: number, b: number) => v >= a - 0.5 && v <= b + 0.5;
  const xAxisAt = inside(origin.y, plot.y0, plot.y1) ? origin.y : null;
  const yAxisAt = inside(origin.x, plot.x0, plot.x1) ? origin.x : null;
  const yPositive = ySign > 0 ? 'up' : 'down';

  const height = labelHeight(fontSize);
  const yLine = yAxisAt ?? plot.x0;
  const captionRequests: LabelRequest[] = [
    {
      id: 'y-caption',
      text: options.yCaption,
      x: yLine,
      y: yPositive === 'up' ? plot.y0 + 4 + height / 2 : plot.y1 - 4 - height / 2,
      directions: yAxisAt === null ? [0] : [0, Math.PI],
      gap: 7,
      fontSize,
    },
  ];

  const obstacleSegments: AxesLayout['obstacleSegments'] = [];
  if (xAxisAt !== null)
    obstacleSegments.push({ x1: plot.x0, y1: xAxisAt, x2: plot.x1, y2: xAxisAt });
  if (yAxisAt !== null)
    obstacleSegments.push({ x1: yAxisAt, y1: plot.y0, x2: yAxisAt, y2: plot.y1 });

  return {
    plot,
    xTicks,
    yTicks,
    xAxisAt,
    yAxisAt,
    yPositive,
    xCaption,
    captionRequests,
    yTickLabelWidth: Math.max(0, ...yTicks.map((t) => estimateTextWidth(t.label, tickFontSize))),
    obstacleSegments,
  };
}

/**
 * The view and its axes together, with the left padding widened when the vertical axis's tick
 * labels need more room than `padding.left` leaves (e.g. stresses printed in Pa).
 */
export function viewWithAxes(
  viewOptions: ViewTransformOptions,
  axesOptions: AxesOptions,
): { view: ViewTransform; axes: AxesLayout } {
  let view = createViewTransform(viewOptions);
  let axes = axesLayout(view, axesOptions);
  const needed = axes.yTickLabelWidth + 10;
  if (needed > viewOptions.padding.left) {
    view = createViewTransform({
      ...viewOptions,
      padding: { ...viewOptions.padding, left: needed },
    });
    axes = axesLayout(view, axesOptions);
  }
  return { view, axes };
}
