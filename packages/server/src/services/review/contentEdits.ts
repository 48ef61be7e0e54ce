import type { EntityManager } from 'typeorm';
import { conflict } from '../../http/ApiError';
import { recordAudit } from '../audit';
import { lockWorkflowRow } from './workflowRow';

/**
 * The rule every REST path that changes a sheet's content (its title included) follows, inside
 * its transaction: a sheet in check takes no edits (409); the first edit of an approved sheet
 * starts its next revision as a draft. The co-editing log applies the same rule to live edits
 * (see collab/sheetPersistence.ts).
 */
export async function beginContentEdit(manager: EntityManager, sheetId: string, actorUserId: string | null): Promise<void> {
  const row = await lockWorkflowRow(manager, sheetId);
  if (row.status === 'in-check') {
    throw conflict('the sheet is in check and read-only until the checker returns it');
  }
  if (row.status === 'approved') {
    await manager.query(`UPDATE sheets SET status = 'draft', updated_at = now() WHERE id = $1`, [sheetId]);
    await recordAudit(manager, {
      action: 'sheet.reopened',
      actorUserId,
      organizationId: row.organization_id,
      subject: sheetId,
      details: { sheetId, from: 'approved', to: 'draft', revision: row.revision + 1 },
    });
  }
}

/**
 * A sheet may be deleted only while nothing has been issued from it and it is not with a
 * checker: issued revisions are kept for good (409 otherwise).
 */
export async function assertDeletable(manager: EntityManager, sheetId: string): Promise<void> {
  const row = await lockWorkflowRow(manager, sheetId);
  if (row.status === 'in-check') throw conflict('the sheet is in check; the checker returns it before it can be deleted');
  if (row.revision > 0) {
    throw conflict(`revision ${row.revision} of this sheet is issued; issued calculations are kept, so the sheet cannot be deleted`);
  }
}
