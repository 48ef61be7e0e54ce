import Papa from 'papaparse';
import { MATERIAL_PROPERTY_KEYS, checkMaterialValues, materialRecordSchema, type MaterialRecord } from '@sheaf/engine';
import { MATERIAL_CSV_COLUMNS, type ErrorDetail, type LibraryMaterial } from '@sheaf/engine/api';
import { isBuiltinMaterialKey } from '../library/builtinLibrary';

/**
 * An organization's materials as CSV: a header row with the columns of MATERIAL_CSV_COLUMNS
 * (`id, name, category, notes`, then for each property its value, `_basis` and `_source`), then
 * one material per row. A property is left out by leaving its three cells empty.
 */

/** The CSV text of materials, with every column, in the documented order. */
export function materialsToCsv(materials: readonly Pick<LibraryMaterial, 'id' | 'name' | 'category' | 'notes' | 'properties'>[]): string {
  const rows = materials.map((m) => {
    const row: Record<string, string> = { id: m.id, name: m.name, category: m.category, notes: m.notes };
    for (const key of MATERIAL_PROPERTY_KEYS) {
      const entry = m.properties[key];
      row[key] = entry?.value ?? '';
      row[`${key}_basis`] = entry?.basis ?? '';
      row[`${key}_source`] = entry?.source ?? '';
    }
    return row;
  });
  return Papa.unparse({ fields: [...MATERIAL_CSV_COLUMNS], data: rows.map((r) => MATERIAL_CSV_COLUMNS.map((c) => r[c] ?? '')) }, { newline: '\n' });
}

/** The CSV column a field of a material record comes from. */
function columnOf(path: readonly PropertyKey[]): string {
  if (path[0] === 'properties' && typeof path[1] === 'string') {
    if (path[2] === 'basis') return `${path[1]}_basis`;
    if (path[2] === 'source') return `${path[1]}_source`;
    return path[1];
  }
  return path.length > 0 ? String(path[0]) : 'row';
}

function detail(row: number, column: string, message: string): ErrorDetail {
  return { field: `csv`, row, column, message: `row ${row}, ${column}: ${message}` };
}

/** What a CSV file held: the materials, or the problems of every bad row (row 1 is the header). */
export interface ParsedMaterialsCsv {
  records: MaterialRecord[];
  problems: ErrorDetail[];
}

/**
 * Reads materials from CSV text. Every row is checked (schema, values with units and dimension,
 * sources present, no built-in id, no id twice) and every problem is reported with its row number,
 * column and message; the caller saves nothing when there is any problem.
 */
export function parseMaterialsCsv(text: string): ParsedMaterialsCsv {
  const problems: ErrorDetail[] = [];
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), {
    header: true,
    skipEmptyLines: 'greedy',
    transformHeader: (h) => h.trim(),
  });
  const header = parsed.meta.fields ?? [];
  const known = new Set<string>(MATERIAL_CSV_COLUMNS);
  for (const column of header) {
    if (!known.has(column)) problems.push(detail(1, column, `unknown column; the columns are ${MATERIAL_CSV_COLUMNS.join(', ')}`));
  }
  for (const column of ['id', 'name', 'category']) {
    if (!header.includes(column)) problems.push(detail(1, column, 'this column is required'));
  }
  if (problems.length > 0) return { records: [], problems };

  for (const error of parsed.errors) {
    // Papa counts data rows from 0; the file's row numbers start at the header's 1.
    problems.push(detail((error.row ?? -1) + 2, 'row', error.message));
  }

  const records: MaterialRecord[] = [];
  const seen = new Map<string, number>();
  parsed.data.forEach((raw, index) => {
    const row = index + 2;
    const cell = (column: string) => (raw[column] ?? '').trim();
    const properties: Record<string, { value: string; basis: string; source: string }> = {};
    const rowProblems: ErrorDetail[] = [];
    for (const key of MATERIAL_PROPERTY_KEYS) {
      const [value, basis, source] = [cell(key), cell(`${key}_basis`), cell(`${key}_source`)];
      if (value === '' && basis === '' && source === '') continue;
      if (value === '') {
        rowProblems.push(detail(row, key, `a basis or source is given but no value; give the value (e.g. 250 MPa) or clear ${key}_basis and ${key}_source`));
        continue;
      }
      properties[key] = { value, basis, source };
    }
    const candidate = { id: cell('id'), name: cell('name'), category: cell('category'), notes: cell('notes'), properties };
    const result = materialRecordSchema.safeParse(candidate);
    if (!result.success) {
      for (const issue of result.error.issues) rowProblems.push(detail(row, columnOf(issue.path), issue.message));
    } else {
      for (const problem of checkMaterialValues(result.data)) {
        const column = columnOf(problem.field.split('.'));
        rowProblems.push(detail(row, column, problem.message.slice(problem.field.length + 2)));
      }
      if (isBuiltinMaterialKey(result.data.id)) {
        rowProblems.push(detail(row, 'id', `"${result.data.id}" is a built-in material; give your material another id`));
      }
      const earlier = seen.get(result.data.id);
      if (earlier !== undefined) rowProblems.push(detail(row, 'id', `"${result.data.id}" is already used on row ${earlier}`));
      else seen.set(result.data.id, row);
      if (rowProblems.length === 0) records.push(result.data);
    }
    problems.push(...rowProblems);
  });
  if (parsed.data.length === 0 && problems.length === 0) problems.push(detail(2, 'row', 'the file has a header but no materials'));
  return { records, problems };
}
