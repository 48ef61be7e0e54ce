import type { DataSource, EntityManager } from 'typeorm';
import { checkTemplateParameters, type TemplateParameter } from '@sheaf/engine';
import type {
  SheetContentV1,
  TemplateDetail,
  TemplateListResponse,
  TemplateSummary,
  TemplateVersionSummary,
} from '@sheaf/engine/api';
import { Template } from '../entities/Template';
import { TemplateVersion } from '../entities/TemplateVersion';
import { ApiError, notFound } from '../http/ApiError';
import { builtinTemplate, builtinTemplates, type BuiltinTemplate } from '../library/builtinLibrary';

/**
 * Templates of an organization, and the built-in ones. An organization template is a head row
 * (`templates`) and its versions (`template_versions`, written once each). Saving a new version
 * never changes the sheets made from an older one: a sheet keeps its own copy of the content and
 * records the template id and version it came from.
 */

export interface TemplateText {
  title: string;
  description: string;
  category: string;
  parameters: TemplateParameter[];
}

function summaryOfBuiltin(t: BuiltinTemplate): TemplateSummary {
  return {
    id: t.id,
    builtin: true,
    title: t.title,
    description: t.description,
    category: t.category,
    version: t.version,
    parameterCount: t.parameters.length,
    updatedAt: null,
  };
}

function matches(t: { title: string; description: string; category: string }, q: string | undefined, category: string | undefined): boolean {
  if (category && t.category.toLowerCase() !== category.toLowerCase()) return false;
  const words = (q ?? '').toLowerCase().split(/\s+/).filter(Boolean);
  const text = `${t.title} ${t.description} ${t.category}`.toLowerCase();
  return words.every((w) => text.includes(w));
}

/** Built-in templates, then the organization's (most recently changed first), searched by words in title, description and category. */
export async function listTemplates(
  dataSource: DataSource,
  organizationId: string,
  filter: { q?: string; category?: string },
): Promise<TemplateListResponse> {
  const rows = await dataSource.query(
    `SELECT t.id, t.title, t.description, t.category, t.current_version, t.updated_at, jsonb_array_length(v.parameters) AS parameter_count
       FROM templates t JOIN template_versions v ON v.template_id = t.id AND v.version = t.current_version
      WHERE t.organization_id = $1
      ORDER BY t.updated_at DESC, t.id`,
    [organizationId],
  );
  const own: TemplateSummary[] = (rows as {
    id: string;
    title: string;
    description: string;
    category: string;
    current_version: number;
    updated_at: Date;
    parameter_count: number;
  }[]).map((r) => ({
    id: r.id,
    builtin: false,
    title: r.title,
    description: r.description,
    category: r.category,
    version: r.current_version,
    parameterCount: r.parameter_count,
    updatedAt: r.updated_at.toISOString(),
  }));
  const all = [...builtinTemplates().map(summaryOfBuiltin), ...own];
  const categories = [...new Set(all.map((t) => t.category))].sort((a, b) => a.localeCompare(b));
  return { templates: all.filter((t) => matches(t, filter.q, filter.category)), categories };
}

/** A template at a version (the latest by default) with all its versions; 404 for another organization's. */
export async function templateDetail(dataSource: DataSource, organizationId: string, templateId: string, version?: number): Promise<TemplateDetail> {
  const builtin = builtinTemplate(templateId);
  if (builtin) {
    if (version !== undefined && version !== builtin.version) throw notFound('template version');
    const versions: TemplateVersionSummary[] = [
      { version: builtin.version, title: builtin.title, category: builtin.category, createdAt: null, createdByName: null, sourceSheetId: null, sourceRevisionId: null },
    ];
    return { ...summaryOfBuiltin(builtin), content: builtin.content, parameters: [...builtin.parameters], versions };
  }
  if (templateId.startsWith('builtin:')) throw notFound('template');
  const head = await dataSource.getRepository(Template).findOneBy({ id: templateId, organizationId });
  if (!head) throw notFound('template');
  const wanted = version ?? head.currentVersion;
  const row = await dataSource.getRepository(TemplateVersion).findOneBy({ templateId, version: wanted });
  if (!row) throw notFound('template version');
  const versionRows: {
    version: number;
    title: string;
    category: string;
    created_at: Date;
    created_by_name: string | null;
    source_sheet_id: string | null;
    source_revision_id: string | null;
  }[] = await dataSource.query(
    `SELECT v.version, v.title, v.category, v.created_at, u.name AS created_by_name, v.source_sheet_id, v.source_revision_id
       FROM template_versions v LEFT JOIN users u ON u.id = v.created_by_user_id
      WHERE v.template_id = $1 ORDER BY v.version DESC`,
    [templateId],
  );
  return {
    id: head.id,
    builtin: false,
    title: row.title,
    description: row.description,
    category: row.category,
    version: row.version,
    parameterCount: row.parameters.length,
    updatedAt: head.updatedAt.toISOString(),
    content: row.content,
    parameters: row.parameters,
    versions: versionRows.map((v) => ({
      version: v.version,
      title: v.title,
      category: v.category,
      createdAt: v.created_at.toISOString(),
      createdByName: v.created_by_name,
      sourceSheetId: v.source_sheet_id,
      sourceRevisionId: v.source_revision_id,
    })),
  };
}

/** 400 naming each parameter field that does not fit the content (`body.parameters[1].max: ...`). */
function assertParameters(content: SheetContentV1, parameters: readonly TemplateParameter[]): void {
  const problems = checkTemplateParameters(content, parameters);
  if (problems.length === 0) return;
  throw new ApiError(400, 'invalid-field', problems.map((p) => `body.${p.message}`).join('; '), {
    details: problems.map((p) => ({ field: `body.${p.field}`, message: `body.${p.message}` })),
  });
}

interface VersionRow {
  templateId: string;
  version: number;
  title: string;
  description: string;
  category: string;
  content: SheetContentV1;
  parameters: readonly TemplateParameter[];
  sourceSheetId: string | null;
  sourceRevisionId: string | null;
  createdByUserId: string;
}

/** Writes one version row (once: a trigger refuses later changes). */
async function insertVersion(manager: EntityManager, row: VersionRow): Promise<void> {
  await manager.query(
    `INSERT INTO template_versions
       (template_id, version, title, description, category, content, parameters, source_sheet_id, source_revision_id, created_by_user_id)
     VALUES ($1, $2, $3, $4, $5, $6::jsonb, $7::jsonb, $8, $9, $10)`,
    [
      row.templateId,
      row.version,
      row.title,
      row.description,
      row.category,
      JSON.stringify(row.content),
      JSON.stringify(row.parameters),
      row.sourceSheetId,
      row.sourceRevisionId,
      row.createdByUserId,
    ],
  );
}

/** The content a template keeps: the sheet's cells and unit system, titled like the template. */
function templateContent(content: SheetContentV1, title: string): SheetContentV1 {
  return { ...content, title };
}

/**
 * Saves content (a sheet's, or an approved revision's) as a new template of the organization,
 * version 1. The parameters must name quantity cells of the content and accept its own values.
 */
export async function createTemplate(
  dataSource: DataSource,
  organizationId: string,
  input: TemplateText & { content: SheetContentV1; sourceSheetId: string | null; sourceRevisionId?: string | null; userId: string },
): Promise<TemplateDetail> {
  const content = templateContent(input.content, input.title);
  assertParameters(content, input.parameters);
  const id = await dataSource.transaction(async (manager) => {
    const head = await manager.save(
      manager.create(Template, {
        organizationId,
        currentVersion: 1,
        title: input.title,
        description: input.description,
        category: input.category,
        createdByUserId: input.userId,
      }),
    );
    await insertVersion(manager, {
      templateId: head.id,
      version: 1,
      title: input.title,
      description: input.description,
      category: input.category,
      content,
      parameters: input.parameters,
      sourceSheetId: input.sourceSheetId,
      sourceRevisionId: input.sourceRevisionId ?? null,
      createdByUserId: input.userId,
    });
    return head.id;
  });
  return templateDetail(dataSource, organizationId, id);
}

/**
 * Saves a new version of an organization template: new text and parameters, and new content when
 * given (else the latest version's). Versions before it stay as they were, and so do the sheets
 * made from them. Built-in templates cannot be edited (403).
 */
export async function saveTemplateVersion(
  dataSource: DataSource,
  organizationId: string,
  templateId: string,
  input: TemplateText & { content?: SheetContentV1; sourceSheetId: string | null; userId: string },
): Promise<TemplateDetail> {
  if (templateId.startsWith('builtin:')) {
    if (builtinTemplate(templateId)) {
      throw new ApiError(403, 'forbidden', 'built-in templates cannot be edited; start a sheet from it and save that sheet as your own template');
    }
    throw notFound('template');
  }
  await dataSource.transaction(async (manager) => {
    // The row lock makes concurrent saves take consecutive version numbers.
    const heads: { current_version: number }[] = await manager.query(
      `SELECT current_version FROM templates WHERE id = $1 AND organization_id = $2 FOR UPDATE`,
      [templateId, organizationId],
    );
    const head = heads[0];
    if (!head) throw notFound('template');
    const latest = await manager.findOneByOrFail(TemplateVersion, { templateId, version: head.current_version });
    const content = templateContent(input.content ?? latest.content, input.title);
    assertParameters(content, input.parameters);
    const version = head.current_version + 1;
    await insertVersion(manager, {
      templateId,
      version,
      title: input.title,
      description: input.description,
      category: input.category,
      content,
      parameters: input.parameters,
      sourceSheetId: input.sourceSheetId ?? latest.sourceSheetId,
      sourceRevisionId: null,
      createdByUserId: input.userId,
    });
    await manager.query(
      `UPDATE templates SET current_version = $2, title = $3, description = $4, category = $5, updated_at = now() WHERE id = $1`,
      [templateId, version, input.title, input.description, input.category],
    );
  });
  return templateDetail(dataSource, organizationId, templateId);
}
