import type { ReactNode } from 'react';
import { cellReferences, unknownNames } from './unknownNames';

/**
 * A field's text without an editor: for read-only seats (nothing to edit, so no editor is
 * built) and for a writer's field until its editor is ready. Unknown names and cell names are
 * marked as the editor marks them.
 */
export function StaticExpression({
  text,
  variant,
  names,
  label,
  readOnly,
  invalid,
  describedBy,
  placeholder,
  onActivate,
}: {
  text: string;
  variant: 'expression' | 'name' | 'prose';
  names: ReadonlySet<string>;
  label: string;
  readOnly: boolean;
  invalid?: boolean;
  describedBy?: string;
  placeholder?: string;
  /** A writer clicked or tabbed in: build the editor now. */
  onActivate?: () => void;
}) {
  return (
    <div
      role="textbox"
      tabIndex={0}
      aria-label={label}
      aria-readonly={readOnly ? 'true' : undefined}
      aria-invalid={invalid ? 'true' : undefined}
      aria-describedby={describedBy}
      aria-multiline={variant === 'prose' ? 'true' : 'false'}
      data-static-field=""
      onFocus={onActivate}
      onPointerDown={onActivate}
      className={`static-field min-h-[1.9rem] rounded-[3px] border border-paper-rule px-[6px] py-[3px] font-mono text-[0.9375rem] leading-[1.5] ${
        readOnly ? 'bg-paper-sunk' : 'bg-white'
      } ${variant === 'prose' ? 'break-words whitespace-pre-wrap' : 'overflow-hidden whitespace-pre'}`}
    >
      {text === '' ? <span className="text-ink-faint">{readOnly ? '' : placeholder}</span> : variant === 'expression' ? marked(text, names) : text}
    </div>
  );
}

function marked(text: string, names: ReadonlySet<string>): ReactNode[] {
  const marks = [
    ...unknownNames(text, names).map((r) => ({ ...r, unknown: true })),
    ...cellReferences(text, names).map((r) => ({ ...r, unknown: false })),
  ].sort((a, b) => a.from - b.from);
  const parts: ReactNode[] = [];
  let at = 0;
  for (const mark of marks) {
    if (mark.from > at) parts.push(text.slice(at, mark.from));
    parts.push(
      mark.unknown ? (
        <span
          key={mark.from}
          className="underline decoration-fail decoration-wavy underline-offset-[3px]"
          title={`No cell is named ${mark.name}, and it is not a unit`}
          data-unknown-name={mark.name}
        >
          {mark.name}
        </span>
      ) : (
        <span key={mark.from} className="font-semibold">
          {mark.name}
        </span>
      ),
    );
    at = mark.to;
  }
  if (at < text.length) parts.push(text.slice(at));
  return parts;
}
