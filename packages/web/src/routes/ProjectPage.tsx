import { useState, type FormEvent } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { useProjects } from '../api/projects';
import { useCreateSheet, useProjectSheets } from '../api/sheets';
import { can, type Membership } from '../api/types';
import { ErrorPanel } from '../components/ErrorPanel';
import { FormAlert } from '../components/FormAlert';
import { Loading } from '../components/Loading';
import { PageHeader } from '../components/PageHeader';
import { Paper } from '../components/Paper';
import { RequireOrganization } from '../components/RequireOrganization';
import { SheetsTable } from '../components/SheetsTable';
import { TextField } from '../components/TextField';
import { ImportSheetForm } from '../features/sheet/manage/ImportSheetForm';
import { splitServerError } from '../forms/serverErrors';
import { checkMaxLength, checkRequired } from '../forms/validators';
import { useDocumentTitle } from '../hooks/useDocumentTitle';

/** /projects/:projectId — one project's sheets, a form to start a new sheet in it, and an import of a sheet file. */
export function ProjectPage() {
  return (
    <RequireOrganization>
      {(membership) => <ProjectSheets membership={membership} />}
    </RequireOrganization>
  );
}

function ProjectSheets({ membership }: { membership: Membership }) {
  const { projectId = '' } = useParams();
  const sheets = useProjectSheets(projectId);
  const projects = useProjects(membership.organization.id);
  const project = projects.data?.find((p) => p.id === projectId);
  const name = project?.name ?? sheets.data?.[0]?.projectName ?? 'Project';
  useDocumentTitle(name);

  return (
    <div className="space-y-4">
      <Paper>
        <PageHeader
          title={
            <>
              {project?.code ? (
                <span className="mr-2 font-mono text-ink-muted">{project.code}</span>
              ) : null}
              {name}
            </>
          }
          subtitle={
            <Link to="/projects" className="underline">
              All projects
            </Link>
          }
        />
        {sheets.isPending ? (
          <Loading what="the project's sheets" />
        ) : sheets.isError ? (
          <ErrorPanel error={sheets.error} what="the project's sheets" />
        ) : sheets.data.length === 0 ? (
          <p className="py-4 text-ink-muted">No sheets in this project yet.</p>
        ) : (
          <SheetsTable sheets={sheets.data} caption={`Sheets of ${name}`} showProject={false} />
        )}
      </Paper>
      {can(membership.role, 'sheet.create') ? (
        <>
          <NewSheetForm projectId={projectId} />
          <Paper>
            <ImportSheetForm projectId={projectId} />
          </Paper>
        </>
      ) : null}
    </div>
  );
}

function NewSheetForm({ projectId }: { projectId: string }) {
  const create = useCreateSheet(projectId);
  const navigate = useNavigate();
  const [title, setTitle] = useState('');
  const [error, setError] = useState<string | undefined>();

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const problem =
      checkRequired(title, 'Sheet title') ?? checkMaxLength(title, 200, 'Sheet title');
    setError(problem);
    if (problem) {
      (event.currentTarget.elements.namedItem('title') as HTMLInputElement | null)?.focus();
      return;
    }
    create.mutate(
      { title: title.trim() },
      { onSuccess: (sheet) => navigate(`/sheets/${encodeURIComponent(sheet.id)}`) },
    );
  }

  const server = splitServerError(create.error, { title: 'Sheet title' });
  return (
    <Paper>
      <h2 className="mb-3 text-[1rem]">New sheet</h2>
      {server.form ? <FormAlert title="The sheet was not created">{server.form}</FormAlert> : null}
      <form
        noValidate
        onSubmit={onSubmit}
        aria-label="New sheet"
        className="flex flex-wrap items-start gap-3"
      >
        <TextField
          className="w-full max-w-md"
          label="Sheet title"
          name="title"
          hint="The calc number is assigned when the sheet is created."
          value={title}
          onChange={(e) => setTitle(e.target.value)}
          error={error ?? server.field.title}
          required
        />
        <button type="submit" className="btn btn-primary mt-[1.6rem]" disabled={create.isPending}>
          {create.isPending ? 'Creating…' : 'Create sheet'}
        </button>
      </form>
    </Paper>
  );
}
