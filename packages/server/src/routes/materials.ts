import { z } from 'zod';
import { materialKeySchema } from '@sheaf/engine';
import {
  CreateMaterialRequest,
  ExportMaterialsResponse,
  Id,
  ImportMaterialsRequest,
  ImportMaterialsResponse,
  MaterialListResponse,
  MaterialResponse,
  UpdateMaterialRequest,
} from '@sheaf/engine/api';
import { organizationFromParams, type AccessGrant } from '../auth/permissions';
import { ApiError } from '../http/ApiError';
import { createMaterial, deleteMaterial, listMaterials, organizationMaterials, updateMaterial, upsertMaterials } from '../services/materials';
import { materialsToCsv, parseMaterialsCsv } from '../services/materialsCsv';
import { created, defineRoute, noContent, ok, type Route } from './defineRoute';

function organizationOf(access: AccessGrant | undefined): string {
  if (!access) throw new Error('permission route without an access grant');
  return access.organizationId;
}

function userOf(user: Express.User | undefined): string {
  if (!user) throw new Error('permission route without a user');
  return user.id;
}

const OrgParams = z.object({ orgId: Id });
const MaterialParams = z.object({ orgId: Id, materialKey: materialKeySchema });

/** The materials library: built-ins with their sources, and the organization's own (CSV in and out). */
export function materialRoutes(): Route[] {
  return [
    defineRoute({
      id: 'materials.list',
      method: 'get',
      path: '/api/orgs/:orgId/materials',
      summary: "The built-in materials and the organization's own, each value with its basis and published source",
      tag: 'materials',
      access: { kind: 'permission', action: 'material.read', resolve: organizationFromParams },
      params: OrgParams,
      response: { status: 200, description: 'Built-ins first, then the organization’s materials by id', schema: MaterialListResponse },
      handler: async ({ deps, access }) => ok({ materials: await listMaterials(deps.dataSource, organizationOf(access)) }),
    }),
    defineRoute({
      id: 'materials.create',
      method: 'post',
      path: '/api/orgs/:orgId/materials',
      summary: 'Add a material to the organization (every value needs a basis and a source)',
      tag: 'materials',
      access: { kind: 'permission', action: 'material.write', resolve: organizationFromParams },
      params: OrgParams,
      body: CreateMaterialRequest,
      response: { status: 201, description: 'The new material', schema: MaterialResponse },
      errors: [409],
      handler: async ({ deps, access, body, user }) =>
        created({ material: await createMaterial(deps.dataSource, organizationOf(access), body, userOf(user)) }),
    }),
    defineRoute({
      id: 'materials.update',
      method: 'put',
      path: '/api/orgs/:orgId/materials/:materialKey',
      summary: "Replace an organization material's name, category, notes and values (built-ins are read-only)",
      tag: 'materials',
      access: { kind: 'permission', action: 'material.write', resolve: organizationFromParams },
      params: MaterialParams,
      body: UpdateMaterialRequest,
      response: { status: 200, description: 'The material as saved', schema: MaterialResponse },
      handler: async ({ deps, access, params, body, user }) =>
        ok({ material: await updateMaterial(deps.dataSource, organizationOf(access), params.materialKey, body, userOf(user)) }),
    }),
    defineRoute({
      id: 'materials.delete',
      method: 'delete',
      path: '/api/orgs/:orgId/materials/:materialKey',
      summary: 'Remove an organization material (issued revisions keep the values frozen into them)',
      tag: 'materials',
      access: { kind: 'permission', action: 'material.write', resolve: organizationFromParams },
      params: MaterialParams,
      response: { status: 204, description: 'Removed' },
      handler: async ({ deps, access, params }) => {
        await deleteMaterial(deps.dataSource, organizationOf(access), params.materialKey);
        return noContent();
      },
    }),
    defineRoute({
      id: 'materials.export',
      method: 'get',
      path: '/api/orgs/:orgId/materials/export',
      summary: "The organization's own materials as CSV text (one row per material, value, basis and source columns per property)",
      tag: 'materials',
      access: { kind: 'permission', action: 'material.read', resolve: organizationFromParams },
      params: OrgParams,
      response: { status: 200, description: 'CSV text and a file name', schema: ExportMaterialsResponse },
      handler: async ({ deps, access }) => {
        const materials = await organizationMaterials(deps.dataSource, organizationOf(access));
        const day = new Date().toISOString().slice(0, 10);
        return ok({ filename: `materials-${day}.csv`, csv: materialsToCsv(materials), count: materials.length });
      },
    }),
    defineRoute({
      id: 'materials.import',
      method: 'post',
      path: '/api/orgs/:orgId/materials/import',
      summary: 'Add or replace organization materials from CSV text; any bad row saves nothing and every bad row is reported',
      tag: 'materials',
      access: { kind: 'permission', action: 'material.write', resolve: organizationFromParams },
      params: OrgParams,
      body: ImportMaterialsRequest,
      response: { status: 200, description: 'How many were added and replaced, and the materials as saved', schema: ImportMaterialsResponse },
      handler: async ({ deps, access, body, user }) => {
        const { records, problems } = parseMaterialsCsv(body.csv);
        if (problems.length > 0) {
          const shown = problems.slice(0, 20).map((p) => p.message);
          const more = problems.length > shown.length ? `; and ${problems.length - shown.length} more` : '';
          throw new ApiError(
            400,
            'invalid-field',
            `body.csv: ${problems.length} ${problems.length === 1 ? 'problem' : 'problems'}, nothing was saved: ${shown.join('; ')}${more}`,
            { details: problems },
          );
        }
        return ok(await upsertMaterials(deps.dataSource, organizationOf(access), records, userOf(user)));
      },
    }),
  ];
}
