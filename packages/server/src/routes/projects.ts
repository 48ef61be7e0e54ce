import { z } from 'zod';
import {
  CreateProjectRequest,
  CreateSheetRequest,
  Id,
  ProjectListResponse,
  ProjectResponse,
  SheetListResponse,
  SheetResponse,
  SheetSearchQuery,
  SheetWithRoleResponse,
  UpdateSheetRequest,
} from '@sheaf/engine/api';
import { organizationFromParams, projectFromParams, sheetFromParams, type AccessGrant } from '../auth/permissions';
import { createProject, listProjects } from '../services/projects';
import { checkSheetContent } from '../services/sheetContent';
import { createSheet, deleteSheet, listSheets, sheetDetail, updateSheet } from '../services/sheets';
import { created, defineRoute, noContent, ok, type Route } from './defineRoute';

function granted(access: AccessGrant | undefined): AccessGrant {
  if (!access) throw new Error('permission route without an access grant');
  return access;
}

function grantedProject(access: AccessGrant | undefined) {
  const project = granted(access).project;
  if (!project) throw new Error('project route without its project');
  return project;
}

function grantedSheet(access: AccessGrant | undefined) {
  const sheet = granted(access).sheet;
  if (!sheet) throw new Error('sheet route without its sheet');
  return sheet;
}

/** Projects and calculation sheets. */
export function projectAndSheetRoutes(): Route[] {
  return [
    defineRoute({
      id: 'projects.list',
      method: 'get',
      path: '/api/orgs/:orgId/projects',
      summary: "An organization's projects with their sheet counts",
      tag: 'projects',
      access: { kind: 'permission', action: 'project.read', resolve: organizationFromParams },
      params: z.object({ orgId: Id }),
      response: { status: 200, description: 'Projects by name', schema: ProjectListResponse },
      handler: async ({ deps, access }) => ok({ projects: await listProjects(deps.dataSource, granted(access).organizationId) }),
    }),
    defineRoute({
      id: 'projects.create',
      method: 'post',
      path: '/api/orgs/:orgId/projects',
      summary: 'Create a project; without a code, one is made from the name',
      tag: 'projects',
      access: { kind: 'permission', action: 'project.create', resolve: organizationFromParams },
      params: z.object({ orgId: Id }),
      body: CreateProjectRequest,
      response: { status: 201, description: 'The new project', schema: ProjectResponse },
      errors: [409],
      handler: async ({ deps, access, body }) =>
        created({ project: await createProject(deps.dataSource, granted(access).organizationId, body.name, body.code) }),
    }),
    defineRoute({
      id: 'sheets.search',
      method: 'get',
      path: '/api/orgs/:orgId/sheets',
      summary: "Search an organization's sheets by title and calc number, optionally by status",
      tag: 'sheets',
      access: { kind: 'permission', action: 'sheet.read', resolve: organizationFromParams },
      params: z.object({ orgId: Id }),
      query: SheetSearchQuery,
      response: { status: 200, description: 'Matching sheets, most recently changed first', schema: SheetListResponse },
      handler: async ({ deps, access, query }) =>
        ok({ sheets: await listSheets(deps.dataSource, { organizationId: granted(access).organizationId, ...query }) }),
    }),
    defineRoute({
      id: 'sheets.listInProject',
      method: 'get',
      path: '/api/projects/:projectId/sheets',
      summary: "A project's sheets",
      tag: 'sheets',
      access: { kind: 'permission', action: 'sheet.read', resolve: projectFromParams },
      params: z.object({ projectId: Id }),
      response: { status: 200, description: 'Sheets, most recently changed first', schema: SheetListResponse },
      handler: async ({ deps, access }) => {
        const project = grantedProject(access);
        return ok({ sheets: await listSheets(deps.dataSource, { organizationId: project.organizationId, projectId: project.id }) });
      },
    }),
    defineRoute({
      id: 'sheets.create',
      method: 'post',
      path: '/api/projects/:projectId/sheets',
      summary: "Create a sheet in a project under the project's next calc number, empty or from sheet file content (checked by the engine's format reader)",
      tag: 'sheets',
      access: { kind: 'permission', action: 'sheet.create', resolve: projectFromParams },
      params: z.object({ projectId: Id }),
      body: CreateSheetRequest,
      response: { status: 201, description: 'The new sheet', schema: SheetResponse },
      handler: async ({ deps, user, access, body }) => {
        const sheet = await createSheet(deps.dataSource, grantedProject(access), {
          title: body.title,
          content: body.content ? checkSheetContent(body.content) : undefined,
          createdByUserId: (user as Express.User).id,
        });
        return created({ sheet });
      },
    }),
    defineRoute({
      id: 'sheets.get',
      method: 'get',
      path: '/api/sheets/:sheetId',
      summary: "A sheet with its content, and the caller's role in its organization",
      tag: 'sheets',
      access: { kind: 'permission', action: 'sheet.read', resolve: sheetFromParams },
      params: z.object({ sheetId: Id }),
      response: { status: 200, description: 'The sheet and your role', schema: SheetWithRoleResponse },
      handler: async ({ deps, access }) => {
        const grant = granted(access);
        return ok({ sheet: await sheetDetail(deps.dataSource, grantedSheet(grant).id), role: grant.role });
      },
    }),
    defineRoute({
      id: 'sheets.update',
      method: 'patch',
      path: '/api/sheets/:sheetId',
      summary: 'Rename a sheet or move it to another project of the same organization',
      tag: 'sheets',
      access: { kind: 'permission', action: 'sheet.edit', resolve: sheetFromParams },
      params: z.object({ sheetId: Id }),
      body: UpdateSheetRequest,
      response: { status: 200, description: 'The updated sheet', schema: SheetResponse },
      errors: [409],
      handler: async ({ deps, user, access, body }) =>
        ok({ sheet: await updateSheet(deps.dataSource, grantedSheet(access), body, user?.id ?? null) }),
    }),
    defineRoute({
      id: 'sheets.delete',
      method: 'delete',
      path: '/api/sheets/:sheetId',
      summary: 'Delete a sheet',
      tag: 'sheets',
      access: { kind: 'permission', action: 'sheet.delete', resolve: sheetFromParams },
      params: z.object({ sheetId: Id }),
      response: { status: 204, description: 'Deleted' },
      errors: [409],
      handler: async ({ deps, access }) => {
        await deleteSheet(deps.dataSource, grantedSheet(access).id);
        return noContent();
      },
    }),
  ];
}
