import { deleteField, setPlainField, setTextField } from '../doc/fieldWrites';
import { ChoiceField } from '../fields/ChoiceField';
import { ExpressionField } from '../fields/ExpressionField';
import { PlainExpressionField } from '../fields/PlainExpressionField';
import { usePlainFieldWriter } from '../hooks/usePlainFieldWriter';
import { useSheetEditor } from '../hooks/useSheetEditor';
import type { KindViewProps } from './kindView';

const LAYOUTS = [
  { value: 'rectangular', label: 'Rectangular: 0°, 45°, 90°' },
  { value: 'delta', label: 'Delta: 0°, 60°, 120°' },
  { value: 'angles', label: 'Three gauge angles of my own' },
];

const GAUGES = [
  { field: 'ea', sub: 'a', meaning: 'strain of gauge a (on x)' },
  { field: 'eb', sub: 'b', meaning: 'strain of gauge b' },
  { field: 'ec', sub: 'c', meaning: 'strain of gauge c' },
] as const;

/**
 * A strain-gauge rosette: its layout (gauge a on x, b and c counterclockwise from it), the three
 * readings (plain strains, e.g. 420e-6), and E and ν of the material.
 */
export function RosetteInputs({ cell, cellName, errorField, errorId }: KindViewProps) {
  const { doc, readOnly } = useSheetEditor();
  const writer = usePlainFieldWriter(doc, cell.id);
  const layout = typeof cell.layout === 'string' ? cell.layout : '';
  const angles = Array.isArray(cell.angles) ? (cell.angles as unknown[]) : null;

  const changeLayout = (next: string) =>
    doc.transact(() => {
      setTextField(doc, cell.id, 'layout', next);
      if (next === 'angles' && !angles) setPlainField(doc, cell.id, 'angles', ['0 deg', '45 deg', '90 deg']);
      if (next !== 'angles') deleteField(doc, cell.id, 'angles');
    });

  return (
    <>
      <ChoiceField
        label="layout"
        value={layout}
        choices={LAYOUTS}
        readOnly={readOnly}
        invalid={errorField === 'layout'}
        describedBy={errorId}
        onChange={changeLayout}
      />
      {layout === 'angles' && angles ? (
        <div className="grid gap-1 @min-[40rem]:grid-cols-3 @min-[40rem]:gap-x-3">
          {[0, 1, 2].map((index) => (
            <PlainExpressionField
              key={index}
              path={`angles[${index}]`}
              symbol="θ"
              sub={'abc'[index]}
              meaning={`angle of gauge ${'abc'[index]} from x, ${cellName}`}
              value={typeof angles[index] === 'string' ? (angles[index] as string) : ''}
              undo={writer.undo}
              errorField={errorField}
              errorId={errorId}
              onChange={(next) =>
                writer.write((fields) => {
                  const current = fields.get('angles');
                  const list = Array.isArray(current) ? [...(current as unknown[])] : ['', '', ''];
                  list[index] = next;
                  fields.set('angles', list);
                })
              }
            />
          ))}
        </div>
      ) : null}
      <div className="grid gap-1 @min-[40rem]:grid-cols-3 @min-[40rem]:gap-x-3">
        {GAUGES.map(({ field, sub, meaning }) => (
          <ExpressionField
            key={field}
            cellId={cell.id}
            field={field}
            symbol="ε"
            sub={sub}
            meaning={`${meaning}, ${cellName}`}
            placeholder="e.g. 420e-6"
            errorField={errorField}
            errorId={errorId}
          />
        ))}
      </div>
      <div className="grid gap-1 @min-[40rem]:grid-cols-3 @min-[40rem]:gap-x-3">
        <ExpressionField
          cellId={cell.id}
          field="E"
          symbol="E"
          meaning={`Young's modulus, ${cellName}`}
          placeholder="e.g. 200 GPa"
          errorField={errorField}
          errorId={errorId}
        />
        <ExpressionField
          cellId={cell.id}
          field="nu"
          symbol="ν"
          meaning={`Poisson's ratio, ${cellName}`}
          placeholder="e.g. 0.29"
          errorField={errorField}
          errorId={errorId}
        />
      </div>
    </>
  );
}
