import { readSheet } from '@sheaf/engine';
import type { SheetContentV1 } from '@sheaf/engine/api';
import { ApiError } from '../http/ApiError';

/**
 * Checks sheet content with the engine's own format reader (every cell kind's fields, not only
 * the structure) and returns it in the engine's canonical form. 400 `invalid-field` otherwise,
 * naming each field under `field`, e.g. `content.cells[2].sx: must be a string`.
 */
export function checkSheetContent(content: unknown, field = 'content'): SheetContentV1 {
  const result = readSheet(content);
  if (!result.ok) {
    throw new ApiError(400, 'invalid-field', result.errors.map((error) => `${field}.${error}`).join('; '));
  }
  return result.sheet as unknown as SheetContentV1;
}
