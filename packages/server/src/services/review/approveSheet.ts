import type { DataSource } from 'typeorm';
import type { Person } from '@sheaf/engine/api';
import type { CollabServer } from '../../collab/CollabServer';
import { conflict } from '../../http/ApiError';
import { recordAudit } from '../audit';
import { freezeMaterials, frozenMaterialsLookup } from '../freezeMaterials';
import { contentSha256 } from './canonicalContent';
import { liveSheetContent } from './liveContent';
import { countOpenThreads } from './notes';
import { evaluateOnServer } from './serverResults';
import { assertAssignedChecker } from './workflowTransitions';
import { lockWorkflowRow, personById, type WorkflowRow } from './workflowRow';

export interface ApprovalOutcome {
  sheet: WorkflowRow;
  revision: number;
  preparer: (Person & { email: string }) | undefined;
  approver: Person & { email: string };
}

/**
 * In check -> approved, issuing the next revision: the live content (what the checker read; the
 * sheet has been read-only since it was submitted) is read by the engine's format reader,
 * evaluated on the server, hashed, and written once with who prepared, checked and approved it.
 * The previous revision is superseded by this one (derived, not written). Only the checker the
 * sheet was submitted to approves it, never its preparer; open notes block approval unless an
 * override reason is given, which is recorded with the revision.
 */
export async function approveSheet(
  dataSource: DataSource,
  collab: CollabServer | undefined,
  sheetId: string,
  actor: { userId: string; ip?: string | null },
  input: { overrideReason?: string },
): Promise<ApprovalOutcome> {
  // The content is read before the transaction; it cannot change meanwhile because a sheet in
  // check takes no edits (the status is checked again under the row lock below).
  const live = await liveSheetContent(dataSource, collab, sheetId);
  // The library values the sheet uses are frozen into the revision and it is evaluated with
  // exactly those, so a later edit of the library never changes what was approved.
  const organizationId = await organizationOfSheet(dataSource, sheetId);
  const frozen = Array.isArray(live.cells) ? await freezeMaterials(dataSource, live, organizationId) : {};
  const { content, results } = evaluateOnServer(live, frozenMaterialsLookup(frozen));
  const sha256 = contentSha256(content);

  const outcome = await dataSource.transaction(async (manager) => {
    const row = await lockWorkflowRow(manager, sheetId);
    if (row.status !== 'in-check') throw conflict('only a sheet in check can be approved; submit it for check first');
    await assertAssignedChecker(manager, row, actor.userId, 'approve');
    const openThreads = await countOpenThreads(manager, sheetId);
    if (openThreads > 0 && input.overrideReason === undefined) {
      throw conflict(
        `${openThreads} ${openThreads === 1 ? 'note is' : 'notes are'} still open: resolve ${openThreads === 1 ? 'it' : 'them'}, or give overrideReason to approve over ${openThreads === 1 ? 'it' : 'them'} (the reason is recorded with the revision)`,
      );
    }
    const preparer = row.prepared_by_user_id === null ? undefined : await personById(manager, row.prepared_by_user_id);
    const approver = await personById(manager, actor.userId);
    if (preparer === undefined || approver === undefined || row.submitted_at === null) {
      throw conflict('the preparer of this submission is no longer known; return the sheet and submit it again');
    }
    const number = row.revision + 1;
    await manager.query(
      `INSERT INTO revisions (sheet_id, organization_id, number, title, calc_number, content, results, content_sha256,
                              prepared_by_user_id, prepared_by_name, prepared_at,
                              checked_by_user_id, checked_by_name, checked_at,
                              approved_by_user_id, approved_by_name, approved_at,
                              override_reason, open_notes_at_approval, frozen_materials)
       VALUES ($1, $2, $3, $4, $5, $6::jsonb, $7::jsonb, $8, $9, $10, $11, $12, $13, now(), $12, $13, now(), $14, $15, $16::jsonb)`,
      [
        sheetId,
        row.organization_id,
        number,
        row.title,
        row.calc_number,
        JSON.stringify(content),
        JSON.stringify(results),
        sha256,
        preparer.id,
        preparer.name,
        row.submitted_at,
        approver.id,
        approver.name,
        openThreads > 0 ? (input.overrideReason ?? null) : null,
        openThreads,
        JSON.stringify(frozen),
      ],
    );
    const [updated] = (await manager.query(
      `UPDATE sheets SET status = 'approved', revision = $2, updated_at = now() WHERE id = $1
        RETURNING id, organization_id, title, calc_number, status, revision, prepared_by_user_id, checker_user_id, submitted_at`,
      [sheetId, number],
    )) as [WorkflowRow[], number];
    await recordAudit(manager, {
      action: 'sheet.approved',
      actorUserId: actor.userId,
      organizationId: row.organization_id,
      subject: sheetId,
      ip: actor.ip,
      details: {
        sheetId,
        revision: number,
        contentSha256: sha256,
        openNotes: openThreads,
        overrideReason: openThreads > 0 ? (input.overrideReason ?? null) : null,
        superseded: number > 1 ? number - 1 : null,
      },
    });
    return { sheet: updated[0] as WorkflowRow, revision: number, preparer, approver };
  });
  // Approved sheets take edits again: the first one starts the next revision as a draft.
  await collab?.setSheetLocked(sheetId, false);
  return outcome;
}

async function organizationOfSheet(dataSource: DataSource, sheetId: string): Promise<string> {
  const rows: { organization_id: string }[] = await dataSource.query(`SELECT organization_id FROM sheets WHERE id = $1`, [sheetId]);
  const row = rows[0];
  if (!row) throw conflict('the sheet was deleted while being approved');
  return row.organization_id;
}
