import type { ReactNode } from 'react';
import { VerdictShape } from './VerdictShape';

/** The message under a field that failed a check: a shape, then words, never colour alone. */
export function FieldError({ id, children }: { id?: string | undefined; children: ReactNode }) {
  return (
    <p id={id} className="mt-1 flex items-start gap-1.5 text-[0.8125rem] text-fail">
      <VerdictShape verdict="fail" className="mt-[3px] shrink-0" />
      <span>{children}</span>
    </p>
  );
}
