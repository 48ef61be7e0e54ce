import { z } from 'zod';
import { templateParametersSchema } from '../library/templateParameters';
import { DisplayName, Id, Timestamp } from './common';
import { SheetContentV1, SheetDetail, SheetTitle } from './sheets';

/**
 * Templates over HTTP: proven calculations to start new sheets from. Built-in templates have ids
 * `builtin:<key>`; an organization's own have UUIDs. Every edit of a template makes a new
 * version; a sheet records the template id and version it was made from.
 */

/** A template id: a UUID, or `builtin:` and the key of a built-in template. */
export const TemplateId = z.union([Id, z.string().regex(/^builtin:[a-z0-9-]{1,60}$/)], { error: 'must be a template id' });

export const TemplateText = {
  title: DisplayName.max(200, { error: 'must be at most 200 characters' }),
  description: z.string({ error: 'must be a string' }).trim().max(2000, { error: 'must be at most 2000 characters' }),
  category: z
    .string({ error: 'must be a string' })
    .trim()
    .min(1, { error: 'must not be empty' })
    .max(60, { error: 'must be at most 60 characters' }),
};

export const TemplateSummary = z
  .object({
    id: TemplateId,
    builtin: z.boolean(),
    title: z.string(),
    description: z.string(),
    category: z.string(),
    version: z.number().int(),
    parameterCount: z.number().int(),
    updatedAt: Timestamp.nullable(),
  })
  .meta({ id: 'TemplateSummary' });
export type TemplateSummary = z.infer<typeof TemplateSummary>;

export const TemplateListResponse = z.object({ templates: z.array(TemplateSummary), categories: z.array(z.string()) }).meta({ id: 'TemplateListResponse' });
export type TemplateListResponse = z.infer<typeof TemplateListResponse>;

/** Query of `GET /api/orgs/:orgId/templates`: `q` searches title and description. */
export const TemplateSearchQuery = z.object({
  q: z.string().trim().max(200).optional(),
  category: z.string().trim().max(60).optional(),
});
export type TemplateSearchQuery = z.infer<typeof TemplateSearchQuery>;

/** One version of a template, with the sheet it was saved from. */
export const TemplateVersionSummary = z
  .object({
    version: z.number().int(),
    title: z.string(),
    category: z.string(),
    createdAt: Timestamp.nullable(),
    createdByName: z.string().nullable(),
    sourceSheetId: Id.nullable(),
    sourceRevisionId: Id.nullable(),
  })
  .meta({ id: 'TemplateVersionSummary' });
export type TemplateVersionSummary = z.infer<typeof TemplateVersionSummary>;

/** A template at one version: its content and parameters, and the list of all its versions. */
export const TemplateDetail = TemplateSummary.extend({
  content: SheetContentV1,
  parameters: templateParametersSchema,
  versions: z.array(TemplateVersionSummary),
}).meta({ id: 'TemplateDetail' });
export type TemplateDetail = z.infer<typeof TemplateDetail>;

export const TemplateResponse = z.object({ template: TemplateDetail }).meta({ id: 'TemplateResponse' });
export type TemplateResponse = z.infer<typeof TemplateResponse>;

/** Query of a template read: a version number (the latest when absent). */
export const TemplateVersionQuery = z.object({ version: z.coerce.number().int().min(1).optional() });

/**
 * `POST /api/sheets/:sheetId/templates`: save the sheet's current content as a new template of
 * its organization, with the quantity cells that become parameters.
 */
export const CreateTemplateRequest = z
  .object({ ...TemplateText, parameters: templateParametersSchema })
  .meta({ id: 'CreateTemplateRequest' });
export type CreateTemplateRequest = z.infer<typeof CreateTemplateRequest>;

/**
 * `POST /api/orgs/:orgId/templates/:templateId/versions`: a new version. Without `sheetId` the
 * content stays that of the latest version; with it, the sheet's current content is taken.
 */
export const NewTemplateVersionRequest = z
  .object({ ...TemplateText, parameters: templateParametersSchema, sheetId: Id.optional() })
  .meta({ id: 'NewTemplateVersionRequest' });
export type NewTemplateVersionRequest = z.infer<typeof NewTemplateVersionRequest>;

/**
 * `POST /api/projects/:projectId/sheets/from-template`: a new sheet from a template version with
 * parameter values (expressions with units, by parameter name).
 */
export const SheetFromTemplateRequest = z
  .object({
    templateId: TemplateId,
    version: z.number().int().min(1).optional(),
    title: SheetTitle,
    parameters: z.record(z.string(), z.string().max(2000)),
  })
  .meta({ id: 'SheetFromTemplateRequest' });
export type SheetFromTemplateRequest = z.infer<typeof SheetFromTemplateRequest>;

export const SheetFromTemplateResponse = z
  .object({ sheet: SheetDetail, template: z.object({ id: TemplateId, version: z.number().int() }) })
  .meta({ id: 'SheetFromTemplateResponse' });
export type SheetFromTemplateResponse = z.infer<typeof SheetFromTemplateResponse>;
