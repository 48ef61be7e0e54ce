import { useId, useState } from 'react';
import { setPlainField, setTextField } from '../doc/fieldWrites';
import { ChoiceField } from '../fields/ChoiceField';
import { FieldSymbol } from '../fields/FieldSymbol';
import { StrengthFields } from '../fields/StrengthFields';
import { useSheetEditor } from '../hooks/useSheetEditor';
import type { KindViewProps } from './kindView';
import { PointRowsTable } from './PointRowsTable';
import { parseRows, rowsText } from './pointRows';

const UNITS = ['MPa', 'kPa', 'GPa', 'Pa', 'ksi', 'psi'].map((u) => ({ value: u, label: u }));
const COMPONENTS = [
  ['sx', 'σ', 'x'],
  ['sy', 'σ', 'y'],
  ['txy', 'τ', 'xy'],
] as const;

/**
 * A set of stress points checked at once: the rows (typed or pasted, one point per line), which
 * column holds which component, their unit, and the theory with its strengths. On paper and in an
 * issued document the rows are listed as a short table (the first rows and the worst one).
 */
export function PointsetInputs({ cell, cellName, result, errorField, errorId }: KindViewProps) {
  const { doc, readOnly, asDocument } = useSheetEditor();
  const rowsId = useId();
  const rowsErrorId = useId();
  const source = (typeof cell.source === 'object' && cell.source !== null ? cell.source : {}) as {
    rows?: number[][];
    upload?: string;
  };
  const columns = (typeof cell.columns === 'object' && cell.columns !== null ? cell.columns : {}) as Record<string, unknown>;
  const rows = Array.isArray(source.rows) ? source.rows : null;
  // While someone types, their text is theirs until it reads as numbers; then it is written.
  const [draft, setDraft] = useState<string | null>(null);
  const parsed = draft === null ? null : parseRows(draft);
  const width = Math.max(3, ...(rows ?? []).map((row) => row.length));
  const columnChoices = Array.from({ length: width }, (_, i) => ({ value: String(i), label: `column ${i + 1}` }));
  const unit = typeof cell.unit === 'string' ? cell.unit : 'MPa';
  const worst = result?.ok && typeof result.values.worstRow === 'number' ? result.values.worstRow : null;
  const table = rows ? <PointRowsTable rows={rows} columns={columns} unit={unit} worstRow={worst} /> : null;

  return (
    <>
      {rows && asDocument ? (
        table
      ) : rows ? (
        <div className="grid grid-cols-[4.5rem_minmax(0,1fr)] items-start gap-x-2">
          <label htmlFor={rowsId} className="pt-1 text-right text-[0.8125rem] text-ink-muted print:hidden">
            rows
          </label>
          <div className="print:hidden">
            <textarea
              id={rowsId}
              className="input h-24 font-mono text-[0.875rem]"
              value={draft ?? rowsText(rows)}
              readOnly={readOnly}
              spellCheck={false}
              aria-invalid={parsed && !parsed.ok ? 'true' : undefined}
              aria-describedby={parsed && !parsed.ok ? rowsErrorId : undefined}
              onFocus={() => setDraft(rowsText(rows))}
              onChange={(event) => {
                setDraft(event.target.value);
                const next = parseRows(event.target.value);
                if (next.ok) setPlainField(doc, cell.id, 'source', { rows: next.rows });
              }}
              onBlur={() => {
                if (parsed === null || parsed.ok) setDraft(null);
              }}
            />
            <p className="text-[0.75rem] text-ink-faint">
              {rows.length} {rows.length === 1 ? 'point' : 'points'}; one per line, numbers apart by commas or spaces.
            </p>
            {parsed && !parsed.ok ? (
              <p id={rowsErrorId} className="text-[0.8125rem] text-fail" role="alert">
                {parsed.error} — not saved until it reads as numbers.
              </p>
            ) : null}
          </div>
          {/* On paper the text box would be cut off: the short table stands for it. */}
          <div className="col-span-2 hidden print:block">{table}</div>
        </div>
      ) : (
        <p className="pl-[5rem] text-[0.8125rem] text-ink-muted">
          Points from upload <span className="font-mono">{source.upload ?? '—'}</span>
        </p>
      )}
      <div className="grid gap-1 @min-[30rem]:grid-cols-2 @min-[30rem]:gap-x-3">
        {COMPONENTS.map(([key, symbol, sub]) => (
          <ChoiceField
            key={key}
            label={<FieldSymbol symbol={symbol} sub={sub} />}
            value={String(columns[key] ?? '')}
            choices={columnChoices}
            readOnly={readOnly}
            invalid={errorField === `columns.${key}`}
            describedBy={errorId}
            unknownLabel={(v) => `column ${v} (not in the rows)`}
            onChange={(value) => setPlainField(doc, cell.id, 'columns', { ...columns, [key]: Number(value) })}
          />
        ))}
        <ChoiceField
          label="unit"
          value={typeof cell.unit === 'string' ? cell.unit : 'MPa'}
          choices={UNITS}
          readOnly={readOnly}
          invalid={errorField === 'unit'}
          describedBy={errorId}
          onChange={(value) => setTextField(doc, cell.id, 'unit', value)}
        />
      </div>
      <StrengthFields cell={cell} cellName={cellName} errorField={errorField} errorId={errorId} />
    </>
  );
}
