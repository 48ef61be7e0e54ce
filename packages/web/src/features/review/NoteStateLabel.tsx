import { VerdictShape } from '../../components/VerdictShape';

/**
 * A note thread's state as shape and word, never colour alone: open notes carry the warning
 * triangle, resolved ones the ticked circle.
 */
export function NoteStateLabel({ state, count }: { state: 'open' | 'resolved'; count?: number }) {
  const word = state === 'open' ? 'Open' : 'Resolved';
  const text = count === undefined ? word : `${count} ${state === 'open' ? 'open' : 'resolved'} ${count === 1 ? 'note' : 'notes'}`;
  return (
    <span className={`inline-flex items-center gap-1 font-medium ${state === 'open' ? 'text-low' : 'text-pass'}`}>
      <VerdictShape verdict={state === 'open' ? 'low' : 'pass'} />
      {text}
    </span>
  );
}
