import type { DataSource } from 'typeorm';
import type { CheckerCandidate, Person, ReturnNotice, ReviewState, Role, Signatures } from '@sheaf/engine/api';
import { can, PERMISSIONS } from '@sheaf/engine/api';
import { notFound } from '../../http/ApiError';
import { countOpenThreads } from './notes';
import { assertRevisionsIntact, integrityColumns, type IntegrityFields } from './revisionIntegrity';
import { currentRevisionOf, type WorkflowRow } from './workflowRow';

interface StateRow extends WorkflowRow {
  preparer_name: string | null;
  checker_name: string | null;
}

const CHECK_ROLES = (Object.keys(PERMISSIONS) as Role[]).filter((role) => can(role, 'sheet.check'));

function person(id: string | null, name: string | null): Person | null {
  return id === null ? null : { id, name: name ?? '' };
}

/**
 * Where a sheet stands in the check workflow, as `userId` (whose role is `role`) sees it: status,
 * preparer and checker, open notes, the signatures of the current revision, the checker's last
 * return message, who may be named checker, and which actions the caller may take now (the
 * permission table and the per-sheet rules together; the server checks them again on each action).
 */
export async function reviewState(dataSource: DataSource, sheetId: string, userId: string, role: Role): Promise<ReviewState> {
  const rows: StateRow[] = await dataSource.query(
    `SELECT s.id, s.organization_id, s.title, s.calc_number, s.status, s.revision, s.prepared_by_user_id, s.checker_user_id,
            s.submitted_at, p.name AS preparer_name, c.name AS checker_name
       FROM sheets s LEFT JOIN users p ON p.id = s.prepared_by_user_id LEFT JOIN users c ON c.id = s.checker_user_id
      WHERE s.id = $1`,
    [sheetId],
  );
  const row = rows[0];
  if (row === undefined) throw notFound('sheet');
  const currentRevision = currentRevisionOf(row);
  // Independent reads, side by side.
  const [openNotes, candidates, signatures, returned] = await Promise.all([
    countOpenThreads(dataSource.manager, sheetId),
    dataSource.query(
      `SELECT u.id, u.name, m.role FROM memberships m JOIN users u ON u.id = m.user_id
        WHERE m.organization_id = $1 AND m.role = ANY($2::text[]) ORDER BY lower(u.name), u.id`,
      [row.organization_id, CHECK_ROLES],
    ) as Promise<CheckerCandidate[]>,
    signaturesOf(dataSource, row),
    row.status === 'draft' ? lastReturn(dataSource, sheetId, currentRevision) : Promise.resolve(null),
  ]);
  const inCheck = row.status === 'in-check';
  const isChecker = inCheck && row.checker_user_id === userId && row.prepared_by_user_id !== userId;
  return {
    sheetId,
    status: row.status,
    issuedRevision: row.revision,
    currentRevision,
    preparer: person(row.prepared_by_user_id, row.preparer_name),
    checker: person(row.checker_user_id, row.checker_name),
    submittedAt: row.submitted_at?.toISOString() ?? null,
    openNotes,
    signatures,
    lastReturn: returned,
    checkerCandidates: candidates,
    can: {
      submit: can(role, 'sheet.submit') && row.status === 'draft' && candidates.some((c) => c.id !== userId),
      return: can(role, 'sheet.return') && isChecker,
      approve: can(role, 'sheet.approve') && isChecker,
      reassignChecker: can(role, 'sheet.reassignChecker') && inCheck,
      createNotes: can(role, 'note.create'),
      resolveNotes: can(role, 'note.resolve'),
    },
  };
}

/**
 * Title block signatures of the current revision: the issued one's when approved; while in
 * check, the preparer's (the checker has not signed yet); nothing for a draft in preparation.
 */
async function signaturesOf(dataSource: DataSource, row: StateRow): Promise<Signatures> {
  if (row.status === 'approved' && row.revision > 0) {
    const revisions: Array<IntegrityFields & {
      prepared_by_user_id: string;
      prepared_by_name: string;
      prepared_at: Date;
      checked_by_user_id: string;
      checked_by_name: string;
      checked_at: Date;
      approved_by_user_id: string;
      approved_by_name: string;
      approved_at: Date;
    }> = await dataSource.query(
      `SELECT number, prepared_by_user_id, prepared_by_name, prepared_at, checked_by_user_id, checked_by_name, checked_at,
              approved_by_user_id, approved_by_name, approved_at, ${integrityColumns('r')}
         FROM revisions r WHERE sheet_id = $1 AND number = $2`,
      [row.id, row.revision],
    );
    const r = revisions[0];
    if (r !== undefined) {
      // Signatures of an approved revision are shown only while its content matches its hash.
      await assertRevisionsIntact(dataSource, [r]);
      return {
        prepared: { user: { id: r.prepared_by_user_id, name: r.prepared_by_name }, at: r.prepared_at.toISOString() },
        checked: { user: { id: r.checked_by_user_id, name: r.checked_by_name }, at: r.checked_at.toISOString() },
        approved: { user: { id: r.approved_by_user_id, name: r.approved_by_name }, at: r.approved_at.toISOString() },
      };
    }
  }
  if (row.status === 'in-check' && row.prepared_by_user_id !== null && row.submitted_at !== null) {
    return {
      prepared: { user: { id: row.prepared_by_user_id, name: row.preparer_name ?? '' }, at: row.submitted_at.toISOString() },
      checked: null,
      approved: null,
    };
  }
  return { prepared: null, checked: null, approved: null };
}

/** The checker's message when they last returned the revision in preparation, if they did. */
async function lastReturn(dataSource: DataSource, sheetId: string, revision: number): Promise<ReturnNotice | null> {
  const rows: Array<{ occurred_at: Date; actor_user_id: string | null; name: string | null; message: string | null }> = await dataSource.query(
    `SELECT e.occurred_at, e.actor_user_id, u.name, e.details ->> 'message' AS message
       FROM audit_events e LEFT JOIN users u ON u.id = e.actor_user_id
      WHERE e.details ? 'sheetId' AND e.details ->> 'sheetId' = $1 AND e.action = 'sheet.returned'
        AND (e.details ->> 'revision')::int = $2
      ORDER BY e.occurred_at DESC, e.id DESC LIMIT 1`,
    [sheetId, revision],
  );
  const row = rows[0];
  if (row === undefined || row.actor_user_id === null) return null;
  return { by: { id: row.actor_user_id, name: row.name ?? '' }, at: row.occurred_at.toISOString(), message: row.message ?? '' };
}
