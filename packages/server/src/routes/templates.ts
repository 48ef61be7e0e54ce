import type { Server } from 'node:http';
import type { Request } from 'express';
import type { DataSource } from 'typeorm';
import { z } from 'zod';
import {
  CreateTemplateRequest,
  Id,
  NewTemplateVersionRequest,
  SheetFromTemplateRequest,
  SheetFromTemplateResponse,
  TemplateId,
  TemplateListResponse,
  TemplateResponse,
  TemplateSearchQuery,
  TemplateVersionQuery,
  type SheetContentV1,
} from '@sheaf/engine/api';
import { organizationFromParams, projectFromParams, sheetFromParams, type AccessGrant } from '../auth/permissions';
import { collabServerOf } from '../collab/upgradeHandlers';
import { Revision } from '../entities/Revision';
import { assertRevisionContentIntact } from '../services/review/revisionIntegrity';
import { Sheet } from '../entities/Sheet';
import { notFound } from '../http/ApiError';
import type { AppDeps } from '../deps';
import { checkSheetContent } from '../services/sheetContent';
import { createSheetFromTemplate } from '../services/sheetFromTemplate';
import { createTemplate, listTemplates, saveTemplateVersion, templateDetail } from '../services/templates';
import { created, defineRoute, ok, type Route } from './defineRoute';

function granted(access: AccessGrant | undefined): AccessGrant {
  if (!access) throw new Error('permission route without an access grant');
  return access;
}

function userOf(user: Express.User | undefined): string {
  if (!user) throw new Error('permission route without a user');
  return user.id;
}

/**
 * The sheet's content as the people editing it see it now (the co-editing room's document when
 * the sheet is open), else as stored; checked by the engine's format reader.
 */
async function currentContent(req: Request, dataSource: DataSource, sheetId: string): Promise<SheetContentV1> {
  const server = (req.socket as { server?: Server }).server;
  const live = server ? await collabServerOf(server)?.liveContent(sheetId) : null;
  if (live) return checkSheetContent(live, 'sheet.content');
  const rows: Array<{ content: unknown }> = await dataSource.query(`SELECT content FROM sheets WHERE id = $1`, [sheetId]);
  if (rows[0] === undefined) throw notFound('sheet');
  return checkSheetContent(rows[0].content, 'sheet.content');
}

async function sheetOfOrganization(deps: AppDeps, organizationId: string, sheetId: string): Promise<Sheet> {
  const sheet = await deps.dataSource.getRepository(Sheet).findOneBy({ id: sheetId, organizationId });
  if (!sheet) throw notFound('sheet');
  return sheet;
}

const TemplateParams = z.object({ orgId: Id, templateId: TemplateId });

/** Templates: the gallery, a template with its versions, save-as-template, new versions, new sheets from a template. */
export function templateRoutes(): Route[] {
  return [
    defineRoute({
      id: 'templates.list',
      method: 'get',
      path: '/api/orgs/:orgId/templates',
      summary: "Built-in templates and the organization's, searched by words and narrowed by category",
      tag: 'templates',
      access: { kind: 'permission', action: 'template.read', resolve: organizationFromParams },
      params: z.object({ orgId: Id }),
      query: TemplateSearchQuery,
      response: { status: 200, description: 'Matching templates and every category', schema: TemplateListResponse },
      handler: async ({ deps, access, query }) => ok(await listTemplates(deps.dataSource, granted(access).organizationId, query)),
    }),
    defineRoute({
      id: 'templates.get',
      method: 'get',
      path: '/api/orgs/:orgId/templates/:templateId',
      summary: 'A template at a version (the latest unless ?version=), with its content, parameters and versions',
      tag: 'templates',
      access: { kind: 'permission', action: 'template.read', resolve: organizationFromParams },
      params: TemplateParams,
      query: TemplateVersionQuery,
      response: { status: 200, description: 'The template', schema: TemplateResponse },
      handler: async ({ deps, access, params, query }) =>
        ok({ template: await templateDetail(deps.dataSource, granted(access).organizationId, params.templateId, query.version) }),
    }),
    defineRoute({
      id: 'templates.createFromSheet',
      method: 'post',
      path: '/api/sheets/:sheetId/templates',
      summary: "Save a sheet's current content as a new template of its organization, naming the quantity cells that are parameters",
      tag: 'templates',
      access: { kind: 'permission', action: 'template.write', resolve: sheetFromParams },
      params: z.object({ sheetId: Id }),
      body: CreateTemplateRequest,
      response: { status: 201, description: 'The new template, version 1', schema: TemplateResponse },
      handler: async ({ req, deps, access, body, user }) => {
        const grant = granted(access);
        const sheet = grant.sheet!;
        const template = await createTemplate(deps.dataSource, grant.organizationId, {
          ...body,
          content: await currentContent(req, deps.dataSource, sheet.id),
          sourceSheetId: sheet.id,
          userId: userOf(user),
        });
        return created({ template });
      },
    }),
    defineRoute({
      id: 'templates.createFromRevision',
      method: 'post',
      path: '/api/sheets/:sheetId/templates/from-revision/:number',
      summary: "Save an approved revision's content as a new template of its organization, naming the quantity cells that are parameters",
      tag: 'templates',
      access: { kind: 'permission', action: 'template.write', resolve: sheetFromParams },
      params: z.object({ sheetId: Id, number: z.coerce.number().int().min(1) }),
      body: CreateTemplateRequest,
      response: { status: 201, description: 'The new template, version 1', schema: TemplateResponse },
      handler: async ({ deps, access, params, body, user }) => {
        const grant = granted(access);
        const sheet = grant.sheet!;
        const revision = await deps.dataSource.getRepository(Revision).findOneBy({ sheetId: sheet.id, number: params.number });
        if (!revision) throw notFound('revision');
        assertRevisionContentIntact(revision);
        const template = await createTemplate(deps.dataSource, grant.organizationId, {
          ...body,
          content: checkSheetContent(revision.content, 'revision.content'),
          sourceSheetId: sheet.id,
          sourceRevisionId: revision.id,
          userId: userOf(user),
        });
        return created({ template });
      },
    }),
    defineRoute({
      id: 'templates.newVersion',
      method: 'post',
      path: '/api/orgs/:orgId/templates/:templateId/versions',
      summary: 'Save a new version of a template (new text and parameters, and a sheet’s content when sheetId is given); older versions and their sheets stay as they were',
      tag: 'templates',
      access: { kind: 'permission', action: 'template.write', resolve: organizationFromParams },
      params: TemplateParams,
      body: NewTemplateVersionRequest,
      response: { status: 201, description: 'The template at its new version', schema: TemplateResponse },
      handler: async ({ req, deps, access, params, body, user }) => {
        const organizationId = granted(access).organizationId;
        const sheet = body.sheetId ? await sheetOfOrganization(deps, organizationId, body.sheetId) : null;
        const template = await saveTemplateVersion(deps.dataSource, organizationId, params.templateId, {
          title: body.title,
          description: body.description,
          category: body.category,
          parameters: body.parameters,
          content: sheet ? await currentContent(req, deps.dataSource, sheet.id) : undefined,
          sourceSheetId: sheet?.id ?? null,
          userId: userOf(user),
        });
        return created({ template });
      },
    }),
    defineRoute({
      id: 'sheets.createFromTemplate',
      method: 'post',
      path: '/api/projects/:projectId/sheets/from-template',
      summary: 'Create a sheet in a project from a template version, with parameter values checked against their units and ranges',
      tag: 'sheets',
      access: { kind: 'permission', action: 'sheet.create', resolve: projectFromParams },
      params: z.object({ projectId: Id }),
      body: SheetFromTemplateRequest,
      response: { status: 201, description: 'The new sheet and the template version it came from', schema: SheetFromTemplateResponse },
      handler: async ({ deps, access, body, user }) => {
        const project = granted(access).project;
        if (!project) throw new Error('project route without its project');
        return created(await createSheetFromTemplate(deps.dataSource, project, body, userOf(user)));
      },
    }),
  ];
}
