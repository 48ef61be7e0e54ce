import { readSheet, writeSheet, type Sheet } from '@sheaf/engine';
import { sheetContentFromDoc } from '@sheaf/sheet-doc';
import type * as Y from 'yjs';

/** The largest sheet file the import reads (a sheet of 2000 cells is far smaller). */
export const MAX_SHEET_FILE_BYTES = 5 * 1024 * 1024;

/** A file name for a sheet: its calc number (or title) made safe, with `.sheet.json`. */
export function sheetFileName(calcNumberOrTitle: string): string {
  const stem = calcNumberOrTitle
    .normalize('NFKD')
    .replace(/[^\w.-]+/g, '-')
    .replace(/^[-.]+|-+$/g, '')
    .slice(0, 80);
  return `${stem || 'sheet'}.sheet.json`;
}

/**
 * The live document as a sheet file (format v1), checked by the engine's reader and written by
 * its writer, so an export always reads back. While a cell is half-typed (an empty name, say)
 * the sheet is not a valid file; the reasons come back instead, each naming its JSON path.
 */
export function sheetFileFromDoc(doc: Y.Doc): { ok: true; text: string; sheet: Sheet } | { ok: false; errors: readonly string[] } {
  const content = sheetContentFromDoc(doc);
  // Only the fields of the format: other top-level values the document may carry stay behind.
  const { format, version, title, unitSystem, cells } = content;
  const read = readSheet({ format, version, ...(title !== undefined ? { title } : {}), ...(unitSystem !== undefined ? { unitSystem } : {}), cells });
  if (!read.ok) return { ok: false, errors: read.errors };
  return { ok: true, text: writeSheet(read.sheet), sheet: read.sheet };
}

/**
 * Check a file a person picked for import. Every problem names its JSON path
 * (`cells[3].sx: must be a string ...`); a sheet without a title takes the file's name.
 */
export function readSheetFile(
  text: string,
  fileName: string,
): { ok: true; title: string; sheet: Sheet } | { ok: false; errors: readonly string[] } {
  if (text.trim() === '') return { ok: false, errors: ['the file is empty'] };
  const read = readSheet(text);
  if (!read.ok) return { ok: false, errors: read.errors };
  const fallback = fileName.replace(/\.sheet\.json$|\.json$/i, '').trim();
  const title = (read.sheet.title.trim() || fallback || 'Imported sheet').slice(0, 200);
  return { ok: true, title, sheet: { ...read.sheet, title } };
}
