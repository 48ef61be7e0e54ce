import { createHash } from 'node:crypto';

/**
 * The canonical JSON of a value: object keys sorted by code point at every depth, no spaces,
 * arrays in order. Two equal sheets give the same bytes whatever order their fields were written
 * in, so the hash of a revision's content can be recomputed and compared by anyone.
 */
export function canonicalJson(value: unknown): string {
  if (value === null || typeof value !== 'object') {
    // JSON.stringify maps undefined (absent) to undefined; callers pass JSON-safe values.
    return JSON.stringify(value) ?? 'null';
  }
  if (Array.isArray(value)) return `[${value.map(canonicalJson).join(',')}]`;
  const entries = Object.entries(value as Record<string, unknown>)
    .filter(([, inner]) => inner !== undefined)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `{${entries.map(([key, inner]) => `${JSON.stringify(key)}:${canonicalJson(inner)}`).join(',')}}`;
}

/** Hex sha-256 of the canonical JSON (UTF-8) of a sheet's content. */
export function contentSha256(content: unknown): string {
  return createHash('sha256').update(canonicalJson(content), 'utf8').digest('hex');
}
