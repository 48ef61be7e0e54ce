import { z } from 'zod';
import {
  ApproveSheetRequest,
  ApproveSheetResponse,
  CreateNoteRequest,
  DiffQuery,
  Id,
  NoteListResponse,
  NotesQuery,
  NoteThreadResponse,
  ReassignCheckerRequest,
  ReturnSheetRequest,
  RevisionDiffResponse,
  RevisionListResponse,
  RevisionParams,
  RevisionResponse,
  ReviewStateResponse,
  SheetHistoryResponse,
  SubmitForCheckRequest,
  type Action,
} from '@sheaf/engine/api';
import { sheetFromParams, type AccessGrant } from '../auth/permissions';
import { approveSheet } from '../services/review/approveSheet';
import { sheetHistory } from '../services/review/history';
import { collabOf, liveSheetContent } from '../services/review/liveContent';
import { countOpenThreads, createNote, listThreads, setThreadResolved } from '../services/review/notes';
import { notifyApproved, notifyCheckRequested, notifyMentions, notifyReturned } from '../services/review/reviewNotifications';
import { reviewState } from '../services/review/reviewState';
import { evaluateOnServer } from '../services/review/serverResults';
import { listRevisions, revisionDetail, revisionDiff } from '../services/review/revisions';
import { reassignChecker, returnSheet, submitForCheck } from '../services/review/workflowTransitions';
import { currentRevisionOf, lockWorkflowRow, personById } from '../services/review/workflowRow';
import { created, defineRoute, ok, type Route, type RouteAccess } from './defineRoute';

function grantOf(access: AccessGrant | undefined): AccessGrant & { sheet: NonNullable<AccessGrant['sheet']> } {
  if (!access?.sheet) throw new Error('sheet route without its sheet');
  return access as AccessGrant & { sheet: NonNullable<AccessGrant['sheet']> };
}

function userIdOf(user: Express.User | undefined): string {
  if (!user) throw new Error('permission route without a signed-in user');
  return user.id;
}

const SheetParams = z.object({ sheetId: Id });
const NoteParams = z.object({ sheetId: Id, noteId: Id });
const sheetAccess = (action: Action): RouteAccess => ({ kind: 'permission', action, resolve: sheetFromParams });

/**
 * The check-and-approval workflow of a sheet: its state, the transitions (submit, return,
 * approve, reassign the checker), notes on cells, issued revisions, the diff between two of them
 * and the sheet's history. No route changes or deletes an issued revision.
 */
export function reviewRoutes(): Route[] {
  return [
    defineRoute({
      id: 'review.state',
      method: 'get',
      path: '/api/sheets/:sheetId/review',
      summary: "Where a sheet stands in the check workflow, with the signatures of its current revision and what the caller may do now",
      tag: 'review',
      access: sheetAccess('sheet.read'),
      params: SheetParams,
      response: { status: 200, description: 'The workflow state', schema: ReviewStateResponse },
      handler: async ({ deps, access, user }) => {
        const grant = grantOf(access);
        return ok({ review: await reviewState(deps.dataSource, grant.sheet.id, userIdOf(user), grant.role) });
      },
    }),
    defineRoute({
      id: 'review.submit',
      method: 'post',
      path: '/api/sheets/:sheetId/submit',
      summary: 'Submit a draft for check, naming the checker (a member whose role allows sheet.check, never the preparer); the sheet is read-only until returned or approved',
      tag: 'review',
      access: sheetAccess('sheet.submit'),
      params: SheetParams,
      body: SubmitForCheckRequest,
      response: { status: 200, description: 'The sheet is in check', schema: ReviewStateResponse },
      errors: [409],
      handler: async ({ req, deps, access, user, body }) => {
        const grant = grantOf(access);
        const userId = userIdOf(user);
        const collab = collabOf(req);
        // A sheet the engine cannot read is not offered for check (409 naming the fields).
        evaluateOnServer(await liveSheetContent(deps.dataSource, collab, grant.sheet.id));
        const outcome = await submitForCheck(deps.dataSource, collab, grant.sheet.id, { userId, ip: req.ip }, body);
        notifyCheckRequested(deps, outcome, body.message);
        return ok({ review: await reviewState(deps.dataSource, grant.sheet.id, userId, grant.role) });
      },
    }),
    defineRoute({
      id: 'review.return',
      method: 'post',
      path: '/api/sheets/:sheetId/return',
      summary: 'Return a sheet in check to its preparer with a message (only the checker it was submitted to); it becomes a draft again',
      tag: 'review',
      access: sheetAccess('sheet.return'),
      params: SheetParams,
      body: ReturnSheetRequest,
      response: { status: 200, description: 'The sheet is a draft again', schema: ReviewStateResponse },
      errors: [409],
      handler: async ({ req, deps, access, user, body }) => {
        const grant = grantOf(access);
        const userId = userIdOf(user);
        const outcome = await returnSheet(deps.dataSource, collabOf(req), grant.sheet.id, { userId, ip: req.ip }, body);
        notifyReturned(deps, outcome, body.message, await countOpenThreads(deps.dataSource.manager, grant.sheet.id));
        return ok({ review: await reviewState(deps.dataSource, grant.sheet.id, userId, grant.role) });
      },
    }),
    defineRoute({
      id: 'review.approve',
      method: 'post',
      path: '/api/sheets/:sheetId/approve',
      summary:
        'Approve a sheet in check (only the checker it was submitted to, never its preparer): issues the next revision with the live content, results computed by the server (never taken from the request), the sha-256 of the canonical content and the signatures. Open notes block approval unless overrideReason is given',
      tag: 'review',
      access: sheetAccess('sheet.approve'),
      params: SheetParams,
      body: ApproveSheetRequest,
      response: { status: 201, description: 'The issued revision and the workflow state', schema: ApproveSheetResponse },
      errors: [409],
      handler: async ({ req, deps, access, user, body }) => {
        const grant = grantOf(access);
        const userId = userIdOf(user);
        const outcome = await approveSheet(deps.dataSource, collabOf(req), grant.sheet.id, { userId, ip: req.ip }, body);
        const revision = await revisionDetail(deps.dataSource, grant.sheet.id, outcome.revision);
        notifyApproved(deps, outcome, revision.contentSha256, revision.overrideReason);
        const { content: _content, results: _results, ...summary } = revision;
        return created({ revision: summary, review: await reviewState(deps.dataSource, grant.sheet.id, userId, grant.role) });
      },
    }),
    defineRoute({
      id: 'review.reassignChecker',
      method: 'post',
      path: '/api/sheets/:sheetId/checker',
      summary: "Name another checker for a sheet in check (owners; never the sheet's preparer)",
      tag: 'review',
      access: sheetAccess('sheet.reassignChecker'),
      params: SheetParams,
      body: ReassignCheckerRequest,
      response: { status: 200, description: 'The workflow state with the new checker', schema: ReviewStateResponse },
      errors: [409],
      handler: async ({ req, deps, access, user, body }) => {
        const grant = grantOf(access);
        const userId = userIdOf(user);
        const outcome = await reassignChecker(deps.dataSource, grant.sheet.id, { userId, ip: req.ip }, body);
        notifyCheckRequested(deps, outcome, undefined, true);
        return ok({ review: await reviewState(deps.dataSource, grant.sheet.id, userId, grant.role) });
      },
    }),
    defineRoute({
      id: 'notes.list',
      method: 'get',
      path: '/api/sheets/:sheetId/notes',
      summary: "A sheet's note threads with their replies, oldest first; ?revision=N keeps the threads opened on revision N",
      tag: 'notes',
      access: sheetAccess('sheet.read'),
      params: SheetParams,
      query: NotesQuery,
      response: { status: 200, description: 'Note threads', schema: NoteListResponse },
      handler: async ({ deps, access, query }) => ok({ threads: await listThreads(deps.dataSource, grantOf(access).sheet.id, query.revision) }),
    }),
    defineRoute({
      id: 'notes.create',
      method: 'post',
      path: '/api/sheets/:sheetId/notes',
      summary: 'Write a note on a cell (by its stable id), or reply to a thread with parentId; members named with @name get an e-mail',
      tag: 'notes',
      access: sheetAccess('note.create'),
      params: SheetParams,
      body: CreateNoteRequest,
      response: { status: 201, description: 'The thread the note belongs to', schema: NoteThreadResponse },
      handler: async ({ req, deps, access, user, body }) => {
        const grant = grantOf(access);
        const userId = userIdOf(user);
        const content = await liveSheetContent(deps.dataSource, collabOf(req), grant.sheet.id);
        const cells = new Map(content.cells.map((cell) => [cell.id, typeof cell.name === 'string' && cell.name !== '' ? cell.name : null]));
        const result = await createNote(deps.dataSource, grant.sheet.id, { userId, ip: req.ip }, body, cells);
        if (result.mentioned.length > 0) {
          const sheet = await deps.dataSource.transaction((manager) => lockWorkflowRow(manager, grant.sheet.id));
          const cell = content.cells.find((c) => c.id === body.cellId);
          const label = typeof cell?.name === 'string' && cell.name !== '' ? `cell ${cell.name}` : `cell ${body.cellId}`;
          const author = await personById(deps.dataSource.manager, userId);
          notifyMentions(deps, sheet, currentRevisionOf(sheet), result, author?.name ?? 'A member', label);
        }
        return created({ thread: result.thread });
      },
    }),
    defineRoute({
      id: 'notes.resolve',
      method: 'post',
      path: '/api/sheets/:sheetId/notes/:noteId/resolve',
      summary: "Resolve a note thread (by its first note's id)",
      tag: 'notes',
      access: sheetAccess('note.resolve'),
      params: NoteParams,
      response: { status: 200, description: 'The resolved thread', schema: NoteThreadResponse },
      errors: [409],
      handler: async ({ req, deps, access, user, params }) =>
        ok({ thread: await setThreadResolved(deps.dataSource, grantOf(access).sheet.id, params.noteId, { userId: userIdOf(user), ip: req.ip }, true) }),
    }),
    defineRoute({
      id: 'notes.reopen',
      method: 'post',
      path: '/api/sheets/:sheetId/notes/:noteId/reopen',
      summary: 'Reopen a resolved note thread',
      tag: 'notes',
      access: sheetAccess('note.resolve'),
      params: NoteParams,
      response: { status: 200, description: 'The reopened thread', schema: NoteThreadResponse },
      errors: [409],
      handler: async ({ req, deps, access, user, params }) =>
        ok({ thread: await setThreadResolved(deps.dataSource, grantOf(access).sheet.id, params.noteId, { userId: userIdOf(user), ip: req.ip }, false) }),
    }),
    defineRoute({
      id: 'revisions.list',
      method: 'get',
      path: '/api/sheets/:sheetId/revisions',
      summary: "A sheet's issued revisions, newest first, with signatures, content fingerprint and whether each is superseded",
      tag: 'revisions',
      access: sheetAccess('revision.read'),
      params: SheetParams,
      response: { status: 200, description: 'Issued revisions', schema: RevisionListResponse },
      handler: async ({ deps, access }) => ok({ revisions: await listRevisions(deps.dataSource, grantOf(access).sheet.id) }),
    }),
    defineRoute({
      id: 'revisions.get',
      method: 'get',
      path: '/api/sheets/:sheetId/revisions/:number',
      summary: 'One issued revision with its content (file format v1) and the results the server computed; read-only',
      tag: 'revisions',
      access: sheetAccess('revision.read'),
      params: RevisionParams,
      response: { status: 200, description: 'The revision', schema: RevisionResponse },
      handler: async ({ deps, access, params }) => ok({ revision: await revisionDetail(deps.dataSource, grantOf(access).sheet.id, params.number) }),
    }),
    defineRoute({
      id: 'revisions.diff',
      method: 'get',
      path: '/api/sheets/:sheetId/diff',
      summary:
        'What changed from revision `from` to revision `to` (or to=current, the sheet as it is now): cells added, removed and changed by stable id, each changed input, each result that moved with units, and pass/fail crossings',
      tag: 'revisions',
      access: sheetAccess('revision.read'),
      params: SheetParams,
      query: DiffQuery,
      response: { status: 200, description: 'The diff', schema: RevisionDiffResponse },
      handler: async ({ req, deps, access, query }) => {
        const sheet = grantOf(access).sheet;
        return ok(await revisionDiff(deps.dataSource, collabOf(req), { id: sheet.id, status: sheet.status, revision: sheet.revision }, query.from, query.to));
      },
    }),
    defineRoute({
      id: 'sheets.history',
      method: 'get',
      path: '/api/sheets/:sheetId/history',
      summary: "A sheet's history: issued revisions, status changes and note events with who and when, newest first",
      tag: 'revisions',
      access: sheetAccess('sheet.read'),
      params: SheetParams,
      response: { status: 200, description: 'The history', schema: SheetHistoryResponse },
      handler: async ({ deps, access }) => ok(await sheetHistory(deps.dataSource, grantOf(access).sheet.id)),
    }),
  ];
}
