import type { z } from 'zod';

/**
 * A JSON path as people read it: `cells[3].strength.Sy`. Numeric steps become indexes.
 * @example jsonPath(['cells', 3, 'sx']) // 'cells[3].sx'
 * @public
 */
export function jsonPath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const step of path) {
    if (typeof step === 'number') out += `[${step}]`;
    else out += out === '' ? String(step) : `.${String(step)}`;
  }
  return out;
}

/** The deepest issue of a union, so the message names the field that is wrong inside it. */
function innermost(issue: z.core.$ZodIssue): { path: PropertyKey[]; message: string } {
  if (issue.code === 'invalid_union' && 'errors' in issue && issue.errors.length > 0) {
    // Prefer the branch with the fewest complaints: it is the one the author meant.
    const best = [...issue.errors].sort((a, b) => a.length - b.length)[0]!;
    const first = best[0];
    if (first) {
      const inner = innermost(first);
      return { path: [...issue.path, ...inner.path], message: inner.message };
    }
  }
  if (issue.code === 'unrecognized_keys') {
    return { path: [...issue.path], message: `unknown field${issue.keys.length > 1 ? 's' : ''} ${issue.keys.map((k) => `"${k}"`).join(', ')}` };
  }
  return { path: [...issue.path], message: issue.message };
}

/**
 * One line per zod issue, each naming its JSON path: `cells[3].sx: must be a string`.
 * `prefix` is prepended to every path (e.g. `cells[3]` when checking one cell).
 * @public
 */
export function describeIssues(issues: readonly z.core.$ZodIssue[], prefix: readonly PropertyKey[] = []): string[] {
  return issues.map((issue) => {
    const { path, message } = innermost(issue);
    const where = jsonPath([...prefix, ...path]);
    return where ? `${where}: ${message}` : message;
  });
}
