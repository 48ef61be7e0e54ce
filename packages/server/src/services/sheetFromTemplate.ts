import type { DataSource } from 'typeorm';
import { applyTemplateParameters } from '@sheaf/engine';
import type { SheetDetail } from '@sheaf/engine/api';
import type { Project } from '../entities/Project';
import { ApiError } from '../http/ApiError';
import { checkSheetContent } from './sheetContent';
import { createSheet } from './sheets';
import { templateDetail } from './templates';

/**
 * A new sheet in a project from a template version (the latest when none is given): the
 * parameter values replace the `expr` of the template's parameter cells, after each value is
 * checked against the parameter's unit (dimension) and range. The sheet records the template id
 * and version. 400 names each bad value (`body.parameters.t: ...`); nothing is created then.
 */
export async function createSheetFromTemplate(
  dataSource: DataSource,
  project: Project,
  input: { templateId: string; version?: number; title: string; parameters: Record<string, string> },
  userId: string,
): Promise<{ sheet: SheetDetail; template: { id: string; version: number } }> {
  const template = await templateDetail(dataSource, project.organizationId, input.templateId, input.version);
  const known = new Set(template.parameters.map((p) => p.name));
  const problems: { field: string; message: string }[] = Object.keys(input.parameters)
    .filter((name) => !known.has(name))
    .map((name) => ({ field: `parameters.${name}`, message: `parameters.${name}: not a parameter of this template (its parameters: ${[...known].join(', ')})` }));
  const outcome = applyTemplateParameters(template.content, template.parameters, input.parameters);
  if (!outcome.ok) problems.push(...outcome.problems);
  if (problems.length > 0 || !outcome.ok) {
    throw new ApiError(400, 'invalid-field', problems.map((p) => `body.${p.message}`).join('; '), {
      details: problems.map((p) => ({ field: `body.${p.field}`, message: `body.${p.message}` })),
    });
  }
  const content = checkSheetContent(outcome.content);
  const origin = { id: template.id, version: template.version };
  const sheet = await createSheet(dataSource, project, { title: input.title, content, createdByUserId: userId, template: origin });
  return { sheet, template: origin };
}
