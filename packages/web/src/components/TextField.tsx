import { useId, type InputHTMLAttributes } from 'react';
import { FieldError } from './FieldError';

export interface TextFieldProps extends Omit<
  InputHTMLAttributes<HTMLInputElement>,
  'id' | 'name' | 'children'
> {
  label: string;
  name: string;
  /** A message naming what is wrong with the value; marks the input invalid. */
  error?: string | undefined;
  hint?: string;
  /** Set the value in the mono face (codes, numbers, tokens). */
  mono?: boolean;
}

/** A labelled text input with its hint and error wired to it for assistive technology. */
export function TextField({
  label,
  name,
  error,
  hint,
  mono = false,
  className,
  ...input
}: TextFieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [errorId, hintId].filter(Boolean).join(' ') || undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1 block font-medium">
        {label}
      </label>
      <input
        id={id}
        name={name}
        className={`input ${mono ? 'font-mono' : ''}`}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        {...input}
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
