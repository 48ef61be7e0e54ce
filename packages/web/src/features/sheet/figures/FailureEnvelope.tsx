import { useId, useMemo } from 'react';
import { AxisLines } from './AxisLines';
import { FigureAxes } from './FigureAxes';
import { FigureLabels } from './FigureLabels';
import {
  failureEnvelopeLayout,
  legendSampleWidth,
  type EnvelopeCurve,
} from './failureEnvelopeLayout';
import { figureInk, figurePaper, textFont, type SeriesStyle } from './figurePalette';
import type { DisplayUnit } from './figureTypes';
import { isStrokeOnlyMarker, markerPath } from './markerShapes';
import { StatusBadge } from './StatusBadge';

/**
 * Props of {@link FailureEnvelope}. Stresses in Pa (σA, σB: the in-plane principal stresses,
 * tension positive).
 */
export interface FailureEnvelopeProps {
  /** Envelopes to draw and compare; each a closed polyline. */
  envelopes: EnvelopeCurve[];
  /** The stress point (σA, σB), Pa. */
  point: { sA: number; sB: number };
  /**
   * The factor of safety n of the governing theory: the load line from the origin meets that
   * envelope at n·(σA, σB). `null` when n is unbounded (the load can grow without limit).
   */
  factor: number | null;
  /** How to print stresses, e.g. `{ label: 'MPa', perPa: 1e-6 }`. */
  unit: DisplayUnit;
  /** The factor the check asks for; 1 when not given. */
  required?: number;
  title?: string;
  /** Size in SVG user units (it scales to its container); the height grows with the legend. */
  width?: number;
  height?: number;
}

/**
 * Failure envelopes in the σA–σB plane with the stress point, the proportional load line from
 * the origin through the point to the envelope (labelled with n), and a verdict badge (pass,
 * low margin or fail as shape, word and colour). Axes have equal scales, so an envelope keeps
 * its true shape.
 */
export function FailureEnvelope(props: FailureEnvelopeProps) {
  const { envelopes, point, factor, unit, required, title } = props;
  const width = props.width ?? 560;
  const layout = useMemo(
    () =>
      failureEnvelopeLayout({
        envelopes,
        point,
        factor,
        unit,
        required,
        title,
        width,
        height: props.height,
      }),
    [envelopes, point, factor, unit, required, title, width, props.height],
  );
  const ids = useId().replace(/[^a-zA-Z0-9_-]/g, '');
  const titleId = `${ids}-title`;
  const descId = `${ids}-desc`;
  const { height, loadLine } = layout;

  return (
    <svg
      viewBox={`0 0 ${width} ${height}`}
      width="100%"
      style={{ maxWidth: width, height: 'auto', display: 'block' }}
      role="img"
      aria-labelledby={titleId}
      aria-describedby={descId}
      data-figure="failure-envelope"
    >
      <title id={titleId}>{title ?? 'Failure envelope'}</title>
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
      <StatusBadge
        status={layout.status}
        detail={layout.statusDetail}
        x={layout.axes.plot.x0}
        y={layout.badgeY}
      />

      <FigureAxes layout={layout.axes} />
      <AxisLines layout={layout.axes} />

      <g data-part="envelopes" fill="none">
        {layout.envelopes.map((envelope, index) => (
          <g key={index} data-envelope={envelope.theory}>
            <path
              d={envelope.d}
              stroke={envelope.style.stroke}
              strokeWidth={1.75}
              strokeDasharray={envelope.style.dash}
              strokeLinejoin="round"
            />
            {envelope.markers.map((m, k) => (
              <SeriesMarker key={k} style={envelope.style} x={m.x} y={m.y} size={7} filled />
            ))}
          </g>
        ))}
      </g>

      {loadLine && (
        <g data-part="load-line" stroke={figureInk} fill="none">
          <line
            x1={loadLine.applied[0].x}
            y1={loadLine.applied[0].y}
            x2={loadLine.applied[1].x}
            y2={loadLine.applied[1].y}
            strokeWidth={1.5}
          />
          {loadLine.extension && (
            <line
              data-part={loadLine.unbounded ? 'load-ray' : 'load-extension'}
              x1={loadLine.extension[0].x}
              y1={loadLine.extension[0].y}
              x2={loadLine.extension[1].x}
              y2={loadLine.extension[1].y}
              strokeWidth={1.25}
              strokeDasharray={loadLine.unbounded ? '1.5 3' : '5 3'}
            />
          )}
        </g>
      )}

      {/* Where the load line meets each envelope: hollow marks in that envelope's shape. */}
      <g data-part="crossings">
        {layout.envelopes.map((envelope, index) =>
          envelope.crossing ? (
            <SeriesMarker
              key={index}
              style={envelope.style}
              x={envelope.crossing.x}
              y={envelope.crossing.y}
              size={9}
              filled={false}
            />
          ) : null,
        )}
      </g>

      {layout.failurePoint && (
        <circle
          data-part="failure-point"
          data-x={layout.failurePoint.x}
          data-y={layout.failurePoint.y}
          cx={layout.failurePoint.x}
          cy={layout.failurePoint.y}
          r={4.5}
          fill={figurePaper}
          stroke={figureInk}
          strokeWidth={1.75}
        />
      )}
      <circle
        data-part="stress-point"
        data-x={layout.stressPoint.x}
        data-y={layout.stressPoint.y}
        cx={layout.stressPoint.x}
        cy={layout.stressPoint.y}
        r={4}
        fill={figureInk}
        stroke={figurePaper}
        strokeWidth={1}
      />

      <FigureLabels labels={layout.labels} />
      <FigureLabels labels={layout.captions} fontFamily={textFont} part="captions" />

      <g data-part="legend" fontFamily={textFont} fontSize={11} fill={figureInk}>
        {layout.legend.map((entry, index) => (
          <g key={index} data-legend={entry.label}>
            <line
              x1={entry.x}
              y1={entry.y - 4}
              x2={entry.x + 34}
              y2={entry.y - 4}
              stroke={entry.style.stroke}
              strokeWidth={1.75}
              strokeDasharray={entry.style.dash}
            />
            <SeriesMarker style={entry.style} x={entry.x + 17} y={entry.y - 4} size={7} filled />
            <text x={entry.x + legendSampleWidth} y={entry.y}>
              {entry.label}
            </text>
          </g>
        ))}
      </g>
    </svg>
  );
}

interface SeriesMarkerProps {
  style: SeriesStyle;
  x: number;
  y: number;
  size: number;
  filled: boolean;
}

function SeriesMarker({ style, x, y, size, filled }: SeriesMarkerProps) {
  const strokeOnly = isStrokeOnlyMarker(style.marker);
  return (
    <path
      d={markerPath(style.marker, x, y, size)}
      fill={strokeOnly ? 'none' : filled ? style.stroke : figurePaper}
      stroke={style.stroke}
      strokeWidth={strokeOnly ? 1.75 : 1.25}
    />
  );
}
