import { useId, useMemo } from 'react';
import { AxisLines } from './AxisLines';
import { FigureAxes } from './FigureAxes';
import { FigureLabels } from './FigureLabels';
import { figureInk, figureInkMuted, figurePaper, okabeIto, textFont } from './figurePalette';
import type { DisplayUnit, ShearAxisConvention } from './figureTypes';
import { markerPath } from './markerShapes';
import { mohrCircles3DLayout, type PrincipalCircleId } from './mohrCircles3DLayout';

/**
 * Props of {@link MohrCircles3D}. Stresses in Pa, tension positive.
 */
export interface MohrCircles3DProps {
  /** The principal stresses; sorted by the figure if they are not s1 ≥ s2 ≥ s3. */
  s1: number;
  s2: number;
  s3: number;
  /** How to print stresses, e.g. `{ label: 'MPa', perPa: 1e-6 }`. */
  unit: DisplayUnit;
  /** Which way the τ axis points; see `MohrCircle`. The circles are symmetric either way. */
  shearAxis: ShearAxisConvention;
  /**
   * A normal and shear stress on some plane, Pa. τ is drawn like a label τ of `MohrCircle`
   * (a positive τ below the σ axis); its admissibility is judged on |τ|.
   */
  point?: { sigma: number; tau: number };
  title?: string;
  /** Size of the drawing in SVG user units (it scales to its container); default 560 × 400. */
  width?: number;
  height?: number;
}

const circleStyles: Record<
  PrincipalCircleId,
  { stroke: string; dash: string | undefined; width: number }
> = {
  c13: { stroke: figureInk, dash: undefined, width: 1.5 },
  c12: { stroke: okabeIto.blue, dash: '7 4', width: 1.5 },
  c23: { stroke: okabeIto.vermillion, dash: '2 3', width: 1.75 },
};

/**
 * Mohr's three circles of a stress state: σ1–σ3 (the largest), σ1–σ2 and σ2–σ3, with the
 * admissible region (inside the largest, outside the two smaller: the (σ, τ) pairs that act on
 * some plane) hatched so it shows in greyscale print, the principal points and τmax labelled.
 */
export function MohrCircles3D(props: MohrCircles3DProps) {
  const { s1, s2, s3, unit, shearAxis, point, title } = props;
  const width = props.width ?? 560;
  const height = props.height ?? 400;
  const layout = useMemo(
    () => mohrCircles3DLayout({ s1, s2, s3, unit, shearAxis, point, title, width, height }),
    [s1, s2, s3, unit, shearAxis, point, title, width, height],
  );
  const ids = useId().replace(/[^a-zA-Z0-9_-]/g, '');
  const hatchId = `${ids}-hatch`;
  const titleId = `${ids}-title`;
  const descId = `${ids}-desc`;

  return (
    <svg
      viewBox={`0 0 ${width} ${height}`}
      width="100%"
      style={{ maxWidth: width, height: 'auto', display: 'block' }}
      role="img"
      aria-labelledby={titleId}
      aria-describedby={descId}
      data-figure="mohr-circles-3d"
    >
      <title id={titleId}>{title ?? "Mohr's circles"}</title>
      <desc id={descId}>{layout.description}</desc>
      <defs>
        <pattern
          id={hatchId}
          patternUnits="userSpaceOnUse"
          width={6}
          height={6}
          patternTransform="rotate(45)"
        >
          <rect width={6} height={6} fill="#efe8da" />
          <line x1={0} y1={0} x2={0} y2={6} stroke={figureInkMuted} strokeWidth={1.1} />
        </pattern>
      </defs>
      {title && (
        <text
          x={layout.axes.plot.x0}
          y={layout.titleY}
          fontFamily={textFont}
          fontSize={12}
          fontWeight={600}
          fill={figureInk}
        >
          {title}
        </text>
      )}
      <FigureAxes layout={layout.axes} />

      {layout.regionPath && (
        <path
          data-part="admissible-region"
          d={layout.regionPath}
          fill={`url(#${hatchId})`}
          fillRule="evenodd"
          stroke="none"
        />
      )}
      <AxisLines layout={layout.axes} />
      <g data-part="circles" fill="none">
        {layout.circles.map((circle) => {
          const style = circleStyles[circle.id];
          return (
            <circle
              key={circle.id}
              data-circle={circle.id}
              cx={circle.cx}
              cy={circle.cy}
              r={circle.r}
              stroke={style.stroke}
              strokeWidth={style.width}
              strokeDasharray={style.dash}
            />
          );
        })}
      </g>

      <g data-part="points">
        {layout.points.map(({ id, screen }) => (
          <path
            key={id}
            data-point={id}
            d={markerPath(
              id === 'tauMax' ? 'triangle' : id === 'point' ? 'diamond' : 'square',
              screen.x,
              screen.y,
              id === 'point' ? 8 : 6,
            )}
            fill={id === 'tauMax' ? figurePaper : id === 'point' ? okabeIto.bluishGreen : figureInk}
            stroke={figureInk}
            strokeWidth={1}
          />
        ))}
      </g>
      <FigureLabels labels={layout.labels} />
      <FigureLabels labels={layout.captions} fontFamily={textFont} part="captions" />

      <g data-part="footer" fontFamily={textFont} fontSize={10.5}>
        {layout.footer.map((line, index) => (
          <text
            key={index}
            x={layout.axes.plot.x0}
            y={line.y}
            fill={index === 0 ? figureInk : figureInkMuted}
          >
            {line.text}
          </text>
        ))}
      </g>
    </svg>
  );
}
