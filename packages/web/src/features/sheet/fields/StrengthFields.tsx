import { isTheoryId, THEORIES, THEORY_IDS, type StrengthKey } from '@sheaf/engine';
import type { SheetFileCell } from '@sheaf/sheet-doc';
import { MaterialPicker } from '../../materials/MaterialPicker';
import { MaterialValues } from '../../materials/MaterialValues';
import { deleteField, setPlainField, setTextField } from '../doc/fieldWrites';
import { usePlainFieldWriter } from '../hooks/usePlainFieldWriter';
import { useSheetEditor } from '../hooks/useSheetEditor';
import { ChoiceField } from './ChoiceField';
import { ExpressionField } from './ExpressionField';
import { PlainExpressionField } from './PlainExpressionField';
import { TextValueField } from './TextValueField';

const STRENGTH_WORDS: Record<StrengthKey, { symbol: string; sub?: string; meaning: string; example: string }> = {
  Sy: { symbol: 'S', sub: 'y', meaning: 'yield strength', example: 'e.g. 250 MPa' },
  Sut: { symbol: 'S', sub: 'ut', meaning: 'ultimate tensile strength', example: 'e.g. 210 MPa' },
  Suc: { symbol: 'S', sub: 'uc', meaning: 'ultimate compressive strength, as a positive magnitude', example: 'e.g. 750 MPa' },
  c: { symbol: 'c', meaning: 'cohesion', example: 'e.g. 12 kPa' },
  phi: { symbol: 'φ', meaning: 'angle of internal friction', example: 'e.g. 30 deg' },
};

const THEORY_CHOICES = THEORY_IDS.map((id) => ({ value: id, label: THEORIES[id].label }));

/**
 * The failure theory of a criterion or point-set cell, the strengths that theory needs (kept in
 * the cell's `strength` value) or the material that supplies them, and the required factor.
 */
export function StrengthFields({
  cell,
  cellName,
  errorField,
  errorId,
}: {
  cell: SheetFileCell;
  cellName: string;
  errorField: string | null;
  errorId?: string;
}) {
  const { doc, readOnly, organizationId, asDocument } = useSheetEditor();
  const writer = usePlainFieldWriter(doc, cell.id);
  const theory = typeof cell.theory === 'string' ? cell.theory : '';
  const needs = isTheoryId(theory) ? THEORIES[theory].needs : [];
  const strength = (typeof cell.strength === 'object' && cell.strength !== null ? cell.strength : {}) as Record<string, unknown>;
  const material = typeof cell.material === 'string' ? cell.material : null;
  // A cell takes its strengths either typed in (`strength`) or from a library material, never both.
  const chooseMaterial = (id: string | undefined) =>
    doc.transact(() => {
      if (id === undefined) {
        deleteField(doc, cell.id, 'material');
        setPlainField(doc, cell.id, 'strength', {});
      } else {
        deleteField(doc, cell.id, 'strength');
        setTextField(doc, cell.id, 'material', id);
      }
    });

  return (
    <>
      <ChoiceField
        label="theory"
        value={theory}
        choices={THEORY_CHOICES}
        readOnly={readOnly}
        invalid={errorField === 'theory'}
        describedBy={errorId}
        onChange={(value) => setTextField(doc, cell.id, 'theory', value)}
      />
      {asDocument && material !== null ? (
        <div className="grid grid-cols-[4.5rem_minmax(0,1fr)] items-start gap-x-2" data-field="material">
          <span className="text-right text-[0.8125rem] text-ink-muted">material</span>
          {asDocument.materials[material] ? (
            <MaterialValues material={asDocument.materials[material]} keys={needs} caption="Frozen at approval" />
          ) : (
            <span>
              <span className="font-mono">{material}</span>{' '}
              <span className="text-ink-muted">(not in the materials frozen with this revision)</span>
            </span>
          )}
        </div>
      ) : organizationId ? (
        <div className="grid grid-cols-[4.5rem_minmax(0,1fr)] items-start gap-x-2">
          <span className="pt-[5px] text-right text-[0.8125rem] text-ink-muted">material</span>
          <MaterialPicker
            organizationId={organizationId}
            value={material ?? undefined}
            theory={isTheoryId(theory) ? theory : undefined}
            label={`material of ${cellName}`}
            visuallyHiddenLabel
            disabled={readOnly}
            onChange={chooseMaterial}
          />
        </div>
      ) : null}
      {asDocument && material !== null ? null : material !== null && !organizationId ? (
        <div className="grid grid-cols-[4.5rem_minmax(0,1fr)] items-start gap-x-2">
          <span className="pt-[5px] text-right text-[0.8125rem] text-ink-muted">material</span>
          <TextValueField
            cellId={cell.id}
            field="material"
            label={`material of ${cellName}`}
            invalid={errorField === 'material'}
            describedBy={errorId}
          />
        </div>
      ) : material !== null ? null : (
        needs.map((key) => {
          const words = STRENGTH_WORDS[key];
          const value = strength[key];
          return (
            <PlainExpressionField
              key={key}
              path={`strength.${key}`}
              symbol={words.symbol}
              sub={words.sub}
              meaning={`${words.meaning} for ${cellName}`}
              value={typeof value === 'string' ? value : ''}
              placeholder={words.example}
              undo={writer.undo}
              errorField={errorField}
              errorId={errorId}
              onChange={(next) =>
                writer.write((fields) => {
                  const current = fields.get('strength');
                  const base = typeof current === 'object' && current !== null ? current : {};
                  fields.set('strength', { ...base, [key]: next });
                })
              }
            />
          );
        })
      )}
      <ExpressionField
        cellId={cell.id}
        field="required"
        symbol="n"
        sub="req"
        meaning={`required factor of safety for ${cellName}`}
        placeholder="1 when empty"
        errorField={errorField}
        errorId={errorId}
        optional
      />
      {needs.length > 0 && material === null && !readOnly ? (
        <p className="no-print pl-[5rem] text-[0.75rem] text-ink-faint">
          Take strengths from a published source for the material and cite it in a note (standard or
          handbook, edition, table; minimum specification values marked as such).
        </p>
      ) : null}
    </>
  );
}
