import { ReferenceField } from '../fields/ReferenceField';
import { StrengthFields } from '../fields/StrengthFields';
import type { KindViewProps } from './kindView';

/** A failure check: the state, the theory, its strengths and the required factor. */
export function CriterionInputs({ cell, cellName, errorField, errorId }: KindViewProps) {
  return (
    <>
      <ReferenceField cellId={cell.id} value={typeof cell.of === 'string' ? cell.of : ''} errorField={errorField} errorId={errorId} />
      <StrengthFields cell={cell} cellName={cellName} errorField={errorField} errorId={errorId} />
    </>
  );
}
