import { useState, type KeyboardEvent } from 'react';
import { normalizeHalfTurn } from './figureGeometry';
import { figureAccent } from './figurePalette';
import { formatAngle } from './formatQuantity';
import type { RotationDrag } from './useRotationDrag';

export interface RotationHandleProps {
  /** Screen position of the handle (the X′ point). */
  x: number;
  y: number;
  /** Current rotation θ, rad, counterclockwise. */
  angleRad: number;
  onRotate: (angleRad: number) => void;
  drag: RotationDrag;
}

const degree = Math.PI / 180;

/** Keys and the change of θ they make; arrows by 1°, page keys by 10°. */
const keySteps: Record<string, number> = {
  ArrowUp: degree,
  ArrowRight: degree,
  ArrowDown: -degree,
  ArrowLeft: -degree,
  PageUp: 10 * degree,
  PageDown: -10 * degree,
};

/**
 * The draggable, focusable end X′ of the rotated diameter. It is a slider for assistive
 * technology: arrow keys turn the element by 1° (up/right counterclockwise), Page Up/Down by
 * 10°, Home back to 0°. Angles wrap within (−90°, 90°], the range of distinct rotations.
 */
export function RotationHandle({ x, y, angleRad, onRotate, drag }: RotationHandleProps) {
  const [focused, setFocused] = useState(false);

  const onKeyDown = (event: KeyboardEvent<SVGGElement>) => {
    if (event.key === 'Home') {
      event.preventDefault();
      onRotate(0);
      return;
    }
    const step = keySteps[event.key];
    if (step === undefined) return;
    event.preventDefault();
    // Round to a tenth of a degree first, so repeated steps do not collect rounding noise.
    const degrees = Math.round((angleRad / degree) * 10) / 10;
    onRotate(normalizeHalfTurn(degrees * degree + step));
  };

  const active = focused || drag.dragging;
  return (
    <g
      data-part="rotation-handle"
      role="slider"
      tabIndex={0}
      aria-label="Rotation θ of the X′ axis; drag or use the arrow keys"
      aria-valuemin={-90}
      aria-valuemax={90}
      aria-valuenow={Math.round((angleRad / degree) * 10) / 10}
      aria-valuetext={`θ = ${formatAngle(angleRad)}`}
      onKeyDown={onKeyDown}
      onFocus={() => setFocused(true)}
      onBlur={() => setFocused(false)}
      style={{ cursor: drag.dragging ? 'grabbing' : 'grab', touchAction: 'none', outline: 'none' }}
      {...drag.handlers}
    >
      {/* A generous invisible target for fingers and mice. */}
      <circle cx={x} cy={y} r={14} fill="transparent" />
      {active && <circle cx={x} cy={y} r={10} fill="none" stroke={figureAccent} strokeWidth={2} />}
    </g>
  );
}
