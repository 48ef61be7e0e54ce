import { KINDS, type Cell } from '../kinds/registry';
import type { Sheet } from './sheetSchema';

/** The field order of a kind's schema, so written files list fields as the format does. */
function fieldOrder(cell: Cell): string[] {
  const shape = (KINDS[cell.kind].schema as unknown as { shape?: Record<string, unknown> }).shape;
  return shape ? Object.keys(shape) : Object.keys(cell);
}

/**
 * Write a sheet as JSON text: two-space indent, fields in the order of the format (format,
 * version, title, unitSystem, cells; each cell's fields in its kind's order), undefined fields
 * left out, a final newline. Reading the text back gives the same sheet.
 * @public
 */
export function writeSheet(sheet: Sheet): string {
  const cells = sheet.cells.map((cell) => {
    const out: Record<string, unknown> = {};
    for (const key of fieldOrder(cell)) {
      const value = (cell as unknown as Record<string, unknown>)[key];
      if (value !== undefined) out[key] = value;
    }
    return out;
  });
  const doc = { format: sheet.format, version: sheet.version, title: sheet.title, unitSystem: sheet.unitSystem, cells };
  return `${JSON.stringify(doc, null, 2)}\n`;
}
