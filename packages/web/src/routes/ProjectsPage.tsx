import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { useCreateProject, useProjects } from '../api/projects';
import { can, type Membership } from '../api/types';
import { ErrorPanel } from '../components/ErrorPanel';
import { FormAlert } from '../components/FormAlert';
import { Loading } from '../components/Loading';
import { PageHeader } from '../components/PageHeader';
import { Paper } from '../components/Paper';
import { RequireOrganization } from '../components/RequireOrganization';
import { TextField } from '../components/TextField';
import { splitServerError } from '../forms/serverErrors';
import {
  checkMaxLength,
  checkProjectCode,
  checkRequired,
  collectErrors,
  type FieldErrors,
} from '../forms/validators';
import { useDocumentTitle } from '../hooks/useDocumentTitle';
import { formatDate } from '../lib/formatDateTime';

/** /projects — the organization's projects, and a form to start one. */
export function ProjectsPage() {
  useDocumentTitle('Projects');
  return (
    <RequireOrganization>
      {(membership) => <ProjectList membership={membership} />}
    </RequireOrganization>
  );
}

function ProjectList({ membership }: { membership: Membership }) {
  const organizationId = membership.organization.id;
  const projects = useProjects(organizationId);
  return (
    <div className="space-y-4">
      <Paper>
        <PageHeader title="Projects" subtitle={`Projects of ${membership.organization.name}`} />
        {projects.isPending ? (
          <Loading what="projects" />
        ) : projects.isError ? (
          <ErrorPanel error={projects.error} what="the projects" />
        ) : projects.data.length === 0 ? (
          <p className="py-4 text-ink-muted">No projects yet.</p>
        ) : (
          <div className="overflow-x-auto">
            <table className="ruled">
              <caption className="sr-only">Projects of {membership.organization.name}</caption>
              <thead>
                <tr>
                  <th scope="col">Code</th>
                  <th scope="col">Name</th>
                  <th scope="col" className="text-right">
                    Sheets
                  </th>
                  <th scope="col">Started</th>
                </tr>
              </thead>
              <tbody>
                {projects.data.map((project) => (
                  <tr key={project.id}>
                    <td className="font-mono whitespace-nowrap">{project.code || '—'}</td>
                    <td>
                      <Link
                        to={`/projects/${encodeURIComponent(project.id)}`}
                        className="font-medium hover:underline"
                      >
                        {project.name}
                      </Link>
                    </td>
                    <td className="text-right font-mono">{project.sheetCount}</td>
                    <td className="font-mono text-ink-muted">{formatDate(project.createdAt)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </Paper>
      {can(membership.role, 'project.create') ? (
        <NewProjectForm organizationId={organizationId} />
      ) : null}
    </div>
  );
}

type Field = 'name' | 'code';
const FIELDS: readonly Field[] = ['name', 'code'];
const LABELS: Record<Field, string> = { name: 'Project name', code: 'Project code' };

function NewProjectForm({ organizationId }: { organizationId: string }) {
  const create = useCreateProject(organizationId);
  const [name, setName] = useState('');
  const [code, setCode] = useState('');
  const [errors, setErrors] = useState<FieldErrors<Field>>({});

  function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = event.currentTarget;
    const found = collectErrors<Field>({
      name: checkRequired(name, 'Project name') ?? checkMaxLength(name, 120, 'Project name'),
      code: checkProjectCode(code),
    });
    setErrors(found);
    const firstInvalid = FIELDS.find((f) => found[f]);
    if (firstInvalid) {
      (form.elements.namedItem(firstInvalid) as HTMLInputElement | null)?.focus();
      return;
    }
    create.mutate(
      { name: name.trim(), ...(code.trim() ? { code: code.trim() } : {}) },
      {
        onSuccess: () => {
          setName('');
          setCode('');
        },
      },
    );
  }

  const server = splitServerError(create.error, LABELS);
  return (
    <Paper>
      <h2 className="mb-3 text-[1rem]">New project</h2>
      {server.form ? (
        <FormAlert title="The project was not created">{server.form}</FormAlert>
      ) : null}
      <form
        noValidate
        onSubmit={onSubmit}
        aria-label="New project"
        className="flex flex-wrap items-start gap-3"
      >
        <TextField
          className="w-full max-w-sm"
          label="Project name"
          name="name"
          value={name}
          onChange={(e) => setName(e.target.value)}
          error={errors.name ?? server.field.name}
          required
        />
        <TextField
          className="w-40"
          label="Code (optional)"
          name="code"
          mono
          value={code}
          onChange={(e) => setCode(e.target.value)}
          error={errors.code ?? server.field.code}
        />
        <button type="submit" className="btn btn-primary mt-[1.6rem]" disabled={create.isPending}>
          {create.isPending ? 'Creating…' : 'Create project'}
        </button>
      </form>
    </Paper>
  );
}
