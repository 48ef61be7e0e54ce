import { useId, useState, type FormEvent } from 'react';
import { defaultParameterValues } from '@sheaf/engine';
import type { SheetDetail, TemplateDetail } from '@sheaf/engine/api';
import { describeError } from '../../api/ApiError';
import { useCreateSheetFromTemplate } from '../../api/templates';
import type { Project } from '../../api/types';
import { FieldError } from '../../components/FieldError';
import { FormAlert } from '../../components/FormAlert';
import { checkParameterForm, isClean, rangeText, serverParameterErrors, type ParameterFormErrors } from './parameterForm';
import { TemplatePreview } from './TemplatePreview';

/** A problem without the parameter's label in front ("Wall thickness must be ..." gives "must be ..."). */
function withoutLabel(message: string, label: string): string {
  return message.startsWith(label) ? message.slice(label.length).replace(/^:? /, '') : message;
}

/**
 * The form that starts a sheet from a template version: a title, the project it goes in, and a
 * value for each parameter (an expression with units, or a plain number read in the parameter's
 * unit). Values are checked here with the engine (unit dimension and allowed range) and again by
 * the server; each problem is shown beside its field, naming it.
 */
export function ParameterForm({
  organizationId,
  template,
  projects,
  onCreated,
}: {
  organizationId: string;
  template: TemplateDetail;
  projects: readonly Project[];
  onCreated: (sheet: SheetDetail) => void;
}) {
  const formId = useId();
  const [title, setTitle] = useState(template.title);
  const [projectId, setProjectId] = useState(projects[0]?.id ?? '');
  const [values, setValues] = useState<Record<string, string>>(() => defaultParameterValues(template.content, template.parameters));
  const [touched, setTouched] = useState<Set<string>>(new Set());
  const [submitted, setSubmitted] = useState(false);
  const [titleError, setTitleError] = useState<string | null>(null);
  const create = useCreateSheetFromTemplate();

  const local = checkParameterForm(template, values);
  const server = serverParameterErrors(create.error);
  const shownFor = (name: string): string | undefined =>
    (submitted || touched.has(name) ? local.byName[name] : undefined) ?? server.byName[name];
  const formProblems: ParameterFormErrors['form'] = submitted ? [...local.form, ...server.form] : server.form;

  async function onSubmit(event: FormEvent) {
    event.preventDefault();
    setSubmitted(true);
    const titleProblem = title.trim() === '' ? 'Title is required' : title.length > 200 ? 'Title must be at most 200 characters' : null;
    setTitleError(titleProblem);
    if (!isClean(local) || titleProblem || !projectId) return;
    try {
      const result = await create.mutateAsync({ projectId, templateId: template.id, version: template.version, title: title.trim(), parameters: values });
      onCreated(result.sheet);
    } catch {
      // Shown beside the fields from the mutation's error.
    }
  }

  return (
    <form onSubmit={onSubmit} noValidate aria-label={`New sheet from ${template.title}`} className="space-y-4">
      {formProblems.length > 0 ? (
        <FormAlert title="The sheet was not created">
          <ul className="list-disc pl-4">
            {formProblems.map((p) => (
              <li key={p}>{p}</li>
            ))}
          </ul>
        </FormAlert>
      ) : create.error && isClean(server) ? (
        <FormAlert title="The sheet was not created">{describeError(create.error)}</FormAlert>
      ) : null}

      <div className="grid gap-3 sm:grid-cols-[1fr_16rem]">
        <div>
          <label htmlFor={`${formId}-title`} className="mb-1 block font-medium">
            Sheet title
          </label>
          <input id={`${formId}-title`} className="input" value={title} onChange={(e) => setTitle(e.target.value)} aria-invalid={titleError ? true : undefined} />
          {titleError ? <FieldError>{titleError}</FieldError> : null}
        </div>
        <div>
          <label htmlFor={`${formId}-project`} className="mb-1 block font-medium">
            Project
          </label>
          <select id={`${formId}-project`} className="input" value={projectId} onChange={(e) => setProjectId(e.target.value)}>
            {projects.map((p) => (
              <option key={p.id} value={p.id}>
                {p.code} — {p.name}
              </option>
            ))}
          </select>
        </div>
      </div>

      <fieldset>
        <legend className="mb-2 font-medium">Parameters</legend>
        {template.parameters.length === 0 ? <p className="text-ink-muted">This template has no parameters: the sheet starts as a copy.</p> : null}
        <div className="grid gap-x-4 gap-y-3 sm:grid-cols-2">
          {template.parameters.map((p) => {
            const inputId = `${formId}-p-${p.name}`;
            const error = shownFor(p.name);
            const range = rangeText(p);
            return (
              <div key={p.cellId}>
                <label htmlFor={inputId} className="mb-1 block">
                  <span className="font-medium">{p.label}</span> <span className="font-mono text-[0.8125rem] text-ink-muted">{p.name}</span>
                </label>
                <div className="flex items-center gap-2">
                  <input
                    id={inputId}
                    name={p.name}
                    className="input font-mono"
                    value={values[p.name] ?? ''}
                    onChange={(e) => setValues((v) => ({ ...v, [p.name]: e.target.value }))}
                    onBlur={() => setTouched((t) => new Set(t).add(p.name))}
                    aria-invalid={error ? true : undefined}
                    aria-describedby={`${inputId}-help`}
                  />
                  <span className="w-16 shrink-0 font-mono text-[0.8125rem] text-ink-muted">{p.unit || '—'}</span>
                </div>
                {error ? (
                  <FieldError id={`${inputId}-help`}>
                    {p.label} ({p.name}): {withoutLabel(error, p.label)}
                  </FieldError>
                ) : (
                  <p id={`${inputId}-help`} className="mt-1 text-[0.75rem] text-ink-muted">
                    {p.unit ? `A plain number is read in ${p.unit}.` : 'A plain number.'}
                    {range ? ` Allowed: ${range}.` : ''}
                    {p.hint ? ` ${p.hint}` : ''}
                  </p>
                )}
              </div>
            );
          })}
        </div>
      </fieldset>

      <section aria-labelledby={`${formId}-preview`}>
        <h2 id={`${formId}-preview`} className="mb-1 font-medium">
          Results with these values
        </h2>
        <TemplatePreview organizationId={organizationId} template={template} values={values} />
      </section>

      <p className="text-[0.8125rem] text-ink-muted">
        The sheet records this template and its version (v{template.version}); later versions of the template never change it.
      </p>
      <button type="submit" className="btn btn-primary" disabled={create.isPending || projects.length === 0}>
        {create.isPending ? 'Creating…' : 'Create the sheet'}
      </button>
    </form>
  );
}
