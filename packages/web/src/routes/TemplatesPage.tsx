import { useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { useTemplates } from '../api/templates';
import { can, type Membership } from '../api/types';
import { ErrorPanel } from '../components/ErrorPanel';
import { Loading } from '../components/Loading';
import { PageHeader } from '../components/PageHeader';
import { Paper } from '../components/Paper';
import { RequireOrganization } from '../components/RequireOrganization';
import { TemplateCard } from '../features/templates/TemplateCard';
import { useDebouncedValue } from '../hooks/useDebouncedValue';
import { useDocumentTitle } from '../hooks/useDocumentTitle';

/** /templates — the template gallery: built-in and the organization's templates, found by words and category. */
export function TemplatesPage() {
  useDocumentTitle('Templates');
  return <RequireOrganization>{(membership) => <Gallery membership={membership} />}</RequireOrganization>;
}

function Gallery({ membership }: { membership: Membership }) {
  const [params, setParams] = useSearchParams();
  const category = params.get('category') ?? '';
  const [typed, setTyped] = useState(params.get('q') ?? '');
  const q = useDebouncedValue(typed.trim(), 250);
  const templates = useTemplates(membership.organization.id, { q: q || undefined, category: category || undefined });
  const canStart = can(membership.role, 'sheet.create');

  function choose(next: string) {
    setParams((current) => {
      const p = new URLSearchParams(current);
      if (next) p.set('category', next);
      else p.delete('category');
      return p;
    });
  }

  const categories = templates.data?.categories ?? [];
  return (
    <Paper>
      <PageHeader
        title="Templates"
        subtitle="Proven calculations to start a sheet from: pick one, give its parameters, get a new sheet in a project"
      />
      <div role="search" aria-label="Find templates" className="mb-4 space-y-3">
        <div className="max-w-sm">
          <label htmlFor="template-search" className="mb-1 block font-medium">
            Search
          </label>
          <input
            id="template-search"
            type="search"
            className="input"
            placeholder="e.g. shaft torsion, rosette, soil"
            value={typed}
            onChange={(e) => setTyped(e.target.value)}
          />
        </div>
        <div role="group" aria-label="Category" className="flex flex-wrap gap-1.5">
          {['', ...categories].map((c) => {
            const active = c === category;
            return (
              <button
                key={c || 'all'}
                type="button"
                aria-pressed={active}
                onClick={() => choose(c)}
                className={`rounded-[3px] border px-2 py-0.5 text-[0.8125rem] ${
                  active ? 'border-ink bg-ink font-semibold text-paper' : 'border-paper-rule bg-white text-ink hover:bg-paper-sunk'
                }`}
              >
                {c || 'All categories'}
              </button>
            );
          })}
        </div>
      </div>
      {templates.isPending ? (
        <Loading what="templates" />
      ) : templates.isError ? (
        <ErrorPanel error={templates.error} what="the templates" />
      ) : templates.data.templates.length === 0 ? (
        <p className="py-6 text-ink-muted">No template matches{q ? ` “${q}”` : ''}{category ? ` in ${category}` : ''}.</p>
      ) : (
        <>
          <p className="mb-2 text-[0.8125rem] text-ink-muted" aria-live="polite">
            {templates.data.templates.length} {templates.data.templates.length === 1 ? 'template' : 'templates'}. To add your own,
            open a sheet and choose “Save as template”.
          </p>
          <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-3">
            {templates.data.templates.map((t) => (
              <TemplateCard key={t.id} template={t} canStart={canStart} />
            ))}
          </div>
        </>
      )}
    </Paper>
  );
}
