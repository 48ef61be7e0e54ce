import { VerdictShape } from '../../components/VerdictShape';

/**
 * The mark on a cell that has open notes: the warning triangle and the count, with the words
 * for screen readers. Clicking it shows the cell's notes in the rail. Nothing when none are open.
 */
export function CellNoteBadge({ cellId, count, cellLabel }: { cellId: string; count: number; cellLabel?: string }) {
  if (count <= 0) return null;
  const words = `${count} open ${count === 1 ? 'note' : 'notes'}${cellLabel ? ` on ${cellLabel}` : ''}`;
  return (
    <a
      href={`#notes-${encodeURIComponent(cellId)}`}
      title={words}
      className="inline-flex items-center gap-1 rounded-[2px] border border-low px-1.5 text-[0.75rem] font-medium text-low no-underline"
      onClick={(event) => {
        const target = document.getElementById(`notes-${cellId}`);
        if (!target) return;
        event.preventDefault();
        target.scrollIntoView({ block: 'nearest', behavior: 'smooth' });
        target.focus({ preventScroll: true });
      }}
    >
      <VerdictShape verdict="low" />
      <span aria-hidden="true">{count}</span>
      <span className="sr-only">{words}</span>
    </a>
  );
}
