import pg from 'pg';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { Route } from '../src/routes/defineRoute';
import { createTeam, signedInClient, type Team } from './helpers/fixtures';
import { approvedSheet } from './helpers/review';
import type { TestClient } from './helpers/TestClient';
import { startTestServer, type TestServer } from './helpers/testServer';

/** An issued revision never changes: the database refuses, and the API offers no way. */
describe('issued revisions are immutable', () => {
  let server: TestServer;
  let team: Team;
  let owner: TestClient;
  let sheetId: string;
  let original: { content: unknown; results: unknown; content_sha256: string };
  // The role that owns the tables (migrations run as it): even it is refused by the trigger.
  let ownerDb: pg.Client;

  beforeAll(async () => {
    ownerDb = new pg.Client({ connectionString: inject('ownerDatabaseUrl') });
    await ownerDb.connect();
    server = await startTestServer();
    team = await createTeam(server.deps.dataSource, 'immutable');
    owner = await signedInClient(server, team.users.owner);
    sheetId = await approvedSheet(server.deps.dataSource, team);
    [original] = await server.deps.dataSource.query(`SELECT content, results, content_sha256 FROM revisions WHERE sheet_id = $1 AND number = 1`, [sheetId]);
  });
  afterAll(async () => {
    await ownerDb?.end();
    await server?.close();
  });

  async function unchanged(): Promise<void> {
    const [now] = await server.deps.dataSource.query(`SELECT content, results, content_sha256 FROM revisions WHERE sheet_id = $1 AND number = 1`, [sheetId]);
    expect(now).toEqual(original);
  }

  it('refuses a direct SQL UPDATE of content, results, hash or anything else, even by the owner of the table', async () => {
    const db = ownerDb;
    await expect(db.query(`UPDATE revisions SET content = '{"format":"sheaf-sheet","version":1,"cells":[]}'::jsonb WHERE sheet_id = $1`, [sheetId])).rejects.toThrow(
      /revision 1 of sheet .* is issued and cannot be changed \(UPDATE refused\)/,
    );
    await expect(db.query(`UPDATE revisions SET results = '{"cells":{}}'::jsonb WHERE sheet_id = $1`, [sheetId])).rejects.toThrow(/UPDATE refused/);
    await expect(db.query(`UPDATE revisions SET content_sha256 = repeat('0', 64) WHERE sheet_id = $1`, [sheetId])).rejects.toThrow(/UPDATE refused/);
    await expect(db.query(`UPDATE revisions SET approved_at = now() WHERE sheet_id = $1`, [sheetId])).rejects.toThrow(/UPDATE refused/);
    await unchanged();
  });

  it('refuses a direct SQL DELETE and TRUNCATE, and deleting the sheet, even by the owner of the table', async () => {
    const db = ownerDb;
    await expect(db.query(`DELETE FROM revisions WHERE sheet_id = $1`, [sheetId])).rejects.toThrow(/DELETE refused/);
    await expect(db.query(`TRUNCATE revisions`)).rejects.toThrow(/TRUNCATE refused/);
    // The sheet holds its issued revisions: the foreign key refuses its deletion as well.
    await expect(db.query(`DELETE FROM sheets WHERE id = $1`, [sheetId])).rejects.toThrow(/revisions_sheet_id_fkey/);
    const viaApi = await owner.delete(`/api/sheets/${sheetId}`);
    expect(viaApi.status).toBe(409);
    expect(viaApi.body.error.message).toBe('revision 1 of this sheet is issued; issued calculations are kept, so the sheet cannot be deleted');
    await unchanged();
  });

  it('has no route that writes a revision: every revision route is a read', () => {
    const revisionRoutes = server.routes.filter((route: Route) => route.path.includes('/revisions'));
    expect(revisionRoutes.map((r) => `${r.method} ${r.path}`).sort()).toEqual([
      'get /api/sheets/:sheetId/revisions',
      'get /api/sheets/:sheetId/revisions/:number',
    ]);
    expect(revisionRoutes.every((route) => route.access.kind === 'permission' && route.access.action === 'revision.read')).toBe(true);
  });

  it('answers every attempt to change a revision over HTTP with 404, and the revision stays as it was', async () => {
    for (const method of ['PUT', 'PATCH', 'POST', 'DELETE']) {
      for (const path of [`/api/sheets/${sheetId}/revisions/1`, `/api/sheets/${sheetId}/revisions`]) {
        const response = await owner.request(method, path, { body: { content: { format: 'sheaf-sheet', version: 1, cells: [] } } });
        expect([method, path, response.status, response.body.error.code]).toEqual([method, path, 404, 'not-found']);
      }
    }
    await unchanged();
  });

  it('keeps revision 1 when the sheet goes on to revision 2', async () => {
    expect((await owner.patch(`/api/sheets/${sheetId}`, { title: 'Lug, revision 2 in preparation' })).status).toBe(200);
    const first = await owner.get(`/api/sheets/${sheetId}/revisions/1`);
    expect(first.body.revision.content).toEqual(original.content);
    expect(first.body.revision.contentSha256).toBe(original.content_sha256);
    await unchanged();
  });

  it("gives the app's own database role no way to change a revision or its guard", async () => {
    // The server's connection is the app role: not a superuser, owner of nothing.
    const db = server.deps.dataSource;
    const [role] = await db.query(
      `SELECT current_user AS name, r.rolsuper, r.rolcreaterole, r.rolcreatedb, pg_get_userbyid(c.relowner) AS revisions_owner
         FROM pg_roles r, pg_class c WHERE r.rolname = current_user AND c.oid = 'revisions'::regclass`,
    );
    expect(role).toMatchObject({ rolsuper: false, rolcreaterole: false, rolcreatedb: false });
    expect(role.revisions_owner).not.toBe(role.name);

    const denied = /permission denied|must be owner|must be superuser/;
    const attempts = [
      `UPDATE revisions SET content_sha256 = repeat('0', 64) WHERE sheet_id = '${sheetId}'`,
      `DELETE FROM revisions WHERE sheet_id = '${sheetId}'`,
      `TRUNCATE revisions`,
      `ALTER TABLE revisions DISABLE TRIGGER revisions_immutable`,
      `ALTER TABLE revisions DISABLE TRIGGER ALL`,
      `DROP TRIGGER revisions_immutable ON revisions`,
      `DROP TRIGGER revisions_no_truncate ON revisions`,
      `CREATE OR REPLACE FUNCTION revisions_refuse_change() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN RETURN NEW; END $$`,
      `SET session_replication_role = replica`,
      `CREATE TABLE revisions_copy (id int)`,
      `CREATE TRIGGER sneaky BEFORE UPDATE ON revisions FOR EACH ROW EXECUTE FUNCTION revisions_refuse_change()`,
      `ALTER TABLE revisions OWNER TO current_user`,
      `DELETE FROM migrations`,
    ];
    for (const sql of attempts) {
      const outcome = await db.query(sql).then(
        () => 'succeeded',
        (error: Error) => error.message,
      );
      expect([sql, outcome]).toEqual([sql, expect.stringMatching(denied)]);
    }
    // Still on, and still the trigger that refuses changes.
    const triggers = await db.query(
      `SELECT tgname, tgenabled FROM pg_trigger WHERE tgrelid = 'revisions'::regclass AND NOT tgisinternal ORDER BY tgname`,
    );
    expect(triggers).toEqual([
      { tgname: 'revisions_immutable', tgenabled: 'O' },
      { tgname: 'revisions_no_truncate', tgenabled: 'O' },
    ]);
    const [replication] = await db.query(`SHOW session_replication_role`);
    expect(replication.session_replication_role).toBe('origin');
    // What the app needs it still has: reading revisions and issuing new ones (the approval tests).
    const [grants] = await db.query(
      `SELECT has_table_privilege('revisions', 'SELECT') AS can_read, has_table_privilege('revisions', 'INSERT') AS can_insert,
              has_table_privilege('sheets', 'UPDATE') AS can_update_sheets`,
    );
    expect(grants).toEqual({ can_read: true, can_insert: true, can_update_sheets: true });
    await unchanged();
  });
});
