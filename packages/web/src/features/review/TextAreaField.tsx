import { useId, type TextareaHTMLAttributes } from 'react';
import { FieldError } from '../../components/FieldError';

/** A labelled multi-line text field with its hint and error wired to it. */
export function TextAreaField({
  label,
  hint,
  error,
  className,
  ...textarea
}: Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'id'> & { label: string; hint?: string; error?: string | undefined }) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1 block font-medium">
        {label}
      </label>
      <textarea
        id={id}
        className="input min-h-[4.5rem]"
        aria-invalid={error ? true : undefined}
        aria-describedby={[errorId, hintId].filter(Boolean).join(' ') || undefined}
        {...textarea}
      />
      {hint && !error ? (
        <p id={hintId} className="mt-1 text-[0.8125rem] text-ink-muted">
          {hint}
        </p>
      ) : null}
      {error ? <FieldError id={errorId}>{error}</FieldError> : null}
    </div>
  );
}
