import type { DataSource, EntityManager } from 'typeorm';
import type { Note as ApiNote, NoteThread, Person } from '@sheaf/engine/api';
import { conflict, invalidField, notFound } from '../../http/ApiError';
import { recordAudit } from '../audit';
import { findMentions, type Mentionable } from './mentions';
import { currentRevisionOf, lockWorkflowRow } from './workflowRow';

interface NoteRow {
  id: string;
  cell_id: string;
  parent_id: string | null;
  author_user_id: string | null;
  author_name: string | null;
  body: string;
  revision: number;
  mentions: string[];
  created_at: Date;
  resolved_at: Date | null;
  resolved_by_user_id: string | null;
  resolved_by_name: string | null;
}

const NOTE_COLUMNS = `n.id, n.cell_id, n.parent_id, n.author_user_id, a.name AS author_name, n.body, n.revision, n.mentions,
  n.created_at, n.resolved_at, n.resolved_by_user_id, r.name AS resolved_by_name`;
const NOTE_JOINS = `LEFT JOIN users a ON a.id = n.author_user_id LEFT JOIN users r ON r.id = n.resolved_by_user_id`;

const FORMER_MEMBER: Person = { id: '00000000-0000-0000-0000-000000000000', name: 'former member' };

function toNote(row: NoteRow, names: ReadonlyMap<string, string>): ApiNote {
  return {
    id: row.id,
    cellId: row.cell_id,
    author: row.author_user_id === null ? FORMER_MEMBER : { id: row.author_user_id, name: row.author_name ?? '' },
    body: row.body,
    revision: row.revision,
    createdAt: row.created_at.toISOString(),
    mentions: row.mentions.filter((id) => names.has(id)).map((id) => ({ id, name: names.get(id) ?? '' })),
  };
}

async function namesOf(manager: EntityManager, rows: readonly NoteRow[]): Promise<Map<string, string>> {
  const ids = [...new Set(rows.flatMap((row) => row.mentions))];
  if (ids.length === 0) return new Map();
  const people: Array<{ id: string; name: string }> = await manager.query(`SELECT id, name FROM users WHERE id = ANY($1::uuid[])`, [ids]);
  return new Map(people.map((p) => [p.id, p.name]));
}

function threadsOf(rows: readonly NoteRow[], names: ReadonlyMap<string, string>): NoteThread[] {
  const replies = new Map<string, ApiNote[]>();
  for (const row of rows) {
    if (row.parent_id !== null) replies.set(row.parent_id, [...(replies.get(row.parent_id) ?? []), toNote(row, names)]);
  }
  return rows
    .filter((row) => row.parent_id === null)
    .map((row) => ({
      ...toNote(row, names),
      status: row.resolved_at === null ? ('open' as const) : ('resolved' as const),
      resolvedAt: row.resolved_at?.toISOString() ?? null,
      resolvedBy: row.resolved_by_user_id === null ? null : { id: row.resolved_by_user_id, name: row.resolved_by_name ?? '' },
      replies: replies.get(row.id) ?? [],
    }));
}

/**
 * A sheet's note threads, oldest first, each with its replies. With `revision`, only the threads
 * opened on that revision (the notes a past revision was checked with).
 */
export async function listThreads(dataSource: DataSource, sheetId: string, revision?: number): Promise<NoteThread[]> {
  const rows: NoteRow[] = await dataSource.query(
    `SELECT ${NOTE_COLUMNS} FROM notes n ${NOTE_JOINS}
      WHERE n.sheet_id = $1
        AND ($2::int IS NULL OR COALESCE((SELECT p.revision FROM notes p WHERE p.id = n.parent_id), n.revision) = $2::int)
      ORDER BY n.created_at, n.id`,
    [sheetId, revision ?? null],
  );
  return threadsOf(rows, await namesOf(dataSource.manager, rows));
}

async function threadById(manager: EntityManager, sheetId: string, rootId: string): Promise<NoteThread> {
  const rows: NoteRow[] = await manager.query(
    `SELECT ${NOTE_COLUMNS} FROM notes n ${NOTE_JOINS}
      WHERE n.sheet_id = $1 AND (n.id = $2 OR n.parent_id = $2) ORDER BY n.created_at, n.id`,
    [sheetId, rootId],
  );
  const [thread] = threadsOf(rows, await namesOf(manager, rows));
  if (thread === undefined) throw notFound('note');
  return thread;
}

/** Threads of a sheet that are not resolved: they block approval unless overridden. */
export async function countOpenThreads(manager: EntityManager, sheetId: string): Promise<number> {
  const rows: Array<{ open: number }> = await manager.query(
    `SELECT count(*)::int AS open FROM notes WHERE sheet_id = $1 AND parent_id IS NULL AND resolved_at IS NULL`,
    [sheetId],
  );
  return rows[0]?.open ?? 0;
}

export interface CreatedNote {
  thread: NoteThread;
  note: ApiNote;
  /** Members named in it (the author left out), to be sent an e-mail. */
  mentioned: Mentionable[];
}

/**
 * Writes a note on a cell (a new thread), or a reply to a thread (`parentId`, on the thread's
 * cell). The cell must be one of the sheet's cells now (`cells`: id to name, from its live content); the
 * note records the revision the sheet is at. A reply leaves the thread's state as it is:
 * reopening is an explicit step.
 */
export async function createNote(
  dataSource: DataSource,
  sheetId: string,
  author: { userId: string; ip?: string | null },
  input: { cellId: string; body: string; parentId?: string },
  cells: ReadonlyMap<string, string | null>,
): Promise<CreatedNote> {
  return dataSource.transaction(async (manager) => {
    const sheet = await lockWorkflowRow(manager, sheetId);
    let rootId: string | null = null;
    if (input.parentId !== undefined) {
      const parents: Array<{ id: string; cell_id: string; parent_id: string | null }> = await manager.query(
        `SELECT id, cell_id, parent_id FROM notes WHERE id = $1 AND sheet_id = $2`,
        [input.parentId, sheetId],
      );
      const parent = parents[0];
      if (parent === undefined) throw invalidField('parentId', 'no note with this id on this sheet');
      rootId = parent.parent_id ?? parent.id;
      if (parent.cell_id !== input.cellId) throw invalidField('cellId', `a reply belongs to the cell of its thread (${parent.cell_id})`);
    } else if (!cells.has(input.cellId)) {
      throw invalidField('cellId', `the sheet has no cell with id "${input.cellId}"`);
    }
    const members: Mentionable[] = await manager.query(
      `SELECT u.id, u.name, u.email FROM memberships m JOIN users u ON u.id = m.user_id WHERE m.organization_id = $1`,
      [sheet.organization_id],
    );
    const mentioned = findMentions(input.body, members);
    const revision = currentRevisionOf(sheet);
    const inserted: Array<{ id: string }> = await manager.query(
      `INSERT INTO notes (sheet_id, cell_id, parent_id, author_user_id, body, revision, mentions)
       VALUES ($1, $2, $3, $4, $5, $6, $7::uuid[]) RETURNING id`,
      [sheetId, input.cellId, rootId, author.userId, input.body, revision, mentioned.map((m) => m.id)],
    );
    const noteId = inserted[0]?.id as string;
    await recordAudit(manager, {
      action: 'note.created',
      actorUserId: author.userId,
      organizationId: sheet.organization_id,
      subject: sheetId,
      ip: author.ip,
      details: {
        sheetId,
        noteId,
        threadId: rootId ?? noteId,
        cellId: input.cellId,
        cellName: cells.get(input.cellId) ?? null,
        revision,
        reply: rootId !== null,
        body: input.body.slice(0, 500),
      },
    });
    const thread = await threadById(manager, sheetId, rootId ?? noteId);
    const note = rootId === null ? thread : (thread.replies.find((reply) => reply.id === noteId) as ApiNote);
    return { thread, note, mentioned: mentioned.filter((m) => m.id !== author.userId) };
  });
}

/** Marks a thread resolved (`resolved: true`) or open again; 409 when it already is. */
export async function setThreadResolved(
  dataSource: DataSource,
  sheetId: string,
  noteId: string,
  actor: { userId: string; ip?: string | null },
  resolved: boolean,
): Promise<NoteThread> {
  return dataSource.transaction(async (manager) => {
    const sheet = await lockWorkflowRow(manager, sheetId);
    const roots: Array<{ id: string; parent_id: string | null; resolved_at: Date | null; cell_id: string }> = await manager.query(
      `SELECT id, parent_id, resolved_at, cell_id FROM notes WHERE id = $1 AND sheet_id = $2`,
      [noteId, sheetId],
    );
    const root = roots[0];
    if (root === undefined) throw notFound('note');
    if (root.parent_id !== null) throw conflict('a reply is resolved with its thread: resolve or reopen the thread\'s first note');
    if ((root.resolved_at !== null) === resolved) throw conflict(`the thread is already ${resolved ? 'resolved' : 'open'}`);
    await manager.query(
      `UPDATE notes SET resolved_at = CASE WHEN $2 THEN now() END, resolved_by_user_id = CASE WHEN $2 THEN $3::uuid END WHERE id = $1`,
      [noteId, resolved, actor.userId],
    );
    await recordAudit(manager, {
      action: resolved ? 'note.resolved' : 'note.reopened',
      actorUserId: actor.userId,
      organizationId: sheet.organization_id,
      subject: sheetId,
      ip: actor.ip,
      details: { sheetId, noteId, threadId: noteId, cellId: root.cell_id, cellName: await cellNameOf(manager, sheetId, root.cell_id), revision: currentRevisionOf(sheet) },
    });
    return threadById(manager, sheetId, noteId);
  });
}

/** The name of a cell in the sheet's stored content, for the history's words; null for a note cell or one since removed. */
async function cellNameOf(manager: EntityManager, sheetId: string, cellId: string): Promise<string | null> {
  const rows: Array<{ name: string | null }> = await manager.query(
    `SELECT cell ->> 'name' AS name FROM sheets, jsonb_array_elements(content -> 'cells') AS cell
      WHERE sheets.id = $1 AND cell ->> 'id' = $2 LIMIT 1`,
    [sheetId, cellId],
  );
  return rows[0]?.name ?? null;
}
