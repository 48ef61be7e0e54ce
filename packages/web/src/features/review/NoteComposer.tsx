import { useId, useState, type FormEvent } from 'react';
import { describeError } from '../../api/ApiError';
import { useCreateNote } from '../../api/notes';

/**
 * Writing a note: on a cell (a new thread) or as a reply. `@name` mentions a member, who is
 * sent an e-mail. The text is kept when the server refuses it, so nothing typed is lost.
 */
export function NoteComposer({
  sheetId,
  cellId,
  parentId,
  label,
  onDone,
  autoFocus = false,
}: {
  sheetId: string;
  cellId: string;
  parentId?: string;
  label: string;
  onDone?: () => void;
  autoFocus?: boolean;
}) {
  const create = useCreateNote(sheetId);
  const [body, setBody] = useState('');
  const id = useId();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (!body.trim()) return;
    create.mutate(
      { cellId, body: body.trim(), ...(parentId ? { parentId } : {}) },
      {
        onSuccess: () => {
          setBody('');
          onDone?.();
        },
      },
    );
  };
  return (
    <form onSubmit={submit} className="mt-2">
      <label htmlFor={id} className="sr-only">
        {label}
      </label>
      <textarea
        id={id}
        className="input min-h-[3.5rem] text-[0.8125rem]"
        placeholder={parentId ? 'Reply… (@name mentions a member)' : 'Note on this cell… (@name mentions a member)'}
        value={body}
        maxLength={4000}
        // A composer opened on purpose (Reply, Add a note) takes the focus.
        autoFocus={autoFocus}
        onChange={(event) => setBody(event.target.value)}
      />
      {create.error ? (
        <p role="alert" className="mt-1 text-[0.8125rem] text-fail">
          {describeError(create.error)}
        </p>
      ) : null}
      <div className="mt-1 flex gap-2">
        <button type="submit" className="btn py-0.5 text-[0.8125rem]" disabled={create.isPending || !body.trim()}>
          {parentId ? 'Reply' : 'Add note'}
        </button>
        {onDone ? (
          <button type="button" className="btn py-0.5 text-[0.8125rem]" onClick={onDone}>
            Cancel
          </button>
        ) : null}
      </div>
    </form>
  );
}
