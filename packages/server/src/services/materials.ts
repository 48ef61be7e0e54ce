import type { DataSource, EntityManager } from 'typeorm';
import { checkMaterialValues, materialsLookupOf, type MaterialRecord, type MaterialsLookup } from '@sheaf/engine';
import type { LibraryMaterial } from '@sheaf/engine/api';
import { OrganizationMaterial } from '../entities/OrganizationMaterial';
import { ApiError, conflict, notFound } from '../http/ApiError';
import { builtinMaterials, isBuiltinMaterialKey } from '../library/builtinLibrary';

/**
 * The materials library of an organization: the built-in materials (read-only, from `library/`)
 * followed by the organization's own. Owners and engineers add and edit their own; every value
 * needs a basis and a published source (the schema says so), and must evaluate with the right
 * dimension (checked here with the engine's checkMaterialValues).
 */

type Queryable = DataSource | EntityManager;

function fromBuiltin(record: MaterialRecord): LibraryMaterial {
  return { ...record, builtin: true, updatedAt: null };
}

function fromRow(row: OrganizationMaterial): LibraryMaterial {
  return {
    id: row.key,
    name: row.name,
    category: row.category,
    notes: row.notes,
    properties: row.properties,
    builtin: false,
    updatedAt: row.updatedAt.toISOString(),
  };
}

/** The organization's own materials, by key. */
export async function organizationMaterials(db: Queryable, organizationId: string): Promise<LibraryMaterial[]> {
  const rows = await db.getRepository(OrganizationMaterial).find({ where: { organizationId }, order: { key: 'ASC' } });
  return rows.map(fromRow);
}

/** Built-in materials, then the organization's own. */
export async function listMaterials(db: Queryable, organizationId: string): Promise<LibraryMaterial[]> {
  return [...builtinMaterials().map(fromBuiltin), ...(await organizationMaterials(db, organizationId))];
}

/** One material by key (built-in or the organization's), or undefined. */
export async function findLibraryMaterial(db: Queryable, organizationId: string, key: string): Promise<LibraryMaterial | undefined> {
  const builtin = builtinMaterials().find((m) => m.id === key);
  if (builtin) return fromBuiltin(builtin);
  const row = await db.getRepository(OrganizationMaterial).findOneBy({ organizationId, key });
  return row ? fromRow(row) : undefined;
}

/** The evaluator's materials lookup for an organization (built-ins and its own). */
export async function materialsLookupFor(db: Queryable, organizationId: string): Promise<MaterialsLookup> {
  return materialsLookupOf(await listMaterials(db, organizationId));
}

/** 400 naming every field whose value does not evaluate, has the wrong dimension or is out of range. */
export function assertMaterialValues(record: Pick<MaterialRecord, 'properties'>, root = 'body'): void {
  const problems = checkMaterialValues(record);
  if (problems.length > 0) {
    throw new ApiError(400, 'invalid-field', problems.map((p) => `${root}.${p.message}`).join('; '), {
      details: problems.map((p) => ({ field: `${root}.${p.field}`, message: `${root}.${p.message}` })),
    });
  }
}

function assertNotBuiltin(key: string, field: string): void {
  if (isBuiltinMaterialKey(key)) {
    throw new ApiError(400, 'invalid-field', `${field}: "${key}" is a built-in material; give your material another id`);
  }
}

/** Adds a material to the organization. 400 for bad values or a built-in's id, 409 when the id is taken. */
export async function createMaterial(dataSource: DataSource, organizationId: string, record: MaterialRecord, userId: string): Promise<LibraryMaterial> {
  assertNotBuiltin(record.id, 'body.id');
  assertMaterialValues(record);
  const repository = dataSource.getRepository(OrganizationMaterial);
  if (await repository.existsBy({ organizationId, key: record.id })) {
    throw conflict(`id: the organization already has a material "${record.id}"; edit it instead`);
  }
  const saved = await repository.save(
    repository.create({
      organizationId,
      key: record.id,
      name: record.name,
      category: record.category,
      notes: record.notes,
      properties: record.properties,
      createdByUserId: userId,
      updatedByUserId: userId,
    }),
  );
  return fromRow(saved);
}

/**
 * Replaces an organization material's name, category, notes and values. Built-in materials are
 * read-only (403). Sheets name materials by key, so live sheets see the new values at once;
 * issued revisions keep the values frozen into them.
 */
export async function updateMaterial(
  dataSource: DataSource,
  organizationId: string,
  key: string,
  record: Omit<MaterialRecord, 'id'>,
  userId: string,
): Promise<LibraryMaterial> {
  if (isBuiltinMaterialKey(key)) {
    throw new ApiError(403, 'forbidden', `"${key}" is a built-in material and cannot be edited; add your own material with another id`);
  }
  assertMaterialValues(record);
  const repository = dataSource.getRepository(OrganizationMaterial);
  const row = await repository.findOneBy({ organizationId, key });
  if (!row) throw notFound('material');
  Object.assign(row, {
    name: record.name,
    category: record.category,
    notes: record.notes,
    properties: record.properties,
    updatedByUserId: userId,
  });
  return fromRow(await repository.save(row));
}

/** Removes an organization material; built-ins cannot be removed (403). */
export async function deleteMaterial(dataSource: DataSource, organizationId: string, key: string): Promise<void> {
  if (isBuiltinMaterialKey(key)) throw new ApiError(403, 'forbidden', `"${key}" is a built-in material and cannot be deleted`);
  const result = await dataSource.getRepository(OrganizationMaterial).delete({ organizationId, key });
  if (!result.affected) throw notFound('material');
}

/**
 * Adds or replaces many materials in one transaction: all of them or none. The caller has checked
 * every record; ids of built-in materials are refused before anything is written.
 */
export async function upsertMaterials(
  dataSource: DataSource,
  organizationId: string,
  records: readonly MaterialRecord[],
  userId: string,
): Promise<{ created: number; updated: number; materials: LibraryMaterial[] }> {
  return dataSource.transaction(async (manager) => {
    let created = 0;
    let updated = 0;
    const saved: LibraryMaterial[] = [];
    for (const record of records) {
      const rows: { id: string; inserted: boolean }[] = await manager.query(
        `INSERT INTO materials (organization_id, key, name, category, notes, properties, created_by_user_id, updated_by_user_id)
         VALUES ($1, $2, $3, $4, $5, $6::jsonb, $7, $7)
         ON CONFLICT (organization_id, key) DO UPDATE
           SET name = EXCLUDED.name, category = EXCLUDED.category, notes = EXCLUDED.notes,
               properties = EXCLUDED.properties, updated_by_user_id = EXCLUDED.updated_by_user_id, updated_at = now()
         RETURNING id, (xmax = 0) AS inserted`,
        [organizationId, record.id, record.name, record.category, record.notes, JSON.stringify(record.properties), userId],
      );
      if (rows[0]?.inserted) created++;
      else updated++;
      const row = await manager.findOneByOrFail(OrganizationMaterial, { id: rows[0]?.id as string });
      saved.push(fromRow(row));
    }
    return { created, updated, materials: saved };
  });
}
