import { useState } from 'react';
import { Link, useParams, useSearchParams } from 'react-router-dom';
import { defaultParameterValues } from '@sheaf/engine';
import { useTemplate, useTemplates } from '../api/templates';
import { can, type Membership, type SheetCell } from '../api/types';
import { ErrorPanel } from '../components/ErrorPanel';
import { Loading } from '../components/Loading';
import { PageHeader } from '../components/PageHeader';
import { Paper } from '../components/Paper';
import { RawCellList } from '../components/RawCellList';
import { RequireOrganization } from '../components/RequireOrganization';
import { ParameterTable } from '../features/templates/ParameterTable';
import { TemplateSaveForm } from '../features/templates/TemplateSaveForm';
import { TemplateVersions } from '../features/templates/TemplateVersions';
import { useDocumentTitle } from '../hooks/useDocumentTitle';

/** /templates/:templateId[?version=N] — a template at a version: parameters, content and every version. */
export function TemplatePage() {
  return <RequireOrganization>{(membership) => <TemplateView membership={membership} />}</RequireOrganization>;
}

function TemplateView({ membership }: { membership: Membership }) {
  const { templateId = '' } = useParams();
  const [params] = useSearchParams();
  const versionParam = Number(params.get('version'));
  const version = Number.isInteger(versionParam) && versionParam > 0 ? versionParam : undefined;
  const organizationId = membership.organization.id;
  const template = useTemplate(organizationId, templateId, version);
  const list = useTemplates(organizationId, {});
  const [editing, setEditing] = useState(false);
  useDocumentTitle(template.data ? `${template.data.title} (template)` : 'Template');

  if (template.isPending) return <Loading what="the template" />;
  if (template.isError) {
    return (
      <Paper>
        <ErrorPanel error={template.error} what="the template" />
        <Link to="/templates" className="btn">
          Back to the templates
        </Link>
      </Paper>
    );
  }
  const t = template.data;
  const latest = t.versions[0]?.version ?? t.version;
  const canStart = can(membership.role, 'sheet.create');
  const canWrite = can(membership.role, 'template.write') && !t.builtin;
  const startPath = `/templates/${encodeURIComponent(t.id)}/new${t.version === latest ? '' : `?version=${t.version}`}`;

  return (
    <div className="space-y-4">
      <Paper>
        <PageHeader
          title={t.title}
          subtitle={
            <>
              {t.category} · {t.builtin ? 'built-in' : 'ours'} · <span className="font-mono">version {t.version}</span>
              {t.version === latest ? ' (latest)' : ` (an older version; the latest is v${latest})`}
            </>
          }
          actions={
            <>
              {canWrite && !editing ? (
                <button type="button" className="btn" onClick={() => setEditing(true)}>
                  Edit as a new version
                </button>
              ) : null}
              {canStart ? (
                <Link to={startPath} className="btn btn-primary">
                  New sheet from this template
                </Link>
              ) : null}
            </>
          }
        />
        <p className="mb-4 max-w-prose">{t.description}</p>
        {editing ? (
          <div className="mb-5 rounded-[3px] border border-paper-rule bg-paper-sunk p-4">
            <h2 className="mb-3 text-[1rem]">New version of {t.title}</h2>
            <TemplateSaveForm
              organizationId={organizationId}
              content={t.content}
              initial={t}
              categories={list.data?.categories ?? []}
              target={{ kind: 'template', templateId: t.id }}
              onSaved={() => setEditing(false)}
            />
          </div>
        ) : null}
        <h2 className="mb-2 text-[1rem]">Parameters</h2>
        <ParameterTable parameters={t.parameters} defaults={defaultParameterValues(t.content, t.parameters)} />
      </Paper>
      <Paper>
        <h2 className="mb-2 text-[1rem]">Versions</h2>
        <p className="mb-2 max-w-prose text-[0.8125rem] text-ink-muted">
          Each edit saves a new version. Sheets keep the version they were made from; a new version never changes them.
        </p>
        <TemplateVersions templateId={t.id} versions={t.versions} current={t.version} />
      </Paper>
      <Paper>
        <h2 className="mb-2 text-[1rem]">Content of version {t.version}</h2>
        <RawCellList cells={t.content.cells as SheetCell[]} />
      </Paper>
    </div>
  );
}
