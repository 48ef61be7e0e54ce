import { z } from 'zod';
import { cellSchema, type Cell } from '../kinds/registry';
import { UNIT_SYSTEM_IDS, type UnitSystemId } from '../units/unitSystems';

/** The `format` tag of a sheet file. @public */
export const SHEET_FORMAT = 'sheaf-sheet';
/** The sheet format version this engine reads and writes. @public */
export const SHEET_VERSION = 1;

/**
 * Schema of a sheet file, format version 1 (docs/sheet-format.md). Cell ids must be unique.
 * @public
 */
export const sheetSchema = z
  .strictObject({
    format: z.literal(SHEET_FORMAT, { error: `must be "${SHEET_FORMAT}"` }),
    version: z.literal(SHEET_VERSION, { error: `must be ${SHEET_VERSION}` }),
    title: z.string({ error: 'must be a string' }).max(200, { error: 'must be at most 200 characters' }).optional(),
    unitSystem: z
      .enum(UNIT_SYSTEM_IDS, { error: 'must be "SI" or "US"' })
      .optional()
      .meta({ description: 'Units for display: SI (MPa, kN, mm) or US (ksi, kip, in); SI when absent' }),
    cells: z.array(cellSchema, { error: 'must be an array of cells' }).max(2000, { error: 'holds at most 2000 cells' }),
  })
  .superRefine((sheet, ctx) => {
    const first = new Map<string, number>();
    sheet.cells.forEach((cell, i) => {
      const seen = first.get(cell.id);
      if (seen !== undefined) {
        ctx.addIssue({ code: 'custom', path: ['cells', i, 'id'], message: `duplicate id "${cell.id}" (also cells[${seen}])` });
      } else {
        first.set(cell.id, i);
      }
    });
  })
  .meta({
    title: 'Sheaf sheet, format version 1',
    description: 'A calculation sheet: typed cells evaluated by the Sheaf engine. Quantities are expressions with units.',
  });

/** A sheet as read: `title` and `unitSystem` filled in. @public */
export interface Sheet {
  readonly format: typeof SHEET_FORMAT;
  readonly version: typeof SHEET_VERSION;
  readonly title: string;
  readonly unitSystem: UnitSystemId;
  readonly cells: readonly Cell[];
}
