import { Link } from 'react-router-dom';
import type { TemplateSummary } from '@sheaf/engine/api';

/** A template in the gallery: what it checks, where it comes from, and the way to start a sheet from it. */
export function TemplateCard({ template, canStart }: { template: TemplateSummary; canStart: boolean }) {
  const path = `/templates/${encodeURIComponent(template.id)}`;
  return (
    <article className="flex flex-col rounded-[3px] border border-paper-rule bg-white/60 p-3" aria-labelledby={`t-${template.id}`}>
      <p className="flex flex-wrap items-baseline gap-x-2 text-[0.75rem] text-ink-muted">
        <span className="tracking-[0.04em] uppercase">{template.category}</span>
        <span aria-hidden="true">·</span>
        <span>{template.builtin ? 'Built-in' : 'Ours'}</span>
        <span aria-hidden="true">·</span>
        <span className="font-mono">v{template.version}</span>
      </p>
      <h2 id={`t-${template.id}`} className="mt-1 text-[0.9375rem] leading-snug">
        <Link to={path} className="hover:underline">
          {template.title}
        </Link>
      </h2>
      <p className="mt-1 flex-1 text-[0.8125rem] text-ink-muted">{template.description}</p>
      <p className="mt-2 flex items-center justify-between gap-2 text-[0.8125rem]">
        <span className="text-ink-muted">
          {template.parameterCount} {template.parameterCount === 1 ? 'parameter' : 'parameters'}
        </span>
        {canStart ? (
          <Link to={`${path}/new`} className="btn px-2 py-0.5 text-[0.8125rem]" aria-label={`New sheet from ${template.title}`}>
            New sheet
          </Link>
        ) : null}
      </p>
    </article>
  );
}
