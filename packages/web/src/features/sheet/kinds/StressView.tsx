import { isFailure } from '@sheaf/engine';
import { deleteField, setTextField } from '../doc/fieldWrites';
import { ExpressionField } from '../fields/ExpressionField';
import { useSheetEditor } from '../hooks/useSheetEditor';
import { useSheetSettings } from '../hooks/useSheetSettings';
import type { KindViewProps } from './kindView';

const PLANE = [
  { field: 'sx', symbol: 'σ', sub: 'x', meaning: 'normal stress on the x face' },
  { field: 'sy', symbol: 'σ', sub: 'y', meaning: 'normal stress on the y face' },
  { field: 'txy', symbol: 'τ', sub: 'xy', meaning: 'shear stress, +y on the +x face' },
] as const;
const OUT_OF_PLANE = [
  { field: 'sz', symbol: 'σ', sub: 'z', meaning: 'normal stress on the z face' },
  { field: 'tyz', symbol: 'τ', sub: 'yz', meaning: 'shear stress, +z on the +y face' },
  { field: 'tzx', symbol: 'τ', sub: 'zx', meaning: 'shear stress, +x on the +z face' },
] as const;

/**
 * A stress state: σx, σy, τxy, and σz, τyz, τzx when it is three-dimensional. Tension positive;
 * τxy positive when it acts in +y on the +x face.
 */
export function StressInputs({ cell, cellName, result, errorField, errorId }: KindViewProps) {
  const { doc, readOnly } = useSheetEditor();
  const { unitSystem } = useSheetSettings(doc);
  const threeD = OUT_OF_PLANE.some(({ field }) => typeof cell[field] === 'string');
  // A 3D state goes back to plane only when its out-of-plane values are zero: nothing is lost.
  const outOfPlaneZero =
    result !== undefined && !isFailure(result) && OUT_OF_PLANE.every(({ field }) => result.values[field] === 0);
  const zero = unitSystem === 'US' ? '0 ksi' : '0 MPa';
  const fields = threeD ? [...PLANE, ...OUT_OF_PLANE] : PLANE;

  return (
    <>
      <div className="grid gap-1 @min-[40rem]:grid-cols-3 @min-[40rem]:gap-x-3">
        {fields.map(({ field, symbol, sub, meaning }) => (
          <ExpressionField
            key={field}
            cellId={cell.id}
            field={field}
            symbol={symbol}
            sub={sub}
            meaning={`${meaning}, ${cellName}`}
            errorField={errorField}
            errorId={errorId}
          />
        ))}
      </div>
      {!readOnly ? (
        <div className="no-print pl-[5rem]">
          {threeD ? (
            <button
              type="button"
              className="text-[0.8125rem] text-ink-muted underline disabled:no-underline disabled:opacity-60"
              disabled={!outOfPlaneZero}
              title={outOfPlaneZero ? undefined : 'Set σz, τyz and τzx to zero first'}
              onClick={() => deleteField(doc, cell.id, 'sz', 'tyz', 'tzx')}
            >
              Make it a plane state
            </button>
          ) : (
            <button
              type="button"
              className="text-[0.8125rem] text-ink-muted underline"
              onClick={() =>
                doc.transact(() => {
                  for (const { field } of OUT_OF_PLANE) setTextField(doc, cell.id, field, zero);
                })
              }
            >
              Add σz, τyz, τzx (3D state)
            </button>
          )}
        </div>
      ) : null}
    </>
  );
}
