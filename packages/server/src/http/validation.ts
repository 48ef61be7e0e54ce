import type { z } from 'zod';
import { ApiError } from './ApiError';

function valueAt(input: unknown, path: readonly PropertyKey[]): unknown {
  let value: unknown = input;
  for (const key of path) {
    if (value === null || typeof value !== 'object') return undefined;
    value = (value as Record<PropertyKey, unknown>)[key];
  }
  return value;
}

/**
 * One line per problem, each starting with the field path (`cells.2.id: must not be empty`);
 * a missing field reads "is required" rather than a type complaint.
 */
export function describeIssues(issues: readonly z.core.$ZodIssue[], input: unknown, root: string): string {
  return issues
    .map((issue) => {
      const field = issue.path.length > 0 ? issue.path.map(String).join('.') : root;
      const missing = issue.code === 'invalid_type' && issue.path.length > 0 && valueAt(input, issue.path) === undefined;
      return `${field}: ${missing ? 'is required' : issue.message}`;
    })
    .join('; ');
}

/** Parses `input` with `schema`, or throws 400 `invalid-field` naming every field at fault. */
export function parseOrThrow<S extends z.ZodType>(schema: S, input: unknown, root: string): z.output<S> {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  return throwInvalid(result.error, input, root);
}

function throwInvalid(error: z.ZodError, input: unknown, root: string): never {
  throw new ApiError(400, 'invalid-field', describeIssues(error.issues, input, root));
}
