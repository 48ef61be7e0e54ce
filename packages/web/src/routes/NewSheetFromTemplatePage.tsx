import { Link, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import { useProjects } from '../api/projects';
import { useTemplate } from '../api/templates';
import { can, type Membership } from '../api/types';
import { ErrorPanel } from '../components/ErrorPanel';
import { Loading } from '../components/Loading';
import { PageHeader } from '../components/PageHeader';
import { Paper } from '../components/Paper';
import { RequireOrganization } from '../components/RequireOrganization';
import { ParameterForm } from '../features/templates/ParameterForm';
import { useDocumentTitle } from '../hooks/useDocumentTitle';

/** /templates/:templateId/new[?version=N] — the parameter form that starts a sheet from a template. */
export function NewSheetFromTemplatePage() {
  useDocumentTitle('New sheet from a template');
  return <RequireOrganization>{(membership) => <NewSheet membership={membership} />}</RequireOrganization>;
}

function NewSheet({ membership }: { membership: Membership }) {
  const { templateId = '' } = useParams();
  const [params] = useSearchParams();
  const versionParam = Number(params.get('version'));
  const version = Number.isInteger(versionParam) && versionParam > 0 ? versionParam : undefined;
  const organizationId = membership.organization.id;
  const template = useTemplate(organizationId, templateId, version);
  const projects = useProjects(organizationId);
  const navigate = useNavigate();

  if (!can(membership.role, 'sheet.create')) {
    return (
      <Paper>
        <PageHeader title="New sheet from a template" />
        <p>Your role ({membership.role}) does not create sheets. Ask an engineer of {membership.organization.name}.</p>
      </Paper>
    );
  }
  if (template.isPending || projects.isPending) return <Loading what="the template" />;
  if (template.isError) return <Paper><ErrorPanel error={template.error} what="the template" /></Paper>;
  if (projects.isError) return <Paper><ErrorPanel error={projects.error} what="the projects" /></Paper>;
  const t = template.data;

  return (
    <Paper className="mx-auto max-w-[56rem]">
      <PageHeader
        title={`New sheet: ${t.title}`}
        subtitle={
          <>
            From{' '}
            <Link to={`/templates/${encodeURIComponent(t.id)}`} className="underline">
              {t.builtin ? 'the built-in template' : 'the template'}
            </Link>
            , <span className="font-mono">version {t.version}</span> · {t.category}
          </>
        }
      />
      {projects.data.length === 0 ? (
        <p className="mb-4">
          A sheet belongs to a project. <Link to="/projects" className="underline">Start a project</Link> first.
        </p>
      ) : (
        <ParameterForm organizationId={organizationId} template={t} projects={projects.data} onCreated={(sheet) => navigate(`/sheets/${encodeURIComponent(sheet.id)}`)} />
      )}
      <p className="mt-4 text-[0.8125rem] text-ink-muted">
        A template is a starting point: check that its assumptions (first note of the sheet) hold for your case. Results support,
        not replace, the judgement of a qualified engineer.
      </p>
    </Paper>
  );
}
