import type { AxesLayout } from './axesLayout';
import type { PlacedLabel } from './placeLabels';
import {
  figureFrame,
  figureGrid,
  figureInk,
  figureInkMuted,
  figurePaper,
  numberFont,
  textFont,
  tickFontSize,
} from './figurePalette';

export interface FigureAxesProps {
  layout: AxesLayout;
  /** The placed `captionRequests` of the layout. */
  captions: PlacedLabel[];
  fontSize: number;
}

/**
 * The frame, grid, ticks and the two axes through the origin of an `axesLayout`. Tick labels sit
 * outside the frame so they never collide with what is drawn inside.
 */
export function FigureAxes({ layout, captions, fontSize }: FigureAxesProps) {
  const { plot, xTicks, yTicks, xAxisAt, yAxisAt, yPositive } = layout;
  const arrow = 5;
  const xLine = xAxisAt ?? plot.y1;
  const yLine = yAxisAt ?? plot.x0;
  return (
    <g data-part="axes">
      <rect
        x={plot.x0}
        y={plot.y0}
        width={plot.x1 - plot.x0}
        height={plot.y1 - plot.y0}
        fill="none"
        stroke={figureFrame}
        strokeWidth={0.75}
      />
      <g stroke={figureGrid} strokeWidth={0.75}>
        {xTicks.map((tick) => (
          <line key={`gx${tick.value}`} x1={tick.at} y1={plot.y0} x2={tick.at} y2={plot.y1} />
        ))}
        {yTicks.map((tick) => (
          <line key={`gy${tick.value}`} x1={plot.x0} y1={tick.at} x2={plot.x1} y2={tick.at} />
        ))}
      </g>
      <g stroke={figureInkMuted} strokeWidth={0.75}>
        {xTicks.map((tick) => (
          <line key={`tx${tick.value}`} x1={tick.at} y1={plot.y1} x2={tick.at} y2={plot.y1 + 4} />
        ))}
        {yTicks.map((tick) => (
          <line key={`ty${tick.value}`} x1={plot.x0 - 4} y1={tick.at} x2={plot.x0} y2={tick.at} />
        ))}
      </g>
      <g fill={figureInkMuted} fontFamily={numberFont} fontSize={tickFontSize}>
        {xTicks.map((tick) => (
          <text
            key={`lx${tick.value}`}
            data-axis="x"
            data-value={tick.value}
            x={tick.at}
            y={plot.y1 + 6 + tickFontSize}
            textAnchor="middle"
          >
            {tick.label}
          </text>
        ))}
        {yTicks.map((tick) => (
          <text
            key={`ly${tick.value}`}
            data-axis="y"
            data-value={tick.value}
            x={plot.x0 - 6}
            y={tick.at + tickFontSize * 0.35}
            textAnchor="end"
          >
            {tick.label}
          </text>
        ))}
      </g>
      <g stroke={figureInk} strokeWidth={1} fill={figureInk}>
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
      <g fill={figureInk} fontFamily={textFont} fontSize={fontSize}>
        {captions.map((caption) => (
          <text
            key={caption.id}
            data-part={caption.id}
            x={caption.x}
            y={caption.y}
            textAnchor="middle"
            paintOrder="stroke"
            stroke={figurePaper}
            strokeWidth={3}
            strokeLinejoin="round"
          >
            {caption.text}
          </text>
        ))}
      </g>
    </g>
  );
}
