import type { DataSource } from 'typeorm';
import type { HistoryAction, HistoryEvent, SheetHistoryResponse } from '@sheaf/engine/api';
import { HISTORY_ACTIONS } from '@sheaf/engine/api';
import { listRevisions } from './revisions';

interface EventRow {
  id: string;
  occurred_at: Date;
  action: HistoryAction;
  actor_user_id: string | null;
  actor_name: string | null;
  details: Record<string, unknown>;
}

function text(value: unknown): string | null {
  return typeof value === 'string' && value !== '' ? value : null;
}

/** "cell S" by name where the cell has one, else by its id. */
function cellWords(details: Record<string, unknown>): string {
  return `cell ${text(details.cellName) ?? text(details.cellId) ?? '?'}`;
}

/** One line in words for each kind of event. */
function summaryOf(row: EventRow): { summary: string; message: string | null } {
  const d = row.details;
  const revision = typeof d.revision === 'number' ? d.revision : null;
  switch (row.action) {
    case 'sheet.submitted':
      return { summary: `Submitted revision ${revision} for check to ${text(d.checkerName) ?? 'a checker'}`, message: text(d.message) };
    case 'sheet.returned':
      return { summary: `Returned revision ${revision} to the preparer`, message: text(d.message) };
    case 'sheet.approved': {
      const override = typeof d.openNotes === 'number' && d.openNotes > 0 ? ` over ${d.openNotes} open ${d.openNotes === 1 ? 'note' : 'notes'}` : '';
      const superseded = typeof d.superseded === 'number' ? `; revision ${d.superseded} superseded` : '';
      return { summary: `Approved revision ${revision}${override}${superseded}`, message: text(d.overrideReason) };
    }
    case 'sheet.checker-reassigned':
      return { summary: `Reassigned the check to ${text(d.checkerName) ?? 'another checker'}`, message: null };
    case 'sheet.reopened':
      return { summary: `Edited the approved sheet: revision ${revision} started as a draft`, message: null };
    case 'note.created':
      return { summary: `${d.reply === true ? 'Replied to a note' : 'Wrote a note'} on ${cellWords(d)}`, message: text(d.body) };
    case 'note.resolved':
      return { summary: `Resolved the note on ${cellWords(d)}`, message: null };
    case 'note.reopened':
      return { summary: `Reopened the note on ${cellWords(d)}`, message: null };
  }
}

/**
 * A sheet's history: its issued revisions, and every workflow and note event from the audit log
 * (who and when), newest first. The most recent 1000 events are kept in view.
 */
export async function sheetHistory(dataSource: DataSource, sheetId: string): Promise<SheetHistoryResponse> {
  const rows: EventRow[] = await dataSource.query(
    `SELECT e.id::text AS id, e.occurred_at, e.action, e.actor_user_id, u.name AS actor_name, e.details
       FROM audit_events e LEFT JOIN users u ON u.id = e.actor_user_id
      WHERE e.details ? 'sheetId' AND e.details ->> 'sheetId' = $1 AND e.action = ANY($2::text[])
      ORDER BY e.occurred_at DESC, e.id DESC
      LIMIT 1000`,
    [sheetId, [...HISTORY_ACTIONS]],
  );
  const events: HistoryEvent[] = rows.map((row) => ({
    id: row.id,
    at: row.occurred_at.toISOString(),
    action: row.action,
    actor: row.actor_user_id === null ? null : { id: row.actor_user_id, name: row.actor_name ?? '' },
    revision: typeof row.details.revision === 'number' ? row.details.revision : null,
    ...summaryOf(row),
  }));
  return { revisions: await listRevisions(dataSource, sheetId), events };
}
