/**
 * Client-side checks for form fields. Each returns a message that names the field, or undefined
 * when the value is acceptable. The server checks again; these only save a round trip.
 */

import { MIN_PASSWORD_LENGTH } from '../api/types';

export const PASSWORD_MIN_LENGTH = MIN_PASSWORD_LENGTH;

// Deliberately loose: one "@", something on both sides, a dot in the domain, no spaces.
const EMAIL_PATTERN = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

export function checkRequired(value: string, label: string): string | undefined {
  return value.trim() === '' ? `${label} is required.` : undefined;
}

export function checkEmail(value: string, label = 'E-mail'): string | undefined {
  if (value.trim() === '') return `${label} is required.`;
  if (!EMAIL_PATTERN.test(value.trim()))
    return `${label} must be an address like name@example.com.`;
  return undefined;
}

export function checkPassword(value: string, label = 'Password'): string | undefined {
  if (value === '') return `${label} is required.`;
  if (value.length < PASSWORD_MIN_LENGTH) {
    return `${label} must be at least ${PASSWORD_MIN_LENGTH} characters (it has ${value.length}).`;
  }
  return undefined;
}

export function checkMaxLength(value: string, max: number, label: string): string | undefined {
  return value.trim().length > max ? `${label} must be at most ${max} characters.` : undefined;
}

// The server's rule for project codes (calc numbers start with them: GBL gives GBL-001).
const PROJECT_CODE_PATTERN = /^[A-Z0-9][A-Z0-9-]{0,14}[A-Z0-9]$/;

/** An optional project code: empty, or 2 to 16 letters, digits or hyphens (case is not kept). */
export function checkProjectCode(value: string, label = 'Project code'): string | undefined {
  const code = value.trim().toUpperCase();
  if (code === '' || PROJECT_CODE_PATTERN.test(code)) return undefined;
  return `${label} must be 2 to 16 letters, digits or hyphens, starting and ending with a letter or digit.`;
}

/** The field errors of a form, by field name; a form may be sent when this is empty. */
export type FieldErrors<F extends string> = Partial<Record<F, string>>;

/** Drops the fields without an error, so `Object.keys(result).length === 0` means "valid". */
export function collectErrors<F extends string>(
  checks: Record<F, string | undefined>,
): FieldErrors<F> {
  const errors: FieldErrors<F> = {};
  for (const field of Object.keys(checks) as F[]) {
    const message = checks[field];
    if (message) errors[field] = message;
  }
  return errors;
}
