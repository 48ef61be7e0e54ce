import type { AxesLayout } from './axesLayout';
import {
  figureFrame,
  figureGrid,
  figureInk,
  figureInkMuted,
  labelFontSize,
  numberFont,
  textFont,
  tickFontSize,
} from './figurePalette';

export interface FigureAxesProps {
  layout: AxesLayout;
}

/**
 * The frame, grid and ticks of an `axesLayout`, drawn first. Tick labels sit outside the frame
 * so they never collide with what is drawn inside. The axes themselves are `AxisLines`, drawn
 * over filled areas.
 */
export function FigureAxes({ layout }: FigureAxesProps) {
  const { plot, xTicks, yTicks } = layout;
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
      <text
        data-part="x-caption"
        x={layout.xCaption.x}
        y={layout.xCaption.y}
        textAnchor="end"
        fontFamily={textFont}
        fontSize={labelFontSize}
        fill={figureInk}
      >
        {layout.xCaption.text}
      </text>
    </g>
  );
}
