import { figureInk, figurePaper, numberFont } from './figurePalette';
import type { PlacedLabel } from './placeLabels';

export interface FigureLabelsProps {
  labels: PlacedLabel[];
}

/**
 * Placed point labels in the mono face, each with a paper-coloured halo so it stays readable
 * where it crosses a grid line.
 */
export function FigureLabels({ labels }: FigureLabelsProps) {
  return (
    <g data-part="labels" fontFamily={numberFont} fill={figureInk}>
      {labels.map((label) => (
        <text
          key={label.id}
          data-label={label.id}
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
