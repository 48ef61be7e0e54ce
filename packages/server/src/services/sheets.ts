import type { DataSource } from 'typeorm';
import type { SheetContentV1, SheetDetail, SheetStatus, SheetSummary } from '@sheaf/engine/api';
import { Project } from '../entities/Project';
import { Sheet } from '../entities/Sheet';
import { invalidField } from '../http/ApiError';
import { assertDeletable, beginContentEdit } from './review/contentEdits';

interface SummaryRow {
  id: string;
  title: string;
  calc_number: string;
  status: SheetStatus;
  project_id: string;
  project_name: string;
  updated_at: Date;
  revision: number;
}

const SUMMARY_COLUMNS = `s.id, s.title, s.calc_number, s.status, s.project_id, p.name AS project_name, s.updated_at, s.revision`;

function toSummary(row: SummaryRow): SheetSummary {
  return {
    id: row.id,
    title: row.title,
    calcNumber: row.calc_number,
    status: row.status,
    projectId: row.project_id,
    projectName: row.project_name,
    updatedAt: row.updated_at.toISOString(),
    revision: row.revision,
  };
}

/** An empty sheet in the file format, version 1. */
export function emptySheetContent(title: string): SheetContentV1 {
  return { format: 'sheaf-sheet', version: 1, title, unitSystem: 'SI', cells: [] };
}

/** `GBL` and 7 give `GBL-007`. */
export function formatCalcNumber(projectCode: string, sequence: number): string {
  return `${projectCode}-${String(sequence).padStart(3, '0')}`;
}

function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

export interface SheetFilter {
  organizationId: string;
  projectId?: string;
  /** Words searched in the title and the calc number, case-insensitive. */
  q?: string;
  status?: SheetStatus;
}

/** Sheets matching the filter, most recently changed first. */
export async function listSheets(dataSource: DataSource, filter: SheetFilter): Promise<SheetSummary[]> {
  const where = ['s.organization_id = $1'];
  const values: unknown[] = [filter.organizationId];
  if (filter.projectId) {
    values.push(filter.projectId);
    where.push(`s.project_id = $${values.length}`);
  }
  if (filter.status) {
    values.push(filter.status);
    where.push(`s.status = $${values.length}`);
  }
  for (const word of (filter.q ?? '').split(/\s+/).filter(Boolean).slice(0, 8)) {
    values.push(likePattern(word));
    where.push(`(s.title ILIKE $${values.length} OR s.calc_number ILIKE $${values.length})`);
  }
  const rows: SummaryRow[] = await dataSource.query(
    `SELECT ${SUMMARY_COLUMNS} FROM sheets s JOIN projects p ON p.id = s.project_id
      WHERE ${where.join(' AND ')}
      ORDER BY s.updated_at DESC, s.id
      LIMIT 500`,
    values,
  );
  return rows.map(toSummary);
}

/** The full sheet, with its project's name. */
export async function sheetDetail(dataSource: DataSource, sheetId: string): Promise<SheetDetail> {
  const rows: (SummaryRow & { content: SheetContentV1; template_id: string | null; template_version: number | null })[] = await dataSource.query(
    `SELECT ${SUMMARY_COLUMNS}, s.content, s.template_id, s.template_version FROM sheets s JOIN projects p ON p.id = s.project_id WHERE s.id = $1`,
    [sheetId],
  );
  const row = rows[0];
  if (!row) throw new Error(`sheet ${sheetId} vanished while being read`);
  const template = row.template_id === null || row.template_version === null ? null : { id: row.template_id, version: row.template_version };
  return { ...toSummary(row), content: row.content, template };
}

/**
 * Creates a sheet in a project under the project's next calc number (`GBL-004`). The content's
 * title follows the sheet's title. `template` records the template id and version it was made from.
 */
export async function createSheet(
  dataSource: DataSource,
  project: Project,
  input: { title: string; content?: SheetContentV1; createdByUserId: string; template?: { id: string; version: number } },
): Promise<SheetDetail> {
  const id = await dataSource.transaction(async (manager) => {
    // Taking the number and inserting in one transaction keeps calc numbers gap-free under concurrency.
    // TypeORM answers an UPDATE with [rows, count].
    const [next]: [{ seq: number; code: string }[], number] = await manager.query(
      `UPDATE projects SET next_calc_seq = next_calc_seq + 1 WHERE id = $1 RETURNING next_calc_seq - 1 AS seq, code`,
      [project.id],
    );
    const allocated = next[0];
    if (!allocated) throw new Error(`project ${project.id} vanished while adding a sheet`);
    const content = { ...(input.content ?? emptySheetContent(input.title)), title: input.title };
    const inserted: { id: string }[] = await manager.query(
      `INSERT INTO sheets (organization_id, project_id, title, calc_number, content, created_by_user_id, template_id, template_version)
       VALUES ($1, $2, $3, $4, $5::jsonb, $6, $7, $8) RETURNING id`,
      [
        project.organizationId,
        project.id,
        input.title,
        formatCalcNumber(allocated.code, allocated.seq),
        JSON.stringify(content),
        input.createdByUserId,
        input.template?.id ?? null,
        input.template?.version ?? null,
      ],
    );
    return inserted[0]?.id as string;
  });
  return sheetDetail(dataSource, id);
}

/**
 * Renames a sheet and/or moves it to another project of the same organization (400 naming
 * `projectId` otherwise). The calc number stays with the sheet.
 */
export async function updateSheet(
  dataSource: DataSource,
  sheet: Pick<Sheet, 'id' | 'title' | 'projectId' | 'organizationId'>,
  changes: { title?: string; projectId?: string },
  actorUserId: string | null = null,
): Promise<SheetDetail> {
  await dataSource.transaction(async (manager) => {
    // The title is part of the content: renaming follows the check workflow's edit rule.
    if (changes.title !== undefined && changes.title !== sheet.title) await beginContentEdit(manager, sheet.id, actorUserId);
    if (changes.projectId !== undefined && changes.projectId !== sheet.projectId) {
      const target = await manager.findOneBy(Project, { id: changes.projectId, organizationId: sheet.organizationId });
      if (!target) throw invalidField('projectId', "no project with this id in the sheet's organization");
      await manager.update(Sheet, { id: sheet.id }, { projectId: target.id });
    }
    if (changes.title !== undefined && changes.title !== sheet.title) {
      await manager.query(
        `UPDATE sheets SET title = $2, content = jsonb_set(content, '{title}', to_jsonb($3::text)), updated_at = now() WHERE id = $1`,
        [sheet.id, changes.title, changes.title],
      );
    }
  });
  return sheetDetail(dataSource, sheet.id);
}

export async function deleteSheet(dataSource: DataSource, sheetId: string): Promise<void> {
  await dataSource.transaction(async (manager) => {
    await assertDeletable(manager, sheetId);
    await manager.getRepository(Sheet).delete({ id: sheetId });
  });
}
