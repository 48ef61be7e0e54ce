import { z } from 'zod';
import { DisplayName, Id, Role, SheetStatus, Timestamp } from './common';

/**
 * A cell as the API checks it: an `id` and a `kind`, every other field passed through. The
 * engine's format reader checks each kind's own fields; the API only guards the structure.
 */
export const SheetCellShape = z.looseObject({
  id: z.string({ error: 'must be a string' }).min(1, { error: 'must not be empty' }).max(64),
  kind: z.string({ error: 'must be a string' }).min(1, { error: 'must not be empty' }).max(64),
});

/** Structural check of a sheet file, format version 1 (see docs/sheet-format.md). */
export const SheetContentV1 = z
  .looseObject({
    format: z.literal('sheaf-sheet', { error: 'must be "sheaf-sheet"' }),
    version: z.literal(1, { error: 'must be 1 (the only version this server reads)' }),
    title: z.string().max(200).optional(),
    unitSystem: z.string().max(32).optional(),
    cells: z.array(SheetCellShape, { error: 'must be an array of cells' }).max(2000),
  })
  .superRefine((sheet, ctx) => {
    const seen = new Set<string>();
    sheet.cells.forEach((cell, index) => {
      if (seen.has(cell.id)) {
        ctx.addIssue({ code: 'custom', path: ['cells', index, 'id'], message: `duplicate cell id "${cell.id}"` });
      }
      seen.add(cell.id);
    });
  })
  .meta({ id: 'SheetContentV1', description: 'A sheet in the sheet file format, version 1' });
export type SheetContentV1 = z.infer<typeof SheetContentV1>;

export const SheetSummary = z
  .object({
    id: Id,
    title: z.string(),
    calcNumber: z.string(),
    status: SheetStatus,
    projectId: Id,
    projectName: z.string(),
    updatedAt: Timestamp,
    revision: z.number().int(),
  })
  .meta({ id: 'SheetSummary' });
export type SheetSummary = z.infer<typeof SheetSummary>;

/** The template (id and version) a sheet was made from; null when it was started otherwise. */
export const SheetTemplateOrigin = z
  .object({ id: z.string(), version: z.number().int() })
  .nullable()
  .meta({ id: 'SheetTemplateOrigin' });
export type SheetTemplateOrigin = z.infer<typeof SheetTemplateOrigin>;

export const SheetDetail = SheetSummary.extend({ content: SheetContentV1, template: SheetTemplateOrigin.optional() }).meta({ id: 'SheetDetail' });
export type SheetDetail = z.infer<typeof SheetDetail>;

export const SheetListResponse = z.object({ sheets: z.array(SheetSummary) }).meta({ id: 'SheetListResponse' });
export type SheetListResponse = z.infer<typeof SheetListResponse>;

/** Query of `GET /api/orgs/:orgId/sheets`: `q` searches title and calc number. */
export const SheetSearchQuery = z.object({
  q: z.string().trim().max(200).optional(),
  status: SheetStatus.optional(),
});
export type SheetSearchQuery = z.infer<typeof SheetSearchQuery>;

export const SheetTitle = DisplayName.max(200, { error: 'must be at most 200 characters' });

export const CreateSheetRequest = z
  .object({ title: SheetTitle, content: SheetContentV1.optional() })
  .meta({ id: 'CreateSheetRequest' });
export type CreateSheetRequest = z.infer<typeof CreateSheetRequest>;

export const UpdateSheetRequest = z
  .object({ title: SheetTitle.optional(), projectId: Id.optional() })
  .refine((body) => body.title !== undefined || body.projectId !== undefined, {
    message: 'give at least one of title, projectId',
  })
  .meta({ id: 'UpdateSheetRequest' });
export type UpdateSheetRequest = z.infer<typeof UpdateSheetRequest>;

export const SheetResponse = z.object({ sheet: SheetDetail }).meta({ id: 'SheetResponse' });
export type SheetResponse = z.infer<typeof SheetResponse>;

/** `GET /api/sheets/:sheetId`: the sheet and the caller's role in its organization. */
export const SheetWithRoleResponse = z
  .object({ sheet: SheetDetail, role: Role })
  .meta({ id: 'SheetWithRoleResponse' });
export type SheetWithRoleResponse = z.infer<typeof SheetWithRoleResponse>;
