import { useLayoutEffect, type RefObject } from 'react';

/**
 * Keeps each group of the notes rail level with its cell: every element of `rail` that carries
 * `data-rail-cell` gets a top margin that brings it down to the top of the matching
 * `[data-cell-id]` element under `cells`, never overlapping the group above it. Cells that are
 * not in the page (the list is still loading, or shows no anchors) leave the groups stacked.
 * Margins are written straight to the elements: a layout pass, not React state, so there is no
 * render loop. It runs again whenever either column changes size.
 */
export function useRailAlignment(rail: RefObject<HTMLElement | null>, cells: RefObject<HTMLElement | null>, layoutKey: unknown): void {
  useLayoutEffect(() => {
    const railElement = rail.current;
    const cellsElement = cells.current;
    if (!railElement || !cellsElement) return;
    let frame = 0;
    const align = () => {
      frame = 0;
      const groups = [...railElement.querySelectorAll<HTMLElement>('[data-rail-cell]')];
      for (const group of groups) group.style.marginTop = '';
      const railTop = railElement.getBoundingClientRect().top;
      let bottom = 0;
      for (const group of groups) {
        const cellId = group.dataset.railCell ?? '';
        const anchor = cellsElement.querySelector<HTMLElement>(`[data-cell-id="${CSS.escape(cellId)}"]`);
        const naturalTop = group.getBoundingClientRect().top - railTop;
        const wanted = anchor ? anchor.getBoundingClientRect().top - railTop : naturalTop;
        const gap = Math.max(0, wanted - Math.max(naturalTop, bottom));
        if (gap > 0) group.style.marginTop = `${gap + parseFloat(getComputedStyle(group).marginTop || '0')}px`;
        bottom = group.getBoundingClientRect().bottom - railTop + 8;
      }
    };
    const schedule = () => {
      if (frame === 0) frame = requestAnimationFrame(align);
    };
    align();
    const observer = typeof ResizeObserver === 'undefined' ? null : new ResizeObserver(schedule);
    observer?.observe(railElement);
    observer?.observe(cellsElement);
    window.addEventListener('resize', schedule);
    return () => {
      observer?.disconnect();
      window.removeEventListener('resize', schedule);
      if (frame !== 0) cancelAnimationFrame(frame);
    };
  }, [rail, cells, layoutKey]);
}
