import { ExpressionField } from '../fields/ExpressionField';
import type { KindViewProps } from './kindView';

/** A named quantity: one expression with units. */
export function QuantityInputs({ cell, cellName, errorField, errorId }: KindViewProps) {
  return (
    <ExpressionField
      cellId={cell.id}
      field="expr"
      symbol="="
      meaning={`value of ${cellName || 'the quantity'}`}
      placeholder="e.g. 18 kN, 40 mm * 12 mm, F / A"
      errorField={errorField}
      errorId={errorId}
    />
  );
}
