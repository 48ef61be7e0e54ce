import { useId, useState, type FormEvent } from 'react';
import type { TemplateParameter } from '@sheaf/engine';
import type { SheetContentV1, TemplateDetail, TemplateSummary } from '@sheaf/engine/api';
import { describeError, isApiError } from '../../api/ApiError';
import { useSaveRevisionAsTemplate, useSaveSheetAsTemplate, useSaveTemplateVersion } from '../../api/templates';
import { FieldError } from '../../components/FieldError';
import { FormAlert } from '../../components/FormAlert';
import { checkParameterRows, parameterRows, parametersOfRows, type ParameterRow } from './parameterDefinitions';

export type SaveTarget =
  | { kind: 'sheet'; sheetId: string; ownTemplates: readonly TemplateSummary[] }
  | { kind: 'revision'; sheetId: string; number: number }
  | { kind: 'template'; templateId: string };

export interface TemplateText {
  title: string;
  description: string;
  category: string;
  parameters: readonly TemplateParameter[];
}

/**
 * Save a sheet as a template (a new one, or a new version of one of the organization's), save an
 * approved revision as a new template, or save a template's new version with new text and parameters. The quantity cells of the content are
 * listed; ticking one makes it a parameter, with its label, unit and allowed range (expressions
 * with units; they may name other parameters).
 */
export function TemplateSaveForm({
  organizationId,
  content,
  initial,
  categories,
  target,
  onSaved,
}: {
  organizationId: string;
  content: SheetContentV1;
  initial: TemplateText;
  categories: readonly string[];
  target: SaveTarget;
  onSaved: (template: TemplateDetail) => void;
}) {
  const formId = useId();
  const [title, setTitle] = useState(initial.title);
  const [description, setDescription] = useState(initial.description);
  const [category, setCategory] = useState(initial.category);
  const [rows, setRows] = useState<ParameterRow[]>(() => parameterRows(content.cells, initial.parameters));
  const [versionOf, setVersionOf] = useState<string>('');
  const [submitted, setSubmitted] = useState(false);
  const saveNew = useSaveSheetAsTemplate(target.kind === 'sheet' ? target.sheetId : '');
  const saveRevision = useSaveRevisionAsTemplate(target.kind === 'revision' ? target.sheetId : '', target.kind === 'revision' ? target.number : 0);
  const saveVersion = useSaveTemplateVersion(organizationId);
  const saving = saveNew.isPending || saveVersion.isPending || saveRevision.isPending;
  const error = saveNew.error ?? saveVersion.error ?? saveRevision.error;

  const checked = checkParameterRows(content, rows);
  const textErrors = {
    title: title.trim() === '' ? 'Title is required' : null,
    category: category.trim() === '' ? 'Category is required' : null,
  };

  function setRow(cellId: string, patch: Partial<ParameterRow>) {
    setRows((all) => all.map((r) => (r.cellId === cellId ? { ...r, ...patch } : r)));
  }

  async function onSubmit(event: FormEvent) {
    event.preventDefault();
    setSubmitted(true);
    if (textErrors.title || textErrors.category || Object.keys(checked.byCell).length > 0 || checked.other.length > 0) return;
    const body = { title: title.trim(), description: description.trim(), category: category.trim(), parameters: parametersOfRows(rows) };
    try {
      if (target.kind === 'revision') onSaved(await saveRevision.mutateAsync(body));
      else if (target.kind === 'sheet' && versionOf === '') onSaved(await saveNew.mutateAsync(body));
      else if (target.kind === 'sheet') onSaved(await saveVersion.mutateAsync({ ...body, templateId: versionOf, sheetId: target.sheetId }));
      else onSaved(await saveVersion.mutateAsync({ ...body, templateId: target.templateId }));
    } catch {
      // Shown from the mutation's error state.
    }
  }

  const details = isApiError(error) ? error.details : [];

  return (
    <form onSubmit={onSubmit} noValidate aria-label="Save as template" className="space-y-4">
      {error ? (
        <FormAlert title="The template was not saved">
          {details.length > 0 ? (
            <ul className="list-disc pl-4">
              {details.map((d) => (
                <li key={d.message}>{d.message}</li>
              ))}
            </ul>
          ) : (
            describeError(error)
          )}
        </FormAlert>
      ) : null}

      {target.kind === 'sheet' ? (
        <fieldset>
          <legend className="mb-1 font-medium">Save as</legend>
          <div className="flex flex-wrap items-center gap-x-5 gap-y-2">
            <label className="flex items-center gap-1.5">
              <input type="radio" name={`${formId}-mode`} checked={versionOf === ''} onChange={() => setVersionOf('')} />a new template
            </label>
            <label className="flex items-center gap-1.5">
              <input
                type="radio"
                name={`${formId}-mode`}
                checked={versionOf !== ''}
                disabled={target.ownTemplates.length === 0}
                onChange={() => setVersionOf(target.ownTemplates[0]?.id ?? '')}
              />
              a new version of
            </label>
            <select
              aria-label="Template to add a version to"
              className="input w-auto"
              value={versionOf}
              disabled={versionOf === ''}
              onChange={(e) => setVersionOf(e.target.value)}
            >
              <option value="">—</option>
              {target.ownTemplates.map((t) => (
                <option key={t.id} value={t.id}>
                  {t.title} (v{t.version})
                </option>
              ))}
            </select>
          </div>
          {target.ownTemplates.length === 0 ? (
            <p className="mt-1 text-[0.75rem] text-ink-muted">The organization has no templates of its own yet.</p>
          ) : null}
        </fieldset>
      ) : null}

      <div className="grid gap-3 sm:grid-cols-[1fr_14rem]">
        <div>
          <label htmlFor={`${formId}-title`} className="mb-1 block font-medium">
            Title
          </label>
          <input id={`${formId}-title`} className="input" value={title} onChange={(e) => setTitle(e.target.value)} aria-invalid={submitted && textErrors.title ? true : undefined} />
          {submitted && textErrors.title ? <FieldError>{textErrors.title}</FieldError> : null}
        </div>
        <div>
          <label htmlFor={`${formId}-category`} className="mb-1 block font-medium">
            Category
          </label>
          <input
            id={`${formId}-category`}
            className="input"
            list={`${formId}-categories`}
            value={category}
            onChange={(e) => setCategory(e.target.value)}
            aria-invalid={submitted && textErrors.category ? true : undefined}
          />
          <datalist id={`${formId}-categories`}>
            {categories.map((c) => (
              <option key={c} value={c} />
            ))}
          </datalist>
          {submitted && textErrors.category ? <FieldError>{textErrors.category}</FieldError> : null}
        </div>
      </div>
      <div>
        <label htmlFor={`${formId}-description`} className="mb-1 block font-medium">
          Description
        </label>
        <textarea id={`${formId}-description`} className="input min-h-[3.5rem]" value={description} onChange={(e) => setDescription(e.target.value)} />
      </div>

      <fieldset>
        <legend className="mb-1 font-medium">Parameters</legend>
        <p className="mb-2 text-[0.8125rem] text-ink-muted">
          Tick the quantity cells a new sheet asks for. The unit fixes the dimension; the range (min, max) takes expressions with
          units and may name other parameters, e.g. <span className="font-mono">r / 10</span>.
        </p>
        {rows.length === 0 ? <p className="text-ink-muted">The sheet has no quantity cells.</p> : null}
        <div className="overflow-x-auto">
          <table className="ruled text-[0.8125rem]">
            <caption className="sr-only">Quantity cells that can be parameters</caption>
            <thead>
              <tr>
                <th scope="col">Parameter</th>
                <th scope="col">Cell</th>
                <th scope="col">Label</th>
                <th scope="col">Unit</th>
                <th scope="col">Min</th>
                <th scope="col">Max</th>
              </tr>
            </thead>
            <tbody>
              {rows.map((r) => {
                const problem = submitted || r.chosen ? checked.byCell[r.cellId] : undefined;
                return (
                  <tr key={r.cellId}>
                    <td>
                      <input type="checkbox" aria-label={`${r.name} is a parameter`} checked={r.chosen} onChange={(e) => setRow(r.cellId, { chosen: e.target.checked })} />
                    </td>
                    <td className="font-mono">
                      {r.name} = {r.expr}
                      {problem ? <FieldError>{r.name}: {problem}</FieldError> : null}
                    </td>
                    <td>
                      <input aria-label={`${r.name}, label`} className="input" value={r.label} placeholder={r.name} disabled={!r.chosen} onChange={(e) => setRow(r.cellId, { label: e.target.value })} />
                    </td>
                    <td className="w-24">
                      <input aria-label={`${r.name}, unit`} className="input font-mono" value={r.unit} disabled={!r.chosen} onChange={(e) => setRow(r.cellId, { unit: e.target.value })} />
                    </td>
                    <td className="w-32">
                      <input aria-label={`${r.name}, min`} className="input font-mono" value={r.min} disabled={!r.chosen} onChange={(e) => setRow(r.cellId, { min: e.target.value })} />
                    </td>
                    <td className="w-32">
                      <input aria-label={`${r.name}, max`} className="input font-mono" value={r.max} disabled={!r.chosen} onChange={(e) => setRow(r.cellId, { max: e.target.value })} />
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
        {submitted && checked.other.length > 0 ? <FieldError>{checked.other.join('; ')}</FieldError> : null}
      </fieldset>

      <button type="submit" className="btn btn-primary" disabled={saving}>
        {saving ? 'Saving…' : target.kind === 'template' || versionOf !== '' ? 'Save a new version' : 'Save the template'}
      </button>
    </form>
  );
}
