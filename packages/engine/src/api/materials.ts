import { z } from 'zod';
import { materialRecordSchema } from '../library/materialRecord';
import { Timestamp } from './common';

/**
 * The materials library over HTTP: the built-in materials (read-only, with their published
 * sources) and each organization's own. Values are expressions with units; every value carries
 * its basis (minimum, typical, design) and its source.
 */

/** A material as the API lists it. `builtin` materials cannot be edited; `updatedAt` is null for them. */
export const LibraryMaterial = materialRecordSchema
  .extend({ builtin: z.boolean(), updatedAt: Timestamp.nullable() })
  .meta({ id: 'LibraryMaterial', description: 'A material with a basis and a published source for each value' });
export type LibraryMaterial = z.infer<typeof LibraryMaterial>;

/**
 * Material values frozen into an issued revision: for each material id its sheet names, the
 * material as it was at approval. The revision is evaluated with these, never the live library.
 */
export const FrozenMaterials = z.record(z.string(), LibraryMaterial).meta({ id: 'FrozenMaterials' });
export type FrozenMaterials = z.infer<typeof FrozenMaterials>;

export const MaterialListResponse = z.object({ materials: z.array(LibraryMaterial) }).meta({ id: 'MaterialListResponse' });
export type MaterialListResponse = z.infer<typeof MaterialListResponse>;

/** `POST /api/orgs/:orgId/materials`: a new organization material. */
export const CreateMaterialRequest = materialRecordSchema.meta({ id: 'CreateMaterialRequest' });
export type CreateMaterialRequest = z.input<typeof CreateMaterialRequest>;

/** `PUT /api/orgs/:orgId/materials/:materialKey`: the material's new name, category, notes and values. */
export const UpdateMaterialRequest = materialRecordSchema.omit({ id: true }).meta({ id: 'UpdateMaterialRequest' });
export type UpdateMaterialRequest = z.input<typeof UpdateMaterialRequest>;

export const MaterialResponse = z.object({ material: LibraryMaterial }).meta({ id: 'MaterialResponse' });
export type MaterialResponse = z.infer<typeof MaterialResponse>;

/** The CSV columns of an organization's materials, in order (`Sy_basis`, `Sy_source` beside each value). */
export const MATERIAL_CSV_COLUMNS = [
  'id',
  'name',
  'category',
  'notes',
  ...(['Sy', 'Sut', 'Suc', 'c', 'phi', 'E', 'nu'] as const).flatMap((key) => [key, `${key}_basis`, `${key}_source`]),
] as const;

/** `POST /api/orgs/:orgId/materials/import`: the CSV text (a header row, then one material per row). */
export const ImportMaterialsRequest = z
  .object({ csv: z.string({ error: 'must be the CSV text' }).min(1, { error: 'must not be empty' }).max(1_000_000, { error: 'must be at most 1 MB' }) })
  .meta({ id: 'ImportMaterialsRequest' });
export type ImportMaterialsRequest = z.infer<typeof ImportMaterialsRequest>;

export const ImportMaterialsResponse = z
  .object({ created: z.number().int(), updated: z.number().int(), materials: z.array(LibraryMaterial) })
  .meta({ id: 'ImportMaterialsResponse' });
export type ImportMaterialsResponse = z.infer<typeof ImportMaterialsResponse>;

/** `GET /api/orgs/:orgId/materials/export`: the organization's own materials as CSV text. */
export const ExportMaterialsResponse = z
  .object({ filename: z.string(), csv: z.string(), count: z.number().int() })
  .meta({ id: 'ExportMaterialsResponse' });
export type ExportMaterialsResponse = z.infer<typeof ExportMaterialsResponse>;
