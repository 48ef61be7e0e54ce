import { ExpressionField } from '../fields/ExpressionField';
import { ReferenceField } from '../fields/ReferenceField';
import type { KindViewProps } from './kindView';

/** A stress state on axes turned counterclockwise by θ. */
export function RotateInputs({ cell, cellName, errorField, errorId }: KindViewProps) {
  return (
    <>
      <ReferenceField cellId={cell.id} value={typeof cell.of === 'string' ? cell.of : ''} errorField={errorField} errorId={errorId} />
      <ExpressionField
        cellId={cell.id}
        field="angle"
        symbol="θ"
        meaning={`rotation of the axes, counterclockwise from x, ${cellName}`}
        placeholder="e.g. 30 deg"
        errorField={errorField}
        errorId={errorId}
      />
    </>
  );
}

/** A cell that only names the state it works on (principal stresses). */
export function ReferenceOnlyInputs({ cell, errorField, errorId }: KindViewProps) {
  return <ReferenceField cellId={cell.id} value={typeof cell.of === 'string' ? cell.of : ''} errorField={errorField} errorId={errorId} />;
}
