import { useMemo } from 'react';
import { ExpressionEditor } from '../expression/ExpressionEditor';
import { useSheetEditor } from '../hooks/useSheetEditor';
import { useSheetNames } from '../hooks/useSheetNames';
import type { PlainUndo } from '../expression/ExpressionEditor';
import { FieldSymbol } from './FieldSymbol';

/**
 * An expression that lives inside a plain JSON value of the cell (a strength inside `strength`,
 * a gauge angle inside `angles`): edited like any expression, written back as part of its value.
 */
export function PlainExpressionField(props: {
  path: string;
  symbol: string;
  sub?: string;
  meaning: string;
  value: string;
  onChange: (value: string) => void;
  undo: PlainUndo;
  placeholder?: string;
  errorField: string | null;
  errorId?: string;
}) {
  const { path, symbol, sub, meaning, value, onChange, undo, placeholder, errorField, errorId } = props;
  const { store, readOnly, completion } = useSheetEditor();
  const names = useSheetNames(store);
  const nameSet = useMemo(() => new Set(names), [names]);
  const invalid = errorField === path;
  return (
    <div className="grid grid-cols-[4.5rem_minmax(0,1fr)] items-start gap-x-2" data-field={path}>
      <span className="pt-[5px] text-right text-ink-muted" title={meaning}>
        <FieldSymbol symbol={symbol} sub={sub} />
      </span>
      <ExpressionEditor
        binding={{ kind: 'plain', value, onChange, undo }}
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
