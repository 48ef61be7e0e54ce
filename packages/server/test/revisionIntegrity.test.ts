import pg from 'pg';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { createTeam, signedInClient, type Team } from './helpers/fixtures';
import { approvedSheet } from './helpers/review';
import type { TestClient } from './helpers/TestClient';
import { startTestServer, type TestServer } from './helpers/testServer';

/**
 * Every time a revision is served its content is checked against the sha-256 recorded when it
 * was issued. Here a superuser (who alone can get past the trigger) changes one in place: every
 * route that would show it answers a loud 500 `integrity` instead, and it is never shown as
 * approved; put back as it was, it is served again.
 */
describe('issued revisions are checked against their hash whenever they are served', () => {
  let server: TestServer;
  let team: Team;
  let engineer: TestClient;
  let sheetId: string;
  let superuser: pg.Client;

  beforeAll(async () => {
    server = await startTestServer();
    team = await createTeam(server.deps.dataSource, 'integrity');
    engineer = await signedInClient(server, team.users.engineer);
    sheetId = await approvedSheet(server.deps.dataSource, team);
    const admin = new URL(inject('adminUrl'));
    admin.pathname = new URL(inject('databaseUrl')).pathname;
    superuser = new pg.Client({ connectionString: admin.toString() });
    await superuser.connect();
  });
  afterAll(async () => {
    await superuser?.end();
    await server?.close();
  });

  /** Changes revision 1's content behind the trigger's back (only a superuser can). */
  async function tamper(title: string): Promise<void> {
    await superuser.query(`SET session_replication_role = replica`);
    try {
      await superuser.query(`UPDATE revisions SET content = jsonb_set(content, '{title}', to_jsonb($2::text)) WHERE sheet_id = $1 AND number = 1`, [
        sheetId,
        title,
      ]);
    } finally {
      await superuser.query(`SET session_replication_role = origin`);
    }
  }

  const reads = () => [
    `/api/sheets/${sheetId}/revisions`,
    `/api/sheets/${sheetId}/revisions/1`,
    `/api/sheets/${sheetId}/review`,
    `/api/sheets/${sheetId}/history`,
    `/api/sheets/${sheetId}/diff?from=1&to=current`,
  ];

  it('serves an intact revision, as approved, from every route', async () => {
    for (const path of reads()) expect([path, (await engineer.get(path)).status]).toEqual([path, 200]);
    const review = await engineer.get(`/api/sheets/${sheetId}/review`);
    expect(review.body.review.status).toBe('approved');
    expect(review.body.review.signatures.approved).not.toBeNull();
  });

  it('answers 500 integrity, naming the revision, once its content no longer matches its hash', async () => {
    const [{ title }] = (await superuser.query(`SELECT content ->> 'title' AS title FROM revisions WHERE sheet_id = $1 AND number = 1`, [sheetId])).rows;
    await tamper(`${title} (quietly changed)`);
    try {
      for (const path of reads()) {
        const response = await engineer.get(path);
        expect([path, response.status, response.body.error?.code]).toEqual([path, 500, 'integrity']);
        expect(response.body.error.message).toMatch(/^revision 1 does not match the sha-256 recorded when it was issued/);
      }
      const template = await engineer.post(`/api/sheets/${sheetId}/templates/from-revision/1`, { title: 'From a changed revision', description: '', category: 'Lugs', parameters: [] });
      expect([template.status, template.body.error?.code]).toEqual([500, 'integrity']);
    } finally {
      await tamper(title);
    }
    for (const path of reads()) expect([path, (await engineer.get(path)).status]).toEqual([path, 200]);
  });
});
