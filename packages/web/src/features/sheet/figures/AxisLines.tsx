import type { AxesLayout } from './axesLayout';
import { figureInk } from './figurePalette';

export interface AxisLinesProps {
  layout: AxesLayout;
}

/**
 * The two axes of an `axesLayout` through the origin, with arrowheads at their positive ends
 * (on the frame when the origin is out of view).
 */
export function AxisLines({ layout }: AxisLinesProps) {
  const { plot, xAxisAt, yAxisAt, yPositive } = layout;
  const arrow = 5;
  const xLine = xAxisAt ?? plot.y1;
  const yLine = yAxisAt ?? plot.x0;
  return (
    <g data-part="axis-lines" stroke={figureInk} strokeWidth={1} fill={figureInk}>
      {xAxisAt !== null && <line x1={plot.x0} y1={xAxisAt} x2={plot.x1} y2={xAxisAt} />}
      {yAxisAt !== null && <line x1={yAxisAt} y1={plot.y0} x2={yAxisAt} y2={plot.y1} />}
      {/* Arrowheads mark each axis's positive end; on the frame when the axis is out of view. */}
      <path
        data-part="x-arrow"
        d={`M${plot.x1} ${xLine}l${-arrow * 1.6} ${-arrow * 0.7}v${arrow * 1.4}Z`}
        stroke="none"
      />
      <path
        data-part="y-arrow"
        d={
          yPositive === 'up'
            ? `M${yLine} ${plot.y0}l${-arrow * 0.7} ${arrow * 1.6}h${arrow * 1.4}Z`
            : `M${yLine} ${plot.y1}l${-arrow * 0.7} ${-arrow * 1.6}h${arrow * 1.4}Z`
        }
        stroke="none"
      />
    </g>
  );
}
