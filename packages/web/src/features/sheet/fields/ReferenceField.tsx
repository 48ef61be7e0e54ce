import { STATE_KINDS } from '@sheaf/engine';
import { setTextField } from '../doc/fieldWrites';
import { useCellSummary } from '../hooks/useCellSummary';
import { useSheetEditor } from '../hooks/useSheetEditor';
import { ChoiceField } from './ChoiceField';

/**
 * The `of` field: which cell's stress state this cell works on. Offers the stress, rosette,
 * rotate and principal cells of the sheet (the ones above first, as a hand calculation reads).
 */
export function ReferenceField({
  cellId,
  value,
  errorField,
  errorId,
}: {
  cellId: string;
  value: string;
  errorField: string | null;
  errorId?: string;
}) {
  const { doc, store, readOnly } = useSheetEditor();
  const summary = useCellSummary(store);
  const position = summary.findIndex((cell) => cell.id === cellId);
  const states = summary
    .map((cell, index) => ({ ...cell, below: index > position }))
    .filter((cell) => cell.id !== cellId && cell.name !== '' && (STATE_KINDS as readonly string[]).includes(cell.kind));
  const choices = states.map((cell) => ({
    value: cell.name,
    label: `${cell.name} — ${cell.kind}${cell.below ? ' (below)' : ''}`,
  }));
  return (
    <ChoiceField
      label="of"
      value={value}
      choices={choices}
      readOnly={readOnly}
      invalid={errorField === 'of'}
      describedBy={errorId}
      unknownLabel={(name) => `${name} — no such stress state`}
      onChange={(name) => setTextField(doc, cellId, 'of', name)}
    />
  );
}
