import type { CellResult } from '@sheaf/engine';

/**
 * The field an error value names (`sx`, `strength.Sy`, `angles[1]`, `of`), read from the start of
 * its message; the editor of that field is marked invalid. Null when the message names none or
 * the error started in another cell (`upstream`).
 * @example errorFieldOf({ ok: false, error: { code: 'unit-mismatch', message: 'sx: expected a stress ...' } }) // 'sx'
 */
export function errorFieldOf(result: CellResult | undefined): string | null {
  if (!result || result.ok || result.error.code === 'upstream') return null;
  const match = /^([A-Za-z_][A-Za-z0-9_]*(?:\.[A-Za-z_][A-Za-z0-9_]*|\[\d+\])*)(?: \([^)]*\))?(?: [A-Za-z_]+)?:/.exec(result.error.message);
  return match ? match[1]! : null;
}
