import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ReviewState, RevisionDetail, SheetHistoryResponse } from '@sheaf/engine/api';
import { createTeam, signedInClient, waitForMail, type Team } from './helpers/fixtures';
import { lugContent, lugSheetIn } from './helpers/review';
import type { TestClient } from './helpers/TestClient';
import { startTestServer, type TestServer } from './helpers/testServer';

/**
 * The whole check workflow through the API, as three people use it: the engineer prepares and
 * submits, the checker writes notes and returns, the engineer fixes and resubmits, the checker
 * approves (revision 1); an edit starts revision 2, which is approved in turn and supersedes 1.
 */
describe('check and approval workflow', () => {
  let server: TestServer;
  let team: Team;
  let engineer: TestClient;
  let checker: TestClient;
  let owner: TestClient;
  let viewer: TestClient;

  beforeAll(async () => {
    server = await startTestServer();
    team = await createTeam(server.deps.dataSource, 'review');
    [engineer, checker, owner, viewer] = await Promise.all([
      signedInClient(server, team.users.engineer),
      signedInClient(server, team.users.checker),
      signedInClient(server, team.users.owner),
      signedInClient(server, team.users.viewer),
    ]);
  });
  afterAll(async () => {
    await server?.close();
  });

  const state = async (client: TestClient, sheetId: string): Promise<ReviewState> => {
    const response = await client.get(`/api/sheets/${sheetId}/review`);
    expect(response.status).toBe(200);
    return ReviewState.parse(response.body.review);
  };

  it('names only a member whose role checks, and never the preparer, as checker', async () => {
    const sheetId = await lugSheetIn(server.deps.dataSource, team);
    const self = await engineer.post(`/api/sheets/${sheetId}/submit`, { checkerUserId: team.users.engineer.id });
    expect(self.status).toBe(400);
    expect(self.body.error.message).toBe('checkerUserId: the preparer cannot check their own sheet; name another member');
    const viewerAsChecker = await engineer.post(`/api/sheets/${sheetId}/submit`, { checkerUserId: team.users.viewer.id });
    expect(viewerAsChecker.body.error.message).toBe(`checkerUserId: ${team.users.viewer.name} is a viewer, and that role may not check sheets`);
    const outsider = await engineer.post(`/api/sheets/${sheetId}/submit`, { checkerUserId: team.users.outsider.id });
    expect(outsider.body.error.message).toBe("checkerUserId: not a member of this sheet's organization");
    // The owner may not check a sheet the owner submitted either.
    const ownSubmit = await owner.post(`/api/sheets/${sheetId}/submit`, { checkerUserId: team.users.owner.id });
    expect(ownSubmit.status).toBe(400);
    expect((await state(engineer, sheetId)).status).toBe('draft');
  });

  it('refuses to offer a sheet the engine cannot read, naming the field', async () => {
    const sheetId = await lugSheetIn(server.deps.dataSource, team);
    await server.deps.dataSource.query(
      `UPDATE sheets SET content = jsonb_set(content, '{cells,1,expr}', '12'::jsonb) WHERE id = $1`,
      [sheetId],
    );
    const refused = await engineer.post(`/api/sheets/${sheetId}/submit`, { checkerUserId: team.users.checker.id });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/^the sheet is not a valid sheet file and cannot be checked or issued: content\.cells\[1\]\.expr: /);
  });

  it('runs return, fix, resubmit, approve, next revision, approve again, and supersedes revision 1', async () => {
    const sheetId = await lugSheetIn(server.deps.dataSource, team, 'Lug rev cycle');

    // Submit: the checker is asked by mail; the sheet is read-only for REST edits too.
    const submitted = await engineer.post(`/api/sheets/${sheetId}/submit`, { checkerUserId: team.users.checker.id, message: 'LC2 only for now' });
    expect(submitted.status).toBe(200);
    expect(submitted.body.review).toMatchObject({ status: 'in-check', currentRevision: 1, issuedRevision: 0, checker: { id: team.users.checker.id }, preparer: { id: team.users.engineer.id } });
    expect(submitted.body.review.signatures.prepared.user.name).toBe(team.users.engineer.name);
    const request = await waitForMail(engineer, team.users.checker.email, (m) => m.subject.startsWith('Check requested'));
    expect(request.text).toContain(`${team.users.engineer.name} has submitted`);
    expect(request.text).toContain('> LC2 only for now');
    const rename = await engineer.patch(`/api/sheets/${sheetId}`, { title: 'Renamed while in check' });
    expect(rename.status).toBe(409);
    expect(rename.body.error.message).toBe('the sheet is in check and read-only until the checker returns it');
    expect((await engineer.delete(`/api/sheets/${sheetId}`)).status).toBe(409);
    expect((await engineer.post(`/api/sheets/${sheetId}/submit`, { checkerUserId: team.users.checker.id })).status).toBe(409);

    // What each may do now.
    expect((await state(checker, sheetId)).can).toMatchObject({ approve: true, return: true, submit: false, reassignChecker: false });
    expect((await state(engineer, sheetId)).can).toMatchObject({ approve: false, return: false, submit: false });
    expect((await state(owner, sheetId)).can).toMatchObject({ approve: false, return: false, reassignChecker: true });

    // Notes: a thread on S mentioning the owner, a reply from the engineer.
    const note = await checker.post(`/api/sheets/${sheetId}/notes`, { cellId: 's1', body: 'Lever arm from the weld toe or the hole centre? @Test review-owner please confirm.' });
    expect(note.status).toBe(201);
    expect(note.body.thread).toMatchObject({ cellId: 's1', status: 'open', revision: 1, mentions: [{ id: team.users.owner.id }] });
    const mention = await waitForMail(checker, team.users.owner.email, (m) => m.subject.includes('mentioned you'));
    expect(mention.text).toContain('a note on cell S of');
    const threadId = note.body.thread.id as string;
    const reply = await engineer.post(`/api/sheets/${sheetId}/notes`, { cellId: 's1', parentId: threadId, body: 'From the toe; see sketch 2.' });
    expect(reply.body.thread.replies.map((r: { body: string }) => r.body)).toEqual(['From the toe; see sketch 2.']);
    expect((await engineer.post(`/api/sheets/${sheetId}/notes`, { cellId: 'zz', body: 'Nowhere' })).body.error.message).toBe('cellId: the sheet has no cell with id "zz"');
    expect((await engineer.post(`/api/sheets/${sheetId}/notes/${threadId}/resolve`)).status).toBe(403);

    // Only the assigned checker returns; the owner is not that checker.
    const ownerReturn = await owner.post(`/api/sheets/${sheetId}/return`, { message: 'x' });
    expect(ownerReturn.status).toBe(403);
    expect(ownerReturn.body.error.message).toContain(`only the checker this sheet was submitted to (${team.users.checker.name})`);
    const returned = await checker.post(`/api/sheets/${sheetId}/return`, { message: 'Answer the note on S and add LC3.' });
    expect(returned.status).toBe(200);
    expect(returned.body.review).toMatchObject({ status: 'draft', currentRevision: 1, openNotes: 1, lastReturn: { message: 'Answer the note on S and add LC3.', by: { id: team.users.checker.id } } });
    const returnedMail = await waitForMail(checker, team.users.engineer.email, (m) => m.subject.startsWith('Returned'));
    expect(returnedMail.text).toContain('1 note is open on the sheet.');

    // Fix (a REST rename is an edit), resubmit, and approval is blocked by the open note.
    expect((await engineer.patch(`/api/sheets/${sheetId}`, { title: 'Lug rev cycle, LC2 and LC3' })).status).toBe(200);
    expect((await engineer.post(`/api/sheets/${sheetId}/submit`, { checkerUserId: team.users.checker.id })).status).toBe(200);
    const blocked = await checker.post(`/api/sheets/${sheetId}/approve`, {});
    expect(blocked.status).toBe(409);
    expect(blocked.body.error.message).toMatch(/^1 note is still open: resolve it, or give overrideReason/);
    expect((await engineer.post(`/api/sheets/${sheetId}/approve`, {})).status).toBe(403);
    const resolved = await checker.post(`/api/sheets/${sheetId}/notes/${threadId}/resolve`);
    expect(resolved.body.thread).toMatchObject({ status: 'resolved', resolvedBy: { id: team.users.checker.id } });
    expect((await checker.post(`/api/sheets/${sheetId}/notes/${threadId}/resolve`)).status).toBe(409);

    const approved = await checker.post(`/api/sheets/${sheetId}/approve`, {});
    expect(approved.status).toBe(201);
    expect(approved.body.revision).toMatchObject({ number: 1, status: 'approved', title: 'Lug rev cycle, LC2 and LC3', overrideReason: null, openNotesAtApproval: 0, supersededAt: null });
    expect(approved.body.revision.prepared.user.id).toBe(team.users.engineer.id);
    expect(approved.body.revision.checked.user.id).toBe(team.users.checker.id);
    expect(approved.body.revision.approved.user.id).toBe(team.users.checker.id);
    expect(approved.body.review).toMatchObject({ status: 'approved', issuedRevision: 1, currentRevision: 1 });
    expect(approved.body.review.signatures.approved.user.name).toBe(team.users.checker.name);
    const approvedMail = await waitForMail(checker, team.users.engineer.email, (m) => m.subject.startsWith('Approved'));
    expect(approvedMail.text).toContain(approved.body.revision.contentSha256);
    // An approved sheet is not submitted again until it changes.
    expect((await engineer.post(`/api/sheets/${sheetId}/submit`, { checkerUserId: team.users.checker.id })).status).toBe(409);

    // Revision 2: the first edit of the approved sheet makes it a draft of revision 2.
    expect((await engineer.patch(`/api/sheets/${sheetId}`, { title: 'Lug rev cycle, rev 2' })).status).toBe(200);
    expect(await state(engineer, sheetId)).toMatchObject({ status: 'draft', issuedRevision: 1, currentRevision: 2, signatures: { prepared: null, approved: null } });
    const secondNote = await checker.post(`/api/sheets/${sheetId}/notes`, { cellId: 'c1', body: 'Is 1.5 the required factor for this lug class?' });
    expect(secondNote.body.thread.revision).toBe(2);
    // The owner checks this one (the seeded team has one checker); open note approved over, with a reason.
    expect((await engineer.post(`/api/sheets/${sheetId}/submit`, { checkerUserId: team.users.checker.id })).status).toBe(200);
    const reassigned = await owner.post(`/api/sheets/${sheetId}/checker`, { checkerUserId: team.users.owner.id });
    expect(reassigned.body.review.checker.id).toBe(team.users.owner.id);
    await waitForMail(owner, team.users.owner.email, (m) => m.text.includes('has made you the checker'));
    expect((await checker.post(`/api/sheets/${sheetId}/approve`, {})).status).toBe(403);
    const overridden = await owner.post(`/api/sheets/${sheetId}/approve`, { overrideReason: 'Required factor set by the lifting gear standard; answered in the design basis.' });
    expect(overridden.status).toBe(201);
    expect(overridden.body.revision).toMatchObject({ number: 2, openNotesAtApproval: 1, overrideReason: 'Required factor set by the lifting gear standard; answered in the design basis.' });

    // Revision 1 is superseded by 2, at 2's approval; both stay readable, newest first.
    const revisions = await viewer.get(`/api/sheets/${sheetId}/revisions`);
    expect(revisions.body.revisions.map((r: { number: number; status: string }) => [r.number, r.status])).toEqual([[2, 'approved'], [1, 'superseded']]);
    expect(revisions.body.revisions[1].supersededAt).toBe(revisions.body.revisions[0].approved.at);
    const first = RevisionDetail.parse((await viewer.get(`/api/sheets/${sheetId}/revisions/1`)).body.revision);
    expect(first.content.title).toBe('Lug rev cycle, LC2 and LC3');
    expect(first.content.cells.map((c) => c.id)).toEqual(lugContent().cells.map((c) => c.id));
    expect((await viewer.get(`/api/sheets/${sheetId}/revisions/3`)).status).toBe(404);

    // Notes by revision, for the read-only view of a past revision.
    const notesOn1 = await viewer.get(`/api/sheets/${sheetId}/notes?revision=1`);
    expect(notesOn1.body.threads.map((t: { id: string }) => t.id)).toEqual([threadId]);
    expect((await viewer.get(`/api/sheets/${sheetId}/notes`)).body.threads).toHaveLength(2);

    // The diff of the two revisions: only the title changed, so no cell and no result moved.
    const diff = await viewer.get(`/api/sheets/${sheetId}/diff?from=1&to=2`);
    expect(diff.status).toBe(200);
    expect(diff.body.diff).toMatchObject({ from: 1, to: 2, added: [], removed: [], changed: [], results: [], crossings: [] });
    expect(diff.body.diff.sheet).toEqual([{ field: 'title', old: 'Lug rev cycle, LC2 and LC3', new: 'Lug rev cycle, rev 2' }]);

    // History: who did what, when, newest first.
    const history = SheetHistoryResponse.parse((await viewer.get(`/api/sheets/${sheetId}/history`)).body);
    expect(history.revisions.map((r) => r.number)).toEqual([2, 1]);
    expect(history.events.map((e) => e.action).reverse()).toEqual([
      'sheet.submitted',
      'note.created',
      'note.created',
      'sheet.returned',
      'sheet.submitted',
      'note.resolved',
      'sheet.approved',
      'sheet.reopened',
      'note.created',
      'sheet.submitted',
      'sheet.checker-reassigned',
      'sheet.approved',
    ]);
    const [lastApproval] = history.events;
    expect(lastApproval).toMatchObject({ actor: { id: team.users.owner.id }, revision: 2, summary: 'Approved revision 2 over 1 open note; revision 1 superseded' });
    expect(history.events.find((e) => e.action === 'sheet.returned')?.message).toBe('Answer the note on S and add LC3.');
    expect(history.events.filter((e) => e.action.startsWith('note.')).map((e) => e.summary).reverse()).toEqual([
      'Wrote a note on cell S',
      'Replied to a note on cell S',
      'Resolved the note on cell S',
      'Wrote a note on cell DE',
    ]);
  });

  it('lets nobody approve a sheet they prepared, even when named checker by a reassignment', async () => {
    const sheetId = await lugSheetIn(server.deps.dataSource, team);
    expect((await owner.post(`/api/sheets/${sheetId}/submit`, { checkerUserId: team.users.checker.id })).status).toBe(200);
    const toPreparer = await owner.post(`/api/sheets/${sheetId}/checker`, { checkerUserId: team.users.owner.id });
    expect(toPreparer.status).toBe(400);
    expect(toPreparer.body.error.message).toBe('checkerUserId: the preparer cannot check their own sheet; name another member');
    // Even written straight into the table, the API and the database refuse the self-approval.
    await server.deps.dataSource.query(`UPDATE sheets SET checker_user_id = prepared_by_user_id WHERE id = $1`, [sheetId]);
    const self = await owner.post(`/api/sheets/${sheetId}/approve`, { overrideReason: 'n/a' });
    expect(self.status).toBe(403);
    expect(self.body.error.message).toBe('you prepared this sheet; nobody may approve a sheet they prepared');
    await expect(
      server.deps.dataSource.query(
        `INSERT INTO revisions (sheet_id, organization_id, number, title, calc_number, content, results, content_sha256,
           prepared_by_user_id, prepared_by_name, prepared_at, checked_by_user_id, checked_by_name, checked_at, approved_by_user_id, approved_by_name)
         SELECT id, organization_id, 1, title, calc_number, content, '{"cells":{}}', repeat('a', 64), $2, 'x', now(), $2, 'x', now(), $2, 'x'
           FROM sheets WHERE id = $1`,
        [sheetId, team.users.owner.id],
      ),
    ).rejects.toThrow(/revisions_not_self_approved/);
  });
});
