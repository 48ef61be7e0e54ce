import type { ReactNode } from 'react';

/** A page's heading row on the paper: the title, an optional line under it, and actions on the right. */
export function PageHeader({
  title,
  subtitle,
  actions,
}: {
  title: ReactNode;
  subtitle?: ReactNode;
  actions?: ReactNode;
}) {
  return (
    <div className="mb-4 flex flex-wrap items-end justify-between gap-3 border-b border-paper-rule pb-3">
      <div>
        <h1 className="text-[1.25rem] leading-tight">{title}</h1>
        {subtitle ? <p className="mt-0.5 text-ink-muted">{subtitle}</p> : null}
      </div>
      {actions ? <div className="flex flex-wrap items-center gap-2">{actions}</div> : null}
    </div>
  );
}
