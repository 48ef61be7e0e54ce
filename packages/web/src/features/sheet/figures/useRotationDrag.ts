import { useCallback, useRef, useState, type PointerEvent, type RefObject } from 'react';
import { clientToViewBox } from './figureGeometry';
import type { Point2 } from './figureTypes';

export interface RotationDragOptions {
  /** The figure's `<svg>`; pointer positions are read against its box. */
  svgRef: RefObject<SVGSVGElement | null>;
  /** The figure's viewBox size (origin at 0, 0). */
  viewBox: { width: number; height: number };
  /** The rotation (rad) for a pointer at this SVG position, or null when it has none. */
  angleAt: (svgPoint: Point2) => number | null;
  onRotate: ((angleRad: number) => void) | undefined;
}

export interface RotationDrag {
  dragging: boolean;
  handlers: {
    onPointerDown: (event: PointerEvent<SVGElement>) => void;
    onPointerMove: (event: PointerEvent<SVGElement>) => void;
    onPointerUp: (event: PointerEvent<SVGElement>) => void;
    onPointerCancel: (event: PointerEvent<SVGElement>) => void;
  };
}

/**
 * Pointer dragging of a rotation handle: while the pointer is down on the handle, every move
 * reports the rotation that belongs to the pointer's position. The handle captures the pointer
 * so the drag continues when it leaves the handle or the figure.
 */
export function useRotationDrag({
  svgRef,
  viewBox,
  angleAt,
  onRotate,
}: RotationDragOptions): RotationDrag {
  // A ref as well as state: a move can arrive before React re-renders after the press.
  const activePointer = useRef<number | null>(null);
  const [dragging, setDragging] = useState(false);

  const onPointerDown = useCallback(
    (event: PointerEvent<SVGElement>) => {
      if (!onRotate || event.button !== 0) return;
      event.preventDefault();
      activePointer.current = event.pointerId;
      event.currentTarget.setPointerCapture?.(event.pointerId);
      setDragging(true);
    },
    [onRotate],
  );

  const onPointerMove = useCallback(
    (event: PointerEvent<SVGElement>) => {
      const svg = svgRef.current;
      if (activePointer.current !== event.pointerId || !svg || !onRotate) return;
      const point = clientToViewBox(
        event.clientX,
        event.clientY,
        svg.getBoundingClientRect(),
        viewBox,
      );
      const angle = angleAt(point);
      if (angle !== null) onRotate(angle);
    },
    [svgRef, viewBox, angleAt, onRotate],
  );

  const end = useCallback((event: PointerEvent<SVGElement>) => {
    if (activePointer.current !== event.pointerId) return;
    activePointer.current = null;
    if (event.currentTarget.hasPointerCapture?.(event.pointerId)) {
      event.currentTarget.releasePointerCapture(event.pointerId);
    }
    setDragging(false);
  }, []);

  return {
    dragging,
    handlers: { onPointerDown, onPointerMove, onPointerUp: end, onPointerCancel: end },
  };
}
