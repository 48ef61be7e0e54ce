import type { StressColumns } from './columns';

/** A CSV read into stress columns, or where it went wrong (1-based line, column name). @public */
export type CsvColumns =
  | {
      readonly ok: true;
      readonly columns: StressColumns;
      readonly rows: number;
      /** The 1-based line of the file each data row came from. */
      readonly lines: Uint32Array;
    }
  | { readonly ok: false; readonly message: string };

const REQUIRED = ['sx', 'sy', 'txy'] as const;
const OPTIONAL = ['sz', 'tyz', 'tzx'] as const;

/**
 * Read a CSV of stress points: a header row naming the columns sx, sy, txy and optionally sz,
 * tyz, tzx (any order, other columns ignored, case-insensitive), then one row per point, numbers
 * in the unit whose size is `siPerUnit` Pa. Comma or semicolon separated; blank lines skipped.
 * Errors name the line and column, e.g. `line 18, column txy: "abc" is not a number`.
 * @public
 */
export function parseStressCsv(text: string, siPerUnit: number): CsvColumns {
  const lines = text.split(/\r?\n/);
  let headerLine = -1;
  for (let i = 0; i < lines.length; i++) {
    if (lines[i]!.trim() !== '') {
      headerLine = i;
      break;
    }
  }
  if (headerLine < 0) return { ok: false, message: 'the file is empty (expected a header row: sx,sy,txy[,sz,tyz,tzx])' };
  const separator = lines[headerLine]!.includes(';') && !lines[headerLine]!.includes(',') ? ';' : ',';
  const header = lines[headerLine]!.split(separator).map((h) => h.trim().replace(/^"|"$/g, '').toLowerCase());
  const index: Record<string, number> = {};
  for (const name of [...REQUIRED, ...OPTIONAL]) index[name] = header.indexOf(name);
  const missing = REQUIRED.filter((k) => index[k]! < 0);
  if (missing.length) return { ok: false, message: `header: missing column ${missing.join(', ')} (found ${header.join(', ')})` };
  const optionalFound = OPTIONAL.filter((k) => index[k]! >= 0);
  if (optionalFound.length !== 0 && optionalFound.length !== 3) {
    return { ok: false, message: `header: give all of sz, tyz, tzx for 3D states or none (found ${optionalFound.join(', ')})` };
  }
  const keys = [...REQUIRED, ...optionalFound];
  const capacity = lines.length - headerLine - 1;
  const cols: Record<string, Float64Array> = {};
  for (const k of keys) cols[k] = new Float64Array(capacity);
  const lineOf = new Uint32Array(capacity);
  let n = 0;
  for (let i = headerLine + 1; i < lines.length; i++) {
    const line = lines[i]!;
    if (line.trim() === '') continue;
    const cells = line.split(separator);
    for (const k of keys) {
      const raw = cells[index[k]!];
      const v = raw === undefined || raw.trim() === '' ? NaN : Number(raw);
      if (!Number.isFinite(v)) {
        return { ok: false, message: `line ${i + 1}, column ${k}: ${raw === undefined ? 'is missing' : `"${raw.trim()}" is not a number`}` };
      }
      cols[k]![n] = v * siPerUnit;
    }
    lineOf[n] = i + 1;
    n++;
  }
  const trimmed: Record<string, Float64Array> = {};
  for (const k of keys) trimmed[k] = cols[k]!.subarray(0, n);
  return { ok: true, columns: trimmed as unknown as StressColumns, rows: n, lines: lineOf.subarray(0, n) };
}
