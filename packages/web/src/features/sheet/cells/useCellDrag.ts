import { useMemo, useState, type DragEvent } from 'react';

const CELL_TYPE = 'application/x-sheaf-cell';

export interface CellDrag {
  /** The cell being dragged, if any. */
  dragging: string | null;
  /** Where it would land: before the cell with this index (ids.length = at the end). */
  dropIndex: number | null;
  handleProps(id: string): {
    draggable: true;
    onDragStart: (event: DragEvent<HTMLElement>) => void;
    onDragEnd: () => void;
  };
  targetProps(index: number): {
    onDragOver: (event: DragEvent<HTMLElement>) => void;
    onDrop: (event: DragEvent<HTMLElement>) => void;
  };
}

/**
 * Reordering by dragging a cell's handle: while over a card, the drop line sits above or below
 * it depending on which half the pointer is in; dropping moves the cell there (`onMove` gets
 * the position the cell will have afterwards).
 */
export function useCellDrag(ids: readonly string[], onMove: (id: string, to: number) => void): CellDrag {
  const [dragging, setDragging] = useState<string | null>(null);
  const [dropIndex, setDropIndex] = useState<number | null>(null);

  return useMemo<CellDrag>(() => ({
    dragging,
    dropIndex,
    handleProps: (id) => ({
      draggable: true,
      onDragStart(event) {
        event.dataTransfer.effectAllowed = 'move';
        event.dataTransfer.setData(CELL_TYPE, id);
        event.dataTransfer.setData('text/plain', id);
        // The whole card follows the pointer, not just the handle.
        const card = event.currentTarget.closest('[data-cell-id]');
        if (card instanceof HTMLElement) event.dataTransfer.setDragImage(card, 24, 16);
        setDragging(id);
      },
      onDragEnd() {
        setDragging(null);
        setDropIndex(null);
      },
    }),
    targetProps: (index) => ({
      onDragOver(event) {
        if (!dragging) return;
        event.preventDefault();
        event.dataTransfer.dropEffect = 'move';
        const box = event.currentTarget.getBoundingClientRect();
        const next = event.clientY < box.top + box.height / 2 ? index : index + 1;
        if (next !== dropIndex) setDropIndex(next);
      },
      onDrop(event) {
        const id = event.dataTransfer.getData(CELL_TYPE) || dragging;
        event.preventDefault();
        setDragging(null);
        setDropIndex(null);
        if (!id || dropIndex === null) return;
        const from = ids.indexOf(id);
        if (from < 0) return;
        // Dropping below itself counts the gap it leaves.
        const to = dropIndex > from ? dropIndex - 1 : dropIndex;
        if (to !== from) onMove(id, to);
      },
    }),
  }), [dragging, dropIndex, ids, onMove]);
}
