import type { HistoryEvent } from '@sheaf/engine/api';
import { formatDateTime } from '../../lib/formatDateTime';

/** A sheet's workflow and note events, newest first: when, who, what, and the words that went with it. */
export function HistoryList({ events }: { events: readonly HistoryEvent[] }) {
  if (events.length === 0) return <p className="text-ink-muted">Nothing has happened in the check workflow yet.</p>;
  return (
    <ol className="divide-y divide-paper-line border-y border-paper-line">
      {events.map((event) => (
        <li key={event.id} className="grid grid-cols-[9.5rem_1fr] gap-x-3 py-2 text-[0.875rem] max-sm:grid-cols-1">
          <span className="font-mono text-[0.8125rem] text-ink-muted">{formatDateTime(event.at)}</span>
          <div className="min-w-0">
            <p>
              <span className="font-medium">{event.actor?.name ?? 'Sheaf'}</span> — {event.summary}
              {event.revision !== null ? <span className="ml-2 font-mono text-[0.75rem] text-ink-faint">rev. {event.revision}</span> : null}
            </p>
            {event.message ? <p className="mt-0.5 break-words whitespace-pre-wrap text-ink-muted">“{event.message}”</p> : null}
          </div>
        </li>
      ))}
    </ol>
  );
}
