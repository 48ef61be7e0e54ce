import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { canonicalJson } from '../src/services/review/canonicalContent';
import { createTeam, signedInClient, type Team } from './helpers/fixtures';
import { lugContent, lugSheetIn } from './helpers/review';
import type { TestClient } from './helpers/TestClient';
import { startTestServer, type TestServer } from './helpers/testServer';

/** A revision holds what the server's engine computed, never what a browser claims. */
describe('results of a revision are computed on the server', () => {
  let server: TestServer;
  let team: Team;
  let engineer: TestClient;
  let checker: TestClient;

  beforeAll(async () => {
    server = await startTestServer();
    team = await createTeam(server.deps.dataSource, 'results');
    engineer = await signedInClient(server, team.users.engineer);
    checker = await signedInClient(server, team.users.checker);
  });
  afterAll(async () => {
    await server?.close();
  });

  it('ignores results a client sends with the approval, and stores the engine\'s', async () => {
    // Lever arm 50 mm: von Mises 176.12 MPa against Sy 250 MPa gives 1.4195 < 1.5, a fail
    // (worked by hand in packages/engine/src/diff/diffRevisions.test.ts).
    const sheetId = await lugSheetIn(server.deps.dataSource, team, 'Lug, long lever', lugContent('50 mm'));
    expect((await engineer.post(`/api/sheets/${sheetId}/submit`, { checkerUserId: team.users.checker.id })).status).toBe(200);
    const claimed = { cells: { DE: { kind: 'criterion', values: { factor: 2.1, margin: 0.4, pass: true } } } };
    const approved = await checker.post(`/api/sheets/${sheetId}/approve`, { results: claimed, contentSha256: '0'.repeat(64) });
    expect(approved.status).toBe(201);

    const revision = (await checker.get(`/api/sheets/${sheetId}/revisions/1`)).body.revision;
    const de = revision.results.cells.DE;
    expect(de.kind).toBe('criterion');
    expect(de.values.factor).toBeCloseTo(1.4195, 3);
    expect(de.values.pass).toBe(false);
    expect(revision.results.cells.S.values.sx).toBeCloseTo(173.101e6, -3);
    // The hash is of the stored content's canonical JSON, whatever the client sent.
    const expected = createHash('sha256').update(canonicalJson(revision.content), 'utf8').digest('hex');
    expect(revision.contentSha256).toBe(expected);
    expect(revision.contentSha256).not.toBe('0'.repeat(64));
  });

  it('does not let a result written into the sheet itself reach a revision', async () => {
    const sheetId = await lugSheetIn(server.deps.dataSource, team, 'Lug, doctored cell');
    // A client that writes a computed value into a cell makes it a cell the format does not know.
    await server.deps.dataSource.query(
      `UPDATE sheets SET content = jsonb_set(content, '{cells,4,factor}', '9.9'::jsonb) WHERE id = $1`,
      [sheetId],
    );
    const refused = await engineer.post(`/api/sheets/${sheetId}/submit`, { checkerUserId: team.users.checker.id });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toContain('content.cells[4]');
    expect(await server.deps.dataSource.query(`SELECT count(*)::int AS n FROM revisions WHERE sheet_id = $1`, [sheetId])).toEqual([{ n: 0 }]);
  });
});
