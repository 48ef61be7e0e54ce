import { useId, type SelectHTMLAttributes } from 'react';
import { FieldError } from './FieldError';

export interface SelectFieldProps extends Omit<
  SelectHTMLAttributes<HTMLSelectElement>,
  'id' | 'name'
> {
  label: string;
  name: string;
  error?: string | undefined;
  hint?: string;
}

export function SelectField({
  label,
  name,
  error,
  hint,
  className,
  children,
  ...select
}: SelectFieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  return (
    <div className={className}>
      <label htmlFor={id} className="mb-1 block font-medium">
        {label}
      </label>
      <select
        id={id}
        name={name}
        className="input"
        aria-invalid={error ? true : undefined}
        aria-describedby={[errorId, hintId].filter(Boolean).join(' ') || undefined}
        {...select}
      >
        {children}
      </select>
      {hint && !error ? (
        <p id={hintId} className="mt-1 text-[0.8125rem] text-ink-muted">
          {hint}
        </p>
      ) : null}
      {error ? <FieldError id={errorId}>{error}</FieldError> : null}
    </div>
  );
}
