import type { ReactNode } from 'react';
import { VerdictShape } from './VerdictShape';

/** An error about a whole form or request, shown above it and announced when it appears. */
export function FormAlert({ title, children }: { title?: string; children: ReactNode }) {
  return (
    <div
      role="alert"
      className="mb-4 flex gap-2 rounded-[3px] border border-fail bg-white px-3 py-2 text-ink"
    >
      <VerdictShape verdict="fail" className="mt-1 shrink-0 text-fail" />
      <div>
        {title ? <p className="font-semibold">{title}</p> : null}
        <div>{children}</div>
      </div>
    </div>
  );
}

/** A confirmation after a form did its job. */
export function FormNotice({ children }: { children: ReactNode }) {
  return (
    <div
      role="status"
      className="mb-4 flex gap-2 rounded-[3px] border border-pass bg-white px-3 py-2 text-ink"
    >
      <VerdictShape verdict="pass" className="mt-1 shrink-0 text-pass" />
      <div>{children}</div>
    </div>
  );
}
