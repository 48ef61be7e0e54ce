import { useCallback, useId, useMemo, useRef } from 'react';
import { AxisLines } from './AxisLines';
import { FigureAxes } from './FigureAxes';
import { FigureLabels } from './FigureLabels';
import { rotationFromPlotPoint } from './figureGeometry';
import { figureInk, figureInkMuted, figurePaper, okabeIto, textFont } from './figurePalette';
import type { DisplayUnit, Point2, ShearAxisConvention } from './figureTypes';
import { markerPath, type MarkerShape } from './markerShapes';
import {
  mohrCircleLayout,
  type MohrPlotPoint,
  type MohrPointId,
  type RotatedPlaneState,
} from './mohrCircleLayout';
import { RotationHandle } from './RotationHandle';
import { useRotationDrag } from './useRotationDrag';

/**
 * Props of {@link MohrCircle}. Stresses in Pa, angles in rad, sheet sign convention: tension
 * positive; τxy positive when it acts in +y on the +x face; θ counterclockwise from x.
 */
export interface MohrCircleProps {
  sx: number;
  sy: number;
  txy: number;
  /** The state on axes turned by θ; draws the rotated diameter X′–Y′ and the 2θ arc. */
  rotated?: RotatedPlaneState;
  /** How to print stresses, e.g. `{ label: 'MPa', perPa: 1e-6 }`. */
  unit: DisplayUnit;
  /**
   * Which way the τ axis points. Every point sits in the same place and keeps its label in both;
   * only the axis (arrow, caption, tick readings) is mirrored:
   * - `positive-down`: the axis reads τ downward; a point labelled (σ, τ) is drawn τ below the
   *   σ axis, so X (σx, τxy) with τxy > 0 lies below it.
   * - `clockwise-up`: the axis reads τcw upward, the face shear taken positive when it turns the
   *   element clockwise. Positive τxy turns the element counterclockwise on the x face
   *   (τcw = −τxy) and clockwise on the y face (τcw = +τxy), so X is again drawn below.
   */
  shearAxis: ShearAxisConvention;
  /**
   * Called with the new θ (rad, in (−90°, 90°]) while X′ is dragged round the circle or turned
   * with the keyboard. Turning the element counterclockwise by θ moves X′ counterclockwise by 2θ
   * on the plot (in both conventions); dragging X′ onto p1 gives θ = θp.
   */
  onRotate?: (angleRad: number) => void;
  title?: string;
  /** Size of the drawing in SVG user units (it scales to its container); default 560 × 440. */
  width?: number;
  height?: number;
}

interface PointStyle {
  shape: MarkerShape;
  size: number;
  fill: string;
  stroke: string;
}

const originalColour = okabeIto.blue;
const rotatedColour = okabeIto.vermillion;

const pointStyles: Record<MohrPointId, PointStyle> = {
  X: { shape: 'circle', size: 7, fill: originalColour, stroke: originalColour },
  Y: { shape: 'circle', size: 7, fill: originalColour, stroke: originalColour },
  Xr: { shape: 'diamond', size: 7, fill: rotatedColour, stroke: rotatedColour },
  Yr: { shape: 'diamond', size: 7, fill: rotatedColour, stroke: rotatedColour },
  p1: { shape: 'square', size: 6, fill: figureInk, stroke: figureInk },
  p2: { shape: 'square', size: 6, fill: figureInk, stroke: figureInk },
  top: { shape: 'triangle', size: 7, fill: figurePaper, stroke: figureInk },
  bottom: { shape: 'triangle', size: 7, fill: figurePaper, stroke: figureInk },
  C: { shape: 'plus', size: 8, fill: 'none', stroke: figureInk },
};

/** Points drawn last are on top; X′ is the handle, so it comes last. */
const drawOrder: MohrPointId[] = ['C', 'top', 'bottom', 'p1', 'p2', 'X', 'Y', 'Yr', 'Xr'];

/**
 * Mohr's circle of a plane stress state: axes in the display unit with equal aspect ratio, the
 * circle with its centre C, the x-face point X (σx, τxy) and y-face point Y (σy, −τxy) joined by
 * a diameter, the principal points p1 and p2, the two in-plane maximum-shear points, and for a
 * rotated state the diameter X′–Y′ with its 2θ arc. With `onRotate`, X′ can be dragged round the
 * circle or turned with the arrow keys. A hydrostatic plane state draws a point and says so.
 */
export function MohrCircle(props: MohrCircleProps) {
  const { sx, sy, txy, rotated, unit, shearAxis, onRotate, title } = props;
  const width = props.width ?? 560;
  const height = props.height ?? 440;
  const layout = useMemo(
    () => mohrCircleLayout({ sx, sy, txy, rotated, unit, shearAxis, title, width, height }),
    [sx, sy, txy, rotated, unit, shearAxis, title, width, height],
  );

  const svgRef = useRef<SVGSVGElement>(null);
  const { view } = layout;
  const angleAt = useCallback(
    (svgPoint: Point2) =>
      rotationFromPlotPoint({ sx, sy, txy }, view.toWorld(svgPoint.x, svgPoint.y), shearAxis),
    [sx, sy, txy, view, shearAxis],
  );
  const viewBox = useMemo(() => ({ width, height }), [width, height]);
  const drag = useRotationDrag({ svgRef, viewBox, angleAt, onRotate });

  const ids = useId().replace(/[^a-zA-Z0-9_-]/g, '');
  const titleId = `${ids}-title`;
  const descId = `${ids}-desc`;
  const { points, circle } = layout;
  const handlePoint = points.Xr;

  return (
    <svg
      ref={svgRef}
      viewBox={`0 0 ${width} ${height}`}
      width="100%"
      style={{ maxWidth: width, height: 'auto', display: 'block' }}
      role={onRotate && handlePoint ? 'group' : 'img'}
      aria-labelledby={titleId}
      aria-describedby={descId}
      data-figure="mohr-circle"
      data-shear-axis={shearAxis}
    >
      <title id={titleId}>{title ?? "Mohr's circle"}</title>
      <desc id={descId}>{layout.description}</desc>
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
      <AxisLines layout={layout.axes} />

      {!layout.degenerate && (
        <g data-part="circle" fill="none">
          <circle cx={circle.cx} cy={circle.cy} r={circle.r} stroke={figureInk} strokeWidth={1.5} />
          <Diameter
            a={points.X}
            b={points.Y}
            stroke={originalColour}
            dash={undefined}
            part="diameter"
          />
          <Diameter
            a={points.Xr}
            b={points.Yr}
            stroke={rotatedColour}
            dash="6 3"
            part="rotated-diameter"
          />
          {layout.arc && (
            <g data-part="angle-arc" stroke={rotatedColour}>
              <path d={layout.arc.d} strokeWidth={1} />
              <path d={layout.arc.head} fill={rotatedColour} stroke="none" />
            </g>
          )}
        </g>
      )}

      <g data-part="points">
        {drawOrder.map((id) => {
          const point = points[id];
          if (!point) return null;
          const style = pointStyles[id];
          return (
            <path
              key={id}
              data-point={id}
              data-x={point.screen.x}
              data-y={point.screen.y}
              d={markerPath(style.shape, point.screen.x, point.screen.y, style.size)}
              fill={style.fill}
              stroke={style.stroke}
              strokeWidth={style.shape === 'plus' ? 1.5 : 1}
            />
          );
        })}
      </g>

      <FigureLabels labels={layout.labels} />
      <FigureLabels labels={layout.captions} fontFamily={textFont} part="captions" />

      {onRotate && handlePoint && !layout.degenerate && rotated && (
        <RotationHandle
          x={handlePoint.screen.x}
          y={handlePoint.screen.y}
          angleRad={rotated.angleRad}
          onRotate={onRotate}
          drag={drag}
        />
      )}

      <g data-part="footer" fontFamily={textFont} fontSize={10.5} fill={figureInkMuted}>
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

interface DiameterProps {
  a: MohrPlotPoint | undefined;
  b: MohrPlotPoint | undefined;
  stroke: string;
  dash: string | undefined;
  part: string;
}

function Diameter({ a, b, stroke, dash, part }: DiameterProps) {
  if (!a || !b) return null;
  return (
    <line
      data-part={part}
      x1={a.screen.x}
      y1={a.screen.y}
      x2={b.screen.x}
      y2={b.screen.y}
      stroke={stroke}
      strokeWidth={1.5}
      strokeDasharray={dash}
    />
  );
}
