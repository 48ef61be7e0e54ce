import { figureInk, figurePaper, numberFont } from './figurePalette';
import type { PlacedLabel } from './placeLabels';

export interface FigureLabelsProps {
  labels: PlacedLabel[];
  /** Mono for numbers (the default), sans for captions. */
  fontFamily?: string;
  /** `data-part` of the group. */
  part?: string;
}

/**
 * Placed point labels in the mono face, each with a paper-coloured halo so it stays readable
 * where it crosses a grid line.
 */
export function FigureLabels({
  labels,
  fontFamily = numberFont,
  part = 'labels',
}: FigureLabelsProps) {
  return (
    <g data-part={part} fontFamily={fontFamily} fill={figureInk}>
      {labels.map((label) => (
        <text
          key={label.id}
          data-label={part === 'labels' ? label.id : undefined}
          data-part={part === 'labels' ? undefined : label.id}
          x={label.x}
          y={label.y}
          fontSize={label.fontSize}
          textAnchor="middle"
          paintOrder="stroke"
          stroke={figurePaper}
          strokeWidth={3}
          strokeLinejoin="round"
        >
          {label.text}
        </text>
      ))}
    </g>
  );
}
