import { useEffect, useMemo } from 'react';
import { deleteField, setTextField } from '../doc/fieldWrites';
import { ExpressionEditor, type EditorBinding } from '../expression/ExpressionEditor';
import { useCellText } from '../hooks/useCellText';
import { useSheetEditor } from '../hooks/useSheetEditor';
import { useSheetNames } from '../hooks/useSheetNames';
import { FieldSymbol } from './FieldSymbol';

export interface ExpressionFieldProps {
  cellId: string;
  /** The cell field it edits (`expr`, `sx`, `angle`, `E`, ...). */
  field: string;
  symbol: string;
  sub?: string;
  /** The field in words, for its accessible name ("normal stress σx of S"). */
  meaning: string;
  placeholder?: string;
  /** The field the cell's error names; this one is marked when it is the one. */
  errorField: string | null;
  errorId?: string;
  /** An optional field is removed again when emptied (it is then simply absent). */
  optional?: boolean;
}

/**
 * One expression field of a cell: its symbol, then a CodeMirror editor bound to the field's
 * Y.Text. A field that is not there yet (an optional one) starts as a plain editor and becomes
 * shared text with its first character.
 */
export function ExpressionField(props: ExpressionFieldProps) {
  const { cellId, field, symbol, sub, meaning, placeholder, errorField, errorId, optional = false } = props;
  const { doc, store, awareness, readOnly, completion, asDocument } = useSheetEditor();
  const names = useSheetNames(store);
  const nameSet = useMemo(() => new Set(names), [names]);
  const text = useCellText(doc, cellId, field);

  // Emptying an optional field by typing removes it, so the file says "not given" rather than "".
  useEffect(() => {
    if (!text || !optional || readOnly) return;
    const onChange = (event: { transaction: { local: boolean } }) => {
      if (event.transaction.local && text.length === 0) deleteField(doc, cellId, field);
    };
    text.observe(onChange);
    return () => text.unobserve(onChange);
  }, [text, optional, readOnly, doc, cellId, field]);

  const binding: EditorBinding = text
    ? { kind: 'shared', text, awareness }
    : { kind: 'plain', value: '', onChange: (value) => value !== '' && setTextField(doc, cellId, field, value) };
  const invalid = errorField === field;

  if (asDocument && (!text || text.length === 0)) {
    // An optional field left out of an issued sheet: say what that means (e.g. "1 when empty").
    return (
      <div className="grid grid-cols-[4.5rem_minmax(0,1fr)] items-baseline gap-x-2" data-field={field}>
        <span className="text-right text-ink-muted" title={meaning}>
          <FieldSymbol symbol={symbol} sub={sub} />
        </span>
        <span className="text-[0.875rem] text-ink-faint">{placeholder ?? 'not given'}</span>
      </div>
    );
  }

  return (
    <div className="grid grid-cols-[4.5rem_minmax(0,1fr)] items-start gap-x-2" data-field={field}>
      <span className="pt-[5px] text-right text-ink-muted" title={meaning}>
        <FieldSymbol symbol={symbol} sub={sub} />
      </span>
      <ExpressionEditor
        binding={binding}
        variant="expression"
        label={meaning}
        readOnly={readOnly}
        names={nameSet}
        sheet={completion}
        placeholder={placeholder}
        invalid={invalid}
        describedBy={invalid ? errorId : undefined}
      />
    </div>
  );
}
