import type { ReactNode } from 'react';

/** A sheet of paper on the graphite frame: the surface every page's content sits on. */
export function Paper({ children, className = '' }: { children: ReactNode; className?: string }) {
  return <div className={`paper rounded-[3px] px-5 py-4 ${className}`}>{children}</div>;
}
