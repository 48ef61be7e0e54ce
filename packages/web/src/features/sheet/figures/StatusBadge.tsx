import { figureInk, figurePaper, numberFont, okabeIto, textFont } from './figurePalette';
import { safetyStatusWord, type SafetyStatus } from './safetyStatus';

export interface StatusBadgeProps {
  status: SafetyStatus;
  /** The details after the word, e.g. "n = 2.35 ≥ 1.50 required". */
  detail: string;
  /** Top-left corner of the badge. */
  x: number;
  y: number;
}

/** Badge height in SVG user units. */
export const statusBadgeHeight = 20;

const glyphSize = 14;

/**
 * A verdict as shape, word and colour together, so it reads in greyscale print and for
 * colour-blind readers: pass is a ring with a check, low margin a filled triangle with "!",
 * fail a filled octagon with a cross (light to dark in that order).
 */
export function StatusBadge({ status, detail, x, y }: StatusBadgeProps) {
  const cx = x + glyphSize / 2;
  const cy = y + statusBadgeHeight / 2;
  return (
    <g data-part="status-badge" data-status={status}>
      <StatusGlyph status={status} cx={cx} cy={cy} />
      <text x={x + glyphSize + 6} y={cy + 4} fontFamily={textFont} fontSize={12} fill={figureInk}>
        <tspan data-part="status-word" fontWeight={700}>
          {safetyStatusWord[status]}
        </tspan>
        <tspan fontFamily={numberFont} fontSize={11} dx={8}>
          {detail}
        </tspan>
      </text>
    </g>
  );
}

function StatusGlyph({ status, cx, cy }: { status: SafetyStatus; cx: number; cy: number }) {
  const r = glyphSize / 2;
  switch (status) {
    case 'pass':
      return (
        <g data-glyph="check">
          <circle
            cx={cx}
            cy={cy}
            r={r - 1}
            fill={figurePaper}
            stroke={okabeIto.bluishGreen}
            strokeWidth={2}
          />
          <path
            d={`M${cx - 3.5} ${cy + 0.2}l2.5 2.6l4.8 -5.4`}
            fill="none"
            stroke={figureInk}
            strokeWidth={1.8}
            strokeLinecap="round"
            strokeLinejoin="round"
          />
        </g>
      );
    case 'low-margin':
      return (
        <g data-glyph="triangle">
          <path
            d={`M${cx} ${cy - r}L${cx + r} ${cy + r - 1}H${cx - r}Z`}
            fill={okabeIto.orange}
            stroke={figureInk}
            strokeWidth={1}
            strokeLinejoin="round"
          />
          <path
            d={`M${cx} ${cy - 2.5}v4.2`}
            stroke={figureInk}
            strokeWidth={1.6}
            strokeLinecap="round"
          />
          <circle cx={cx} cy={cy + 4} r={0.9} fill={figureInk} />
        </g>
      );
    case 'fail': {
      // A regular octagon: corners every 45°, starting 22.5° off the axis.
      const corners = Array.from({ length: 8 }, (_, i) => {
        const angle = ((i * 45 + 22.5) * Math.PI) / 180;
        return `${(cx + r * Math.cos(angle)).toFixed(2)} ${(cy + r * Math.sin(angle)).toFixed(2)}`;
      });
      return (
        <g data-glyph="cross">
          <path
            d={`M${corners.join('L')}Z`}
            fill={okabeIto.vermillion}
            stroke={figureInk}
            strokeWidth={1}
          />
          <path
            d={`M${cx - 3} ${cy - 3}l6 6M${cx + 3} ${cy - 3}l-6 6`}
            stroke={figurePaper}
            strokeWidth={1.8}
            strokeLinecap="round"
          />
        </g>
      );
    }
    default: {
      const unknown: never = status;
      throw new Error(`unknown status ${String(unknown)}`);
    }
  }
}
