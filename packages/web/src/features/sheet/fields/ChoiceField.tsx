import { useContext, useId, type ReactNode } from 'react';
import { SheetEditorContext } from '../sheetEditorContext';

export interface Choice {
  value: string;
  label: string;
}

/**
 * A field with a fixed set of values (theory, layout, unit, the state a cell refers to) as a
 * select. A value that is not one of the choices (typed into the file, or a cell since renamed)
 * is kept and shown as such, never silently replaced. In an issued document the choice reads as
 * text.
 */
export function ChoiceField({
  label,
  value,
  choices,
  onChange,
  readOnly,
  invalid = false,
  describedBy,
  unknownLabel = (v: string) => `${v} (not available)`,
}: {
  label: ReactNode;
  value: string;
  choices: readonly Choice[];
  onChange: (value: string) => void;
  readOnly: boolean;
  invalid?: boolean;
  describedBy?: string;
  unknownLabel?: (value: string) => string;
}) {
  const id = useId();
  const asDocument = useContext(SheetEditorContext)?.asDocument !== undefined;
  const chosen = choices.find((choice) => choice.value === value);
  if (asDocument) {
    return (
      <div className="grid grid-cols-[4.5rem_minmax(0,1fr)] items-baseline gap-x-2" data-choice-text="">
        <span className="text-right text-[0.8125rem] text-ink-muted">{label}</span>
        <span className={value === '' ? 'text-ink-faint' : ''}>{chosen ? chosen.label : value === '' ? '—' : unknownLabel(value)}</span>
      </div>
    );
  }
  const known = chosen !== undefined;
  return (
    <div className="grid grid-cols-[4.5rem_minmax(0,1fr)] items-center gap-x-2">
      <label htmlFor={id} className="text-right text-[0.8125rem] text-ink-muted">
        {label}
      </label>
      <select
        id={id}
        className="input max-w-[22rem] py-1"
        value={value}
        disabled={readOnly}
        aria-invalid={invalid ? 'true' : undefined}
        aria-describedby={invalid ? describedBy : undefined}
        onChange={(event) => onChange(event.target.value)}
      >
        {!known ? <option value={value}>{value === '' ? '— choose —' : unknownLabel(value)}</option> : null}
        {choices.map((choice) => (
          <option key={choice.value} value={choice.value}>
            {choice.label}
          </option>
        ))}
      </select>
    </div>
  );
}
