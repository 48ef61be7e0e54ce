import { applyTemplateParameters, type TemplateParameter } from '@sheaf/engine';
import type { TemplateDetail } from '@sheaf/engine/api';
import { isApiError } from '../../api/ApiError';

/** What the new-sheet form shows: errors beside parameters (by name) and above the form. */
export interface ParameterFormErrors {
  byName: Record<string, string>;
  form: string[];
}

/** The range of a parameter in words, e.g. `0.1 mm to r / 10`, `at least 0 kN`; '' when open. */
export function rangeText(p: TemplateParameter): string {
  if (p.min !== undefined && p.max !== undefined) return `${p.min} to ${p.max}`;
  if (p.min !== undefined) return `at least ${p.min}`;
  if (p.max !== undefined) return `at most ${p.max}`;
  return '';
}

/** Sort problems naming `parameters.<name>` beside their parameter, the rest above the form. */
function place(problems: readonly { field: string; message: string }[], prefix: string): ParameterFormErrors {
  const errors: ParameterFormErrors = { byName: {}, form: [] };
  for (const p of problems) {
    const match = new RegExp(`^${prefix.replace('.', '\\.')}parameters\\.([A-Za-z_][A-Za-z0-9_]*)$`).exec(p.field);
    const name = match?.[1];
    if (name && !(name in errors.byName)) errors.byName[name] = p.message.replace(/^(body\.)?parameters\.[A-Za-z0-9_]+: /, '');
    else errors.form.push(p.message);
  }
  return errors;
}

/**
 * Check the form's values in the browser with the same engine function the server uses
 * (dimension against the unit, range, references only to other parameters), so a person sees
 * every problem beside its field before anything is sent.
 */
export function checkParameterForm(template: Pick<TemplateDetail, 'content' | 'parameters'>, values: Record<string, string>): ParameterFormErrors {
  const outcome = applyTemplateParameters(template.content, template.parameters, values);
  return outcome.ok ? { byName: {}, form: [] } : place(outcome.problems, '');
}

/** The server's answer placed the same way (its fields read `body.parameters.<name>`). */
export function serverParameterErrors(error: unknown): ParameterFormErrors {
  if (!isApiError(error)) return { byName: {}, form: [] };
  if (error.details.length > 0) return place(error.details, 'body.');
  return { byName: {}, form: [error.message] };
}

/** No problem at all. */
export function isClean(errors: ParameterFormErrors): boolean {
  return errors.form.length === 0 && Object.keys(errors.byName).length === 0;
}
