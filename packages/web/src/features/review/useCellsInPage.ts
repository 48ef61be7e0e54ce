import { useEffect, useState, type RefObject } from 'react';

export interface PageCells {
  ids: readonly string[];
  labels: Readonly<Record<string, string>>;
}

function sameCells(a: PageCells, b: PageCells): boolean {
  return a.ids.length === b.ids.length && a.ids.every((id, i) => id === b.ids[i] && a.labels[id] === b.labels[id]);
}

/**
 * The cells shown under `root`, in page order, read from their `data-cell-id` (and `aria-label`
 * for a label), so the notes rail follows the live sheet as cells are added, moved and removed.
 * Until any cell is in the page, the given `fallback` (the sheet as last saved) stands in.
 */
export function useCellsInPage(root: RefObject<HTMLElement | null>, fallback: PageCells): PageCells {
  const [inPage, setInPage] = useState<PageCells | null>(null);
  useEffect(() => {
    const element = root.current;
    if (!element) return;
    const read = () => {
      const found = [...element.querySelectorAll<HTMLElement>('[data-cell-id]')];
      const next: PageCells = {
        ids: found.map((cell) => cell.dataset.cellId ?? ''),
        labels: Object.fromEntries(found.map((cell) => [cell.dataset.cellId ?? '', cell.getAttribute('aria-label') ?? cell.dataset.cellId ?? ''])),
      };
      setInPage((previous) => (next.ids.length === 0 ? null : previous && sameCells(previous, next) ? previous : next));
    };
    read();
    const observer = new MutationObserver(read);
    observer.observe(element, { childList: true, subtree: true, attributes: true, attributeFilter: ['data-cell-id', 'aria-label'] });
    return () => observer.disconnect();
  }, [root]);
  return inPage ?? fallback;
}
