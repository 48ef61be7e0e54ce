import { peopleOf, type PresencePeer } from '../../collab/presence';
import type { CellSummary } from './evaluation/sheetEvaluatorStore';

/**
 * Who else has the sheet open, each in their own colour (the colour of their caret and of the
 * outline on the cell they are in), and where they are working.
 */
export function PresenceBar({
  peers,
  cells,
  selfName,
}: {
  peers: readonly PresencePeer[];
  cells: readonly CellSummary[];
  selfName: string;
}) {
  const people = peopleOf(peers);
  const where = (ids: readonly string[]) => {
    const names = ids.map((id) => {
      const index = cells.findIndex((c) => c.id === id);
      const cell = cells[index];
      return cell ? cell.name || `cell ${index + 1}` : null;
    });
    return names.filter((n): n is string => n !== null);
  };
  return (
    <section aria-label="Who is in this sheet" className="flex flex-wrap items-center gap-x-3 gap-y-1 text-[0.8125rem]">
      <span className="text-ink-muted">In this sheet:</span>
      <span className="inline-flex items-center gap-1">
        <span aria-hidden="true" className="inline-block h-2.5 w-2.5 rounded-full border border-ink bg-paper" />
        {selfName} (you)
      </span>
      {people.map(({ user, copies, cells: inCells }) => {
        const places = where(inCells);
        return (
          <span key={user.id} className="inline-flex items-center gap-1" data-person={user.name}>
            <span aria-hidden="true" className="inline-block h-2.5 w-2.5 rounded-full" style={{ background: user.colour }} />
            <span>
              {user.name}
              {copies > 1 ? <span className="text-ink-muted"> ×{copies}</span> : null}
              {places.length > 0 ? <span className="text-ink-muted"> — in {places.join(', ')}</span> : null}
            </span>
          </span>
        );
      })}
      {people.length === 0 ? <span className="text-ink-faint">nobody else right now</span> : null}
    </section>
  );
}
