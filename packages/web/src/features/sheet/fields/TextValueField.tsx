import { setTextField } from '../doc/fieldWrites';
import { ExpressionEditor, type EditorBinding } from '../expression/ExpressionEditor';
import { useCellText } from '../hooks/useCellText';
import { useSheetEditor } from '../hooks/useSheetEditor';

/**
 * A short text field of a cell that is not an expression (its name, a material id), bound to its
 * Y.Text like every other string field.
 */
export function TextValueField({
  cellId,
  field,
  label,
  placeholder,
  invalid = false,
  describedBy,
  className = '',
}: {
  cellId: string;
  field: string;
  label: string;
  placeholder?: string;
  invalid?: boolean;
  describedBy?: string;
  className?: string;
}) {
  const { doc, awareness, readOnly } = useSheetEditor();
  const text = useCellText(doc, cellId, field);
  const binding: EditorBinding = text
    ? { kind: 'shared', text, awareness }
    : { kind: 'plain', value: '', onChange: (value) => value !== '' && setTextField(doc, cellId, field, value) };
  return (
    <div className={className} data-field={field}>
      <ExpressionEditor
        binding={binding}
        variant="name"
        label={label}
        readOnly={readOnly}
        placeholder={placeholder}
        invalid={invalid}
        describedBy={describedBy}
      />
    </div>
  );
}
