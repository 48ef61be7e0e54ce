import type { DataSource } from 'typeorm';
import { diffRevisions, type MachineOutput, type RevisionSnapshot } from '@sheaf/engine';
import type { FrozenMaterials, RevisionDetail, RevisionDiffResponse, RevisionSummary, SheetContentV1 } from '@sheaf/engine/api';
import type { CollabServer } from '../../collab/CollabServer';
import { notFound } from '../../http/ApiError';
import { materialsLookupFor } from '../materials';
import { assertRevisionsIntact, integrityColumns, type IntegrityFields } from './revisionIntegrity';
import { liveSheetContent } from './liveContent';
import { evaluateOnServer } from './serverResults';
import { currentRevisionOf, type WorkflowRow } from './workflowRow';

interface RevisionRow extends IntegrityFields {
  number: number;
  title: string;
  content_sha256: string;
  prepared_by_user_id: string;
  prepared_by_name: string;
  prepared_at: Date;
  checked_by_user_id: string;
  checked_by_name: string;
  checked_at: Date;
  approved_by_user_id: string;
  approved_by_name: string;
  approved_at: Date;
  override_reason: string | null;
  open_notes_at_approval: number;
  superseded_at: Date | null;
}

// A revision is superseded by the next one of the same sheet: when that was approved.
const SUMMARY_COLUMNS = `number, title, content_sha256, prepared_by_user_id, prepared_by_name, prepared_at,
  checked_by_user_id, checked_by_name, checked_at, approved_by_user_id, approved_by_name, approved_at,
  override_reason, open_notes_at_approval,
  (SELECT n.approved_at FROM revisions n WHERE n.sheet_id = r.sheet_id AND n.number = r.number + 1) AS superseded_at,
  ${integrityColumns('r')}`;

function toSummary(row: RevisionRow): RevisionSummary {
  return {
    number: row.number,
    status: row.superseded_at === null ? 'approved' : 'superseded',
    title: row.title,
    contentSha256: row.content_sha256,
    prepared: { user: { id: row.prepared_by_user_id, name: row.prepared_by_name }, at: row.prepared_at.toISOString() },
    checked: { user: { id: row.checked_by_user_id, name: row.checked_by_name }, at: row.checked_at.toISOString() },
    approved: { user: { id: row.approved_by_user_id, name: row.approved_by_name }, at: row.approved_at.toISOString() },
    supersededAt: row.superseded_at?.toISOString() ?? null,
    overrideReason: row.override_reason,
    openNotesAtApproval: row.open_notes_at_approval,
  };
}

/** A sheet's issued revisions, newest first; each checked against its recorded hash. */
export async function listRevisions(dataSource: DataSource, sheetId: string): Promise<RevisionSummary[]> {
  const rows: RevisionRow[] = await dataSource.query(
    `SELECT ${SUMMARY_COLUMNS} FROM revisions r WHERE r.sheet_id = $1 ORDER BY r.number DESC`,
    [sheetId],
  );
  await assertRevisionsIntact(dataSource, rows);
  return rows.map(toSummary);
}

/**
 * One issued revision with its content and results, checked against its recorded hash; 404 when
 * the sheet has no such revision.
 */
export async function revisionDetail(dataSource: DataSource, sheetId: string, number: number): Promise<RevisionDetail> {
  const rows: Array<RevisionRow & { content: SheetContentV1; results: MachineOutput; frozen_materials: FrozenMaterials }> = await dataSource.query(
    `SELECT ${SUMMARY_COLUMNS}, content, results, frozen_materials FROM revisions r WHERE r.sheet_id = $1 AND r.number = $2`,
    [sheetId, number],
  );
  const row = rows[0];
  if (row === undefined) throw notFound(`revision ${number}`);
  await assertRevisionsIntact(dataSource, [row]);
  return { ...toSummary(row), content: row.content, results: row.results as RevisionDetail['results'], materials: row.frozen_materials };
}

/**
 * The diff between revision `from` and revision `to` of a sheet, or (`to = 'current'`) the sheet
 * as it is now, evaluated on the server and numbered as the revision it would be issued as.
 */
export async function revisionDiff(
  dataSource: DataSource,
  collab: CollabServer | undefined,
  sheet: Pick<WorkflowRow, 'id' | 'status' | 'revision'>,
  from: number,
  to: number | 'current',
): Promise<RevisionDiffResponse> {
  const older = await revisionDetail(dataSource, sheet.id, from);
  let newerSnapshot: RevisionSnapshot;
  let newer: RevisionSummary | null = null;
  if (to === 'current') {
    // The sheet as it is now is evaluated with the organization's library as it is now.
    const owner: { organization_id: string }[] = await dataSource.query(`SELECT organization_id FROM sheets WHERE id = $1`, [sheet.id]);
    const materials = owner[0] ? await materialsLookupFor(dataSource, owner[0].organization_id) : undefined;
    const { content, results } = evaluateOnServer(await liveSheetContent(dataSource, collab, sheet.id), materials);
    newerSnapshot = { number: currentRevisionOf(sheet), content, results };
  } else {
    const detail = await revisionDetail(dataSource, sheet.id, to);
    newer = detail;
    newerSnapshot = { number: detail.number, content: detail.content, results: detail.results as MachineOutput };
  }
  const diff = diffRevisions({ number: older.number, content: older.content, results: older.results as MachineOutput }, newerSnapshot);
  // The engine's diff is deeply readonly; the response schema (checked in development) has the same shape.
  return { diff: diff as RevisionDiffResponse['diff'], from: stripDetail(older), to: newer === null ? null : stripDetail(newer as RevisionDetail) };
}

function stripDetail(detail: RevisionDetail): RevisionSummary {
  const { content: _content, results: _results, materials: _materials, ...summary } = detail;
  return summary;
}
