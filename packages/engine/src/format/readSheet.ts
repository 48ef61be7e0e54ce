import { describeIssues } from './issues';
import { SHEET_FORMAT, SHEET_VERSION, sheetSchema, type Sheet } from './sheetSchema';

/** A sheet read from a file, or the reasons it is not a valid one (each naming its JSON path). @public */
export type ReadResult = { readonly ok: true; readonly sheet: Sheet } | { readonly ok: false; readonly errors: readonly string[] };

/**
 * Bring an older sheet up to the current version. Version 1 is the only version so far, so this
 * passes it through; a newer version than the engine knows is refused with a clear message.
 * @public
 */
export function upgradeSheet(data: unknown): { ok: true; data: unknown } | { ok: false; errors: string[] } {
  if (typeof data !== 'object' || data === null || Array.isArray(data)) {
    return { ok: false, errors: ['the file must hold a JSON object (a sheet)'] };
  }
  const record = data as Record<string, unknown>;
  if (record.format !== SHEET_FORMAT) return { ok: false, errors: [`format: must be "${SHEET_FORMAT}"`] };
  if (typeof record.version === 'number' && record.version > SHEET_VERSION) {
    return { ok: false, errors: [`version: ${record.version} is newer than this engine reads (${SHEET_VERSION})`] };
  }
  return { ok: true, data };
}

/**
 * Read and validate a sheet from JSON text or from already parsed data. Errors name the JSON
 * path, e.g. `cells[3].sx: must be a string (an expression such as "120 MPa")`.
 * @example readSheet('{"format":"sheaf-sheet","version":1,"cells":[]}') // { ok: true, sheet: { ..., title: '', unitSystem: 'SI' } }
 * @public
 */
export function readSheet(input: string | unknown): ReadResult {
  let data: unknown = input;
  if (typeof input === 'string') {
    try {
      data = JSON.parse(input);
    } catch (err) {
      return { ok: false, errors: [`JSON: ${err instanceof Error ? err.message : String(err)}`] };
    }
  }
  const upgraded = upgradeSheet(data);
  if (!upgraded.ok) return upgraded;
  const parsed = sheetSchema.safeParse(upgraded.data);
  if (!parsed.success) return { ok: false, errors: describeIssues(parsed.error.issues) };
  const sheet = parsed.data;
  return {
    ok: true,
    sheet: {
      format: SHEET_FORMAT,
      version: SHEET_VERSION,
      title: sheet.title ?? '',
      unitSystem: sheet.unitSystem ?? 'SI',
      cells: sheet.cells,
    },
  };
}
