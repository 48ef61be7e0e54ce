import type { EntityManager } from 'typeorm';
import type { Person, Role, SheetStatus } from '@sheaf/engine/api';
import { can } from '@sheaf/engine/api';
import { invalidField, notFound } from '../../http/ApiError';

/** The workflow columns of a sheet, read under a row lock inside a transition's transaction. */
export interface WorkflowRow {
  id: string;
  organization_id: string;
  title: string;
  calc_number: string;
  status: SheetStatus;
  /** Number of the latest issued revision (0 before the first). */
  revision: number;
  prepared_by_user_id: string | null;
  checker_user_id: string | null;
  submitted_at: Date | null;
}

/**
 * Reads a sheet's workflow state and locks its row until the transaction ends, so two
 * transitions (a return and an approval, say) cannot both start from the same status.
 */
export async function lockWorkflowRow(manager: EntityManager, sheetId: string): Promise<WorkflowRow> {
  const rows: WorkflowRow[] = await manager.query(
    `SELECT id, organization_id, title, calc_number, status, revision, prepared_by_user_id, checker_user_id, submitted_at
       FROM sheets WHERE id = $1 FOR UPDATE`,
    [sheetId],
  );
  const row = rows[0];
  if (row === undefined) throw notFound('sheet');
  return row;
}

/** The revision a status is about: the issued one when approved, else the one in preparation. */
export function currentRevisionOf(row: Pick<WorkflowRow, 'status' | 'revision'>): number {
  return row.status === 'approved' ? row.revision : row.revision + 1;
}

/** A member of the organization with their role, or undefined. */
export async function memberPerson(
  manager: EntityManager,
  organizationId: string,
  userId: string,
): Promise<(Person & { role: Role; email: string }) | undefined> {
  const rows: Array<{ id: string; name: string; email: string; role: Role }> = await manager.query(
    `SELECT u.id, u.name, u.email, m.role FROM memberships m JOIN users u ON u.id = m.user_id
      WHERE m.organization_id = $1 AND m.user_id = $2`,
    [organizationId, userId],
  );
  return rows[0];
}

/** A user by id (member or not any more), for names in mail and signatures. */
export async function personById(manager: EntityManager, userId: string): Promise<(Person & { email: string }) | undefined> {
  const rows: Array<{ id: string; name: string; email: string }> = await manager.query(`SELECT id, name, email FROM users WHERE id = $1`, [userId]);
  return rows[0];
}

/**
 * Checks that `checkerUserId` may check this sheet: a member whose role allows `sheet.check`,
 * and not the preparer. 400 naming `checkerUserId` otherwise.
 */
export async function eligibleChecker(
  manager: EntityManager,
  organizationId: string,
  checkerUserId: string,
  preparerUserId: string,
): Promise<Person & { role: Role; email: string }> {
  if (checkerUserId === preparerUserId) {
    throw invalidField('checkerUserId', 'the preparer cannot check their own sheet; name another member');
  }
  const checker = await memberPerson(manager, organizationId, checkerUserId);
  if (checker === undefined) throw invalidField('checkerUserId', "not a member of this sheet's organization");
  if (!can(checker.role, 'sheet.check')) {
    throw invalidField('checkerUserId', `${checker.name} is a ${checker.role}, and that role may not check sheets`);
  }
  return checker;
}
