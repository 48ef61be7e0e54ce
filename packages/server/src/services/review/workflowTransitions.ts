import type { DataSource } from 'typeorm';
import type { Person } from '@sheaf/engine/api';
import type { CollabServer } from '../../collab/CollabServer';
import { conflict, forbidden } from '../../http/ApiError';
import { recordAudit } from '../audit';
import { currentRevisionOf, eligibleChecker, lockWorkflowRow, personById, type WorkflowRow } from './workflowRow';

/** What the mail and the caller need to know after a transition. */
export interface TransitionOutcome {
  sheet: WorkflowRow;
  revision: number;
  actor: Person & { email: string };
  /** The member the sheet now waits on (checker after submit or reassign, preparer after return). */
  counterpart: (Person & { email: string }) | undefined;
  /** The preparer's name, for a reassignment's mail. */
  preparerName?: string;
}

interface Actor {
  userId: string;
  ip?: string | null;
}

async function actorPerson(dataSource: DataSource, userId: string): Promise<Person & { email: string }> {
  const person = await personById(dataSource.manager, userId);
  if (person === undefined) throw new Error(`user ${userId} vanished during a sheet transition`);
  return person;
}

/**
 * Draft -> in check: the caller becomes the preparer and names the checker (a member whose role
 * allows `sheet.check`, never the preparer). From then until the checker returns or approves it,
 * the sheet is read-only for everyone: open rooms lock, and the update log refuses edits.
 */
export async function submitForCheck(
  dataSource: DataSource,
  collab: CollabServer | undefined,
  sheetId: string,
  actor: Actor,
  input: { checkerUserId: string; message?: string },
): Promise<TransitionOutcome> {
  const outcome = await dataSource.transaction(async (manager) => {
    const row = await lockWorkflowRow(manager, sheetId);
    if (row.status === 'in-check') throw conflict('the sheet is already in check; the checker returns or approves it first');
    if (row.status === 'approved') {
      throw conflict(`revision ${row.revision} is already approved; edit the sheet to start revision ${row.revision + 1}, then submit that`);
    }
    const checker = await eligibleChecker(manager, row.organization_id, input.checkerUserId, actor.userId);
    const [updated] = (await manager.query(
      `UPDATE sheets SET status = 'in-check', prepared_by_user_id = $2, checker_user_id = $3, submitted_at = now(), updated_at = now()
        WHERE id = $1 RETURNING id, organization_id, title, calc_number, status, revision, prepared_by_user_id, checker_user_id, submitted_at`,
      [sheetId, actor.userId, checker.id],
    )) as [WorkflowRow[], number];
    const sheet = updated[0] as WorkflowRow;
    const revision = currentRevisionOf(sheet);
    await recordAudit(manager, {
      action: 'sheet.submitted',
      actorUserId: actor.userId,
      organizationId: row.organization_id,
      subject: sheetId,
      ip: actor.ip,
      details: { sheetId, revision, checkerUserId: checker.id, checkerName: checker.name, message: input.message || null },
    });
    return { sheet, revision, counterpart: checker };
  });
  // Locked after the commit: from the commit on, the log refuses edits whether or not a room is open.
  await collab?.setSheetLocked(sheetId, true);
  return { ...outcome, actor: await actorPerson(dataSource, actor.userId) };
}

/** In check -> draft: only the checker the sheet was submitted to returns it, with a message. */
export async function returnSheet(
  dataSource: DataSource,
  collab: CollabServer | undefined,
  sheetId: string,
  actor: Actor,
  input: { message: string },
): Promise<TransitionOutcome> {
  const outcome = await dataSource.transaction(async (manager) => {
    const row = await lockWorkflowRow(manager, sheetId);
    if (row.status !== 'in-check') throw conflict(`the sheet is ${row.status === 'approved' ? 'approved' : 'a draft'}, not in check; there is nothing to return`);
    await assertAssignedChecker(manager, row, actor.userId, 'return');
    const [updated] = (await manager.query(
      `UPDATE sheets SET status = 'draft', updated_at = now() WHERE id = $1
        RETURNING id, organization_id, title, calc_number, status, revision, prepared_by_user_id, checker_user_id, submitted_at`,
      [sheetId],
    )) as [WorkflowRow[], number];
    const sheet = updated[0] as WorkflowRow;
    const revision = currentRevisionOf(sheet);
    await recordAudit(manager, {
      action: 'sheet.returned',
      actorUserId: actor.userId,
      organizationId: row.organization_id,
      subject: sheetId,
      ip: actor.ip,
      details: { sheetId, revision, message: input.message },
    });
    const preparer = row.prepared_by_user_id === null ? undefined : await personById(manager, row.prepared_by_user_id);
    return { sheet, revision, counterpart: preparer };
  });
  await collab?.setSheetLocked(sheetId, false);
  return { ...outcome, actor: await actorPerson(dataSource, actor.userId) };
}

/** Owners name another checker for a sheet in check (never its preparer). */
export async function reassignChecker(
  dataSource: DataSource,
  sheetId: string,
  actor: Actor,
  input: { checkerUserId: string },
): Promise<TransitionOutcome> {
  const outcome = await dataSource.transaction(async (manager) => {
    const row = await lockWorkflowRow(manager, sheetId);
    if (row.status !== 'in-check') throw conflict('only a sheet in check has a checker to replace');
    const checker = await eligibleChecker(manager, row.organization_id, input.checkerUserId, row.prepared_by_user_id ?? '');
    const [updated] = (await manager.query(
      `UPDATE sheets SET checker_user_id = $2, updated_at = now() WHERE id = $1
        RETURNING id, organization_id, title, calc_number, status, revision, prepared_by_user_id, checker_user_id, submitted_at`,
      [sheetId, checker.id],
    )) as [WorkflowRow[], number];
    const sheet = updated[0] as WorkflowRow;
    const revision = currentRevisionOf(sheet);
    await recordAudit(manager, {
      action: 'sheet.checker-reassigned',
      actorUserId: actor.userId,
      organizationId: row.organization_id,
      subject: sheetId,
      ip: actor.ip,
      details: { sheetId, revision, fromUserId: row.checker_user_id, checkerUserId: checker.id, checkerName: checker.name },
    });
    const preparer = row.prepared_by_user_id === null ? undefined : await personById(manager, row.prepared_by_user_id);
    return { sheet, revision, counterpart: checker, preparerName: preparer?.name };
  });
  return { ...outcome, actor: await actorPerson(dataSource, actor.userId) };
}

/** 403 unless the caller is the checker the sheet is with (who is never its preparer). */
export async function assertAssignedChecker(
  manager: Parameters<typeof personById>[0],
  row: WorkflowRow,
  userId: string,
  verb: 'return' | 'approve',
): Promise<void> {
  if (row.prepared_by_user_id === userId) throw forbidden(`you prepared this sheet; nobody may ${verb} a sheet they prepared`);
  if (row.checker_user_id !== userId) {
    const checker = row.checker_user_id === null ? undefined : await personById(manager, row.checker_user_id);
    throw forbidden(
      `only the checker this sheet was submitted to (${checker?.name ?? 'nobody'}) may ${verb} it; an owner can reassign the checker`,
    );
  }
}
