import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { changeMemberRole } from '../src/services/members';
import { addMember, createTeam, createUser, signedInClient, type Team } from './helpers/fixtures';
import { startTestServer, type TestServer } from './helpers/testServer';

describe('organizations and their members', () => {
  let server: TestServer;
  let team: Team;

  beforeAll(async () => {
    server = await startTestServer();
    team = await createTeam(server.deps.dataSource, 'members');
  });
  afterAll(async () => {
    await server?.close();
  });

  it('makes the creator of an organization its owner, under a free slug', async () => {
    const founder = await createUser(server.deps.dataSource, 'founder');
    const client = await signedInClient(server, founder);
    const first = await client.post('/api/orgs', { name: 'Ridgeway Hoists & Rigging' });
    expect(first.status).toBe(201);
    expect(first.body.organization).toMatchObject({ name: 'Ridgeway Hoists & Rigging', role: 'owner' });
    expect(first.body.organization.slug).toMatch(/^ridgeway-hoists-rigging(-\d+)?$/);
    const second = await client.post('/api/orgs', { name: 'Ridgeway Hoists & Rigging' });
    expect(second.body.organization.slug).not.toBe(first.body.organization.slug);

    const list = await client.get('/api/orgs');
    expect(list.body.organizations.map((o: { id: string }) => o.id).sort()).toEqual(
      [first.body.organization.id, second.body.organization.id].sort(),
    );
    const members = await client.get(`/api/orgs/${first.body.organization.id}/members`);
    expect(members.body.members).toEqual([
      { user: { id: founder.id, email: founder.email, name: founder.name }, role: 'owner', joinedAt: expect.any(String) },
    ]);
  });

  it('lists members owners first, and changes a role with an audit record', async () => {
    const owner = await signedInClient(server, team.users.owner);
    const listed = await owner.get(`/api/orgs/${team.organizationId}/members`);
    expect(listed.body.members.map((m: { role: string }) => m.role)).toEqual(['owner', 'engineer', 'checker', 'viewer']);

    const changed = await owner.patch(`/api/orgs/${team.organizationId}/members/${team.users.viewer.id}`, { role: 'engineer' });
    expect(changed.status).toBe(200);
    expect(changed.body.member).toMatchObject({ user: { id: team.users.viewer.id }, role: 'engineer' });

    const former = await signedInClient(server, team.users.viewer);
    expect((await former.post(`/api/projects/${team.project.id}/sheets`, { title: 'Now I may' })).status).toBe(201);

    const audit: { details: { from: string; to: string } }[] = await server.deps.dataSource.query(
      `SELECT details FROM audit_events WHERE action = 'member.role-changed' AND organization_id = $1 AND actor_user_id = $2`,
      [team.organizationId, team.users.owner.id],
    );
    expect(audit.map((a) => a.details)).toEqual([{ userId: team.users.viewer.id, from: 'viewer', to: 'engineer' }]);
  });

  it('always keeps one owner: the last owner can be neither demoted nor removed', async () => {
    const owner = await signedInClient(server, team.users.owner);
    const base = `/api/orgs/${team.organizationId}/members/${team.users.owner.id}`;
    const demote = await owner.patch(base, { role: 'engineer' });
    expect(demote.status).toBe(409);
    expect(demote.body.error).toEqual({ code: 'last-owner', message: 'an organization keeps at least one owner: make another member owner first' });
    expect((await owner.delete(base)).status).toBe(409);

    // With a second owner, the first may step down.
    const deputy = await createUser(server.deps.dataSource, 'deputy');
    await addMember(server.deps.dataSource, team.organizationId, deputy.id, 'owner');
    expect((await owner.patch(base, { role: 'engineer' })).status).toBe(200);
    const deputyClient = await signedInClient(server, deputy);
    const deputyBase = `/api/orgs/${team.organizationId}/members/${deputy.id}`;
    expect((await deputyClient.delete(deputyBase)).status).toBe(409);
    expect((await deputyClient.patch(base, { role: 'owner' })).status).toBe(200);
  });

  it('removes a member, who then sees the organization as if it did not exist', async () => {
    const owner = await signedInClient(server, team.users.owner);
    const leaving = await createUser(server.deps.dataSource, 'leaving');
    await addMember(server.deps.dataSource, team.organizationId, leaving.id, 'checker');
    const leaver = await signedInClient(server, leaving);
    expect((await leaver.get(`/api/sheets/${team.sheet.id}`)).status).toBe(200);

    expect((await owner.delete(`/api/orgs/${team.organizationId}/members/${leaving.id}`)).status).toBe(204);
    const after = await leaver.get(`/api/sheets/${team.sheet.id}`);
    expect(after.status).toBe(404);
    expect(after.body.error).toEqual({ code: 'not-found', message: 'sheet not found' });
    expect((await owner.delete(`/api/orgs/${team.organizationId}/members/${leaving.id}`)).status).toBe(404);
  });

  it('keeps one owner when two owners demote each other at the same moment', async () => {
    const ownerCount = async (organizationId: string) =>
      ((await server.deps.dataSource.query(
        `SELECT count(*)::int AS n FROM memberships WHERE organization_id = $1 AND role = 'owner'`,
        [organizationId],
      )) as { n: number }[])[0]?.n;

    // Through the API: whichever lands second is refused, by the role check (403) if the first has
    // already committed, or by the owner lock (409) if both passed the role check.
    const org = await createTeam(server.deps.dataSource, 'race');
    const second = await createUser(server.deps.dataSource, 'second-owner');
    await addMember(server.deps.dataSource, org.organizationId, second.id, 'owner');
    const a = await signedInClient(server, org.users.owner);
    const b = await signedInClient(server, second);
    const answers = await Promise.all([
      a.patch(`/api/orgs/${org.organizationId}/members/${second.id}`, { role: 'viewer' }),
      b.patch(`/api/orgs/${org.organizationId}/members/${org.users.owner.id}`, { role: 'viewer' }),
    ]);
    const statuses = answers.map((r) => r.status).sort();
    expect(statuses[0]).toBe(200);
    expect([403, 409]).toContain(statuses[1]);
    expect(await ownerCount(org.organizationId)).toBe(1);

    // Past the role check (both transactions at once), the owner lock alone decides.
    const org2 = await createTeam(server.deps.dataSource, 'race-locked');
    const second2 = await createUser(server.deps.dataSource, 'second-owner');
    await addMember(server.deps.dataSource, org2.organizationId, second2.id, 'owner');
    const results = await Promise.allSettled([
      changeMemberRole(server.deps.dataSource, org2.organizationId, second2.id, 'viewer', { userId: org2.users.owner.id }),
      changeMemberRole(server.deps.dataSource, org2.organizationId, org2.users.owner.id, 'viewer', { userId: second2.id }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual(['fulfilled', 'rejected']);
    const refusal = results.find((r) => r.status === 'rejected') as PromiseRejectedResult;
    expect(refusal.reason).toMatchObject({ status: 409, code: 'last-owner' });
    expect(await ownerCount(org2.organizationId)).toBe(1);
  });

  it('lets a member change their own display name', async () => {
    const me = await signedInClient(server, team.users.checker);
    const renamed = await me.patch('/api/auth/me', { name: '  Chandra P.  ' });
    expect(renamed.body.user.name).toBe('Chandra P.');
    expect((await me.get('/api/auth/me')).body.user.name).toBe('Chandra P.');
  });
});
