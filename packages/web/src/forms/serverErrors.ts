import { describeError, isApiError } from '../api/ApiError';

export interface SplitServerError<F extends string> {
  /** Messages to show beside this form's fields, for the fields the server named. */
  field: Partial<Record<F, string>>;
  /** The message to show above the form, when the error is not (only) about this form's fields. */
  form: string | null;
}

/**
 * Places a server error: beside each of the form's fields the server named in an
 * `invalid-field` answer ("email: must be an e-mail address" shows under E-mail as
 * "E-mail must be an e-mail address"), and above the form for anything else.
 *
 * @param labels the form's fields, by the name the API uses, with the label the form shows
 */
export function splitServerError<F extends string>(
  error: unknown,
  labels: Readonly<Record<F, string>>,
): SplitServerError<F> {
  if (!error) return { field: {}, form: null };
  if (!isApiError(error) || error.code !== 'invalid-field')
    return { field: {}, form: describeError(error) };

  const field: Partial<Record<F, string>> = {};
  const elsewhere: string[] = [];
  for (const [path, problem] of Object.entries(error.fieldErrors)) {
    if (Object.hasOwn(labels, path)) field[path as F] = `${labels[path as F]} ${problem}`;
    else elsewhere.push(`${path}: ${problem}`);
  }
  const placed = Object.keys(field).length > 0;
  if (!placed) return { field, form: describeError(error) };
  return { field, form: elsewhere.length > 0 ? elsewhere.join('; ') : null };
}
