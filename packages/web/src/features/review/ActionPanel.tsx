import type { FormEvent, ReactNode } from 'react';
import { FormAlert } from '../../components/FormAlert';

/**
 * The form of one check action, opened under the sheet header: a heading that says what will
 * happen, the fields, an error from the server if any, and the confirm and cancel buttons.
 */
export function ActionPanel({
  title,
  explanation,
  error,
  confirmLabel,
  busy,
  onConfirm,
  onCancel,
  children,
}: {
  title: string;
  explanation: ReactNode;
  error: string | null;
  confirmLabel: string;
  busy: boolean;
  onConfirm: () => void;
  onCancel: () => void;
  children?: ReactNode;
}) {
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onConfirm();
  };
  return (
    <form
      aria-label={title}
      onSubmit={submit}
      className="mt-3 rounded-[3px] border border-paper-rule bg-paper-sunk px-4 py-3"
    >
      <h3 className="text-[0.9375rem]">{title}</h3>
      <div className="mt-1 mb-3 max-w-[44rem] text-[0.8125rem] text-ink-muted">{explanation}</div>
      {error ? <FormAlert title="The server refused">{error}</FormAlert> : null}
      <div className="grid max-w-[36rem] gap-3">{children}</div>
      <div className="mt-3 flex gap-2">
        <button type="submit" className="btn btn-primary" disabled={busy}>
          {busy ? 'Working…' : confirmLabel}
        </button>
        <button type="button" className="btn" onClick={onCancel} disabled={busy}>
          Cancel
        </button>
      </div>
    </form>
  );
}
