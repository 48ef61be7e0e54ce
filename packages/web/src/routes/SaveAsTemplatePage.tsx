import { useQuery } from '@tanstack/react-query';
import { Link, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import type { RevisionResponse } from '@sheaf/engine/api';
import { apiRequest } from '../api/client';
import { useSheet } from '../api/sheets';
import { useTemplates } from '../api/templates';
import { can } from '../api/types';
import { Loading } from '../components/Loading';
import { PageHeader } from '../components/PageHeader';
import { Paper } from '../components/Paper';
import { TemplateSaveForm } from '../features/templates/TemplateSaveForm';
import { useDocumentTitle } from '../hooks/useDocumentTitle';
import { useProjectOrganization } from '../hooks/useProjectOrganization';

/**
 * /sheets/:sheetId/save-as-template[?revision=N] — save a sheet's current content as an
 * organization template (or as a new version of one), or with `?revision=N` the content of its
 * approved revision N, choosing which quantity cells are its parameters.
 */
export function SaveAsTemplatePage() {
  const { sheetId = '' } = useParams();
  const [params] = useSearchParams();
  const revisionParam = Number(params.get('revision'));
  const revisionNumber = Number.isInteger(revisionParam) && revisionParam > 0 ? revisionParam : null;
  const sheet = useSheet(sheetId);
  const revision = useQuery({
    queryKey: ['sheets', 'detail', sheetId, 'revision', revisionNumber],
    queryFn: ({ signal }) => apiRequest<RevisionResponse>(`/api/sheets/${encodeURIComponent(sheetId)}/revisions/${revisionNumber}`, { signal }),
    enabled: revisionNumber !== null,
    throwOnError: true,
  });
  const owner = useProjectOrganization(sheet.data?.sheet.projectId);
  const organizationId = owner?.organization.id ?? '';
  const templates = useTemplates(organizationId, {});
  const navigate = useNavigate();
  useDocumentTitle('Save as template');

  if (!sheet.data || owner === undefined || (organizationId !== '' && templates.isPending) || (revisionNumber !== null && !revision.data)) {
    return <Loading what="the sheet" />;
  }
  const { sheet: s, role } = sheet.data;
  if (!can(role, 'template.write') || !owner) {
    return (
      <Paper>
        <PageHeader title="Save as template" />
        <p>Your role ({role}) does not save templates. Owners and engineers do.</p>
      </Paper>
    );
  }
  return (
    <Paper className="mx-auto max-w-[60rem]">
      <PageHeader
        title="Save as template"
        subtitle={
          <>
            From{' '}
            <Link to={`/sheets/${encodeURIComponent(s.id)}`} className="underline">
              <span className="font-mono">{s.calcNumber}</span> {s.title}
            </Link>
            {revisionNumber !== null ? <>, approved revision {revisionNumber}</> : ', as it is now'}
          </>
        }
      />
      <TemplateSaveForm
        organizationId={organizationId}
        content={revision.data?.revision.content ?? s.content}
        initial={{ title: s.title, description: '', category: '', parameters: [] }}
        categories={templates.data?.categories ?? []}
        target={
          revisionNumber !== null
            ? { kind: 'revision', sheetId: s.id, number: revisionNumber }
            : { kind: 'sheet', sheetId: s.id, ownTemplates: (templates.data?.templates ?? []).filter((t) => !t.builtin) }
        }
        onSaved={(template) => navigate(`/templates/${encodeURIComponent(template.id)}`)}
      />
    </Paper>
  );
}
