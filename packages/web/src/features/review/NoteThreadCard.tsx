import { useState } from 'react';
import type { Note, NoteThread } from '@sheaf/engine/api';
import { describeError } from '../../api/ApiError';
import { useSetThreadResolved } from '../../api/notes';
import { formatDateTime } from '../../lib/formatDateTime';
import { NoteComposer } from './NoteComposer';
import { NoteStateLabel } from './NoteStateLabel';

/** One note thread: the first note, its replies, its state, and the reply and resolve controls. */
export function NoteThreadCard({
  sheetId,
  thread,
  canReply,
  canResolve,
}: {
  sheetId: string;
  thread: NoteThread;
  canReply: boolean;
  canResolve: boolean;
}) {
  const [replying, setReplying] = useState(false);
  const resolve = useSetThreadResolved(sheetId);
  const resolved = thread.status === 'resolved';
  return (
    <article
      aria-label={`Note by ${thread.author.name}`}
      data-note-id={thread.id}
      className={`rounded-[3px] border bg-white px-2.5 py-2 text-[0.8125rem] ${resolved ? 'border-paper-line opacity-75' : 'border-low'}`}
    >
      <div className="flex flex-wrap items-baseline justify-between gap-x-2">
        <NoteStateLabel state={thread.status} />
        <span className="font-mono text-[0.75rem] text-ink-faint">rev. {thread.revision}</span>
      </div>
      <NoteBody note={thread} />
      {thread.replies.map((reply) => (
        <div key={reply.id} className="mt-2 border-l-2 border-paper-line pl-2">
          <NoteBody note={reply} />
        </div>
      ))}
      {resolved && thread.resolvedBy ? (
        <p className="mt-1 text-[0.75rem] text-ink-muted">
          Resolved by {thread.resolvedBy.name}
          {thread.resolvedAt ? <span className="font-mono"> {formatDateTime(thread.resolvedAt)}</span> : null}
        </p>
      ) : null}
      {resolve.error ? (
        <p role="alert" className="mt-1 text-fail">
          {describeError(resolve.error)}
        </p>
      ) : null}
      {replying ? (
        <NoteComposer sheetId={sheetId} cellId={thread.cellId} parentId={thread.id} label={`Reply to ${thread.author.name}`} onDone={() => setReplying(false)} autoFocus />
      ) : (
        <div className="mt-1.5 flex gap-3">
          {canReply ? (
            <button type="button" className="text-[0.8125rem] underline" onClick={() => setReplying(true)}>
              Reply
            </button>
          ) : null}
          {canResolve ? (
            <button
              type="button"
              className="text-[0.8125rem] underline"
              disabled={resolve.isPending}
              onClick={() => resolve.mutate({ threadId: thread.id, resolved: !resolved })}
            >
              {resolved ? 'Reopen' : 'Resolve'}
            </button>
          ) : null}
        </div>
      )}
    </article>
  );
}

function NoteBody({ note }: { note: Note }) {
  return (
    <div className="mt-1">
      <p className="text-[0.75rem] text-ink-muted">
        <span className="font-medium text-ink">{note.author.name}</span>{' '}
        <span className="font-mono">{formatDateTime(note.createdAt)}</span>
      </p>
      <p className="break-words whitespace-pre-wrap">{withMentions(note)}</p>
    </div>
  );
}

/** The body with each `@name` of a mentioned member set in bold. */
function withMentions(note: Note) {
  if (note.mentions.length === 0) return note.body;
  // Members are named by full name or first name (the server also takes the mailbox name).
  const names = note.mentions.flatMap((m) => [m.name, m.name.split(/\s+/)[0] ?? m.name]).sort((a, b) => b.length - a.length);
  const pattern = new RegExp(`(@(?:${names.map(escapeRegExp).join('|')}))(?![\\p{L}\\p{N}])`, 'giu');
  return note.body.split(pattern).map((part, index) =>
    index % 2 === 1 ? (
      <strong key={index} className="font-semibold">
        {part}
      </strong>
    ) : (
      part
    ),
  );
}

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}
