import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTeam, linkIn, signedInClient, TEST_PASSWORD, uniqueEmail, waitForMail, type Team } from './helpers/fixtures';
import { startTestServer, type TestServer } from './helpers/testServer';

describe('invitation round trip through the API and the fake SMTP', () => {
  let server: TestServer;
  let team: Team;

  beforeAll(async () => {
    server = await startTestServer();
    team = await createTeam(server.deps.dataSource, 'invite');
  });
  afterAll(async () => {
    await server?.close();
  });

  it('owner invites, the mail arrives, a new user signs up, accepts and lands with the invited role', async () => {
    const owner = await signedInClient(server, team.users.owner);
    const email = uniqueEmail('new-checker');

    const sent = await owner.post(`/api/orgs/${team.organizationId}/invitations`, { email, role: 'checker' });
    expect(sent.status).toBe(201);
    expect(sent.body.invitation).toMatchObject({ email, role: 'checker' });
    const days = (Date.parse(sent.body.invitation.expiresAt) - Date.parse(sent.body.invitation.createdAt)) / 86_400_000;
    expect(days).toBeCloseTo(7, 3);

    const listed = await owner.get(`/api/orgs/${team.organizationId}/members`);
    expect(listed.body.invitations.map((i: { email: string }) => i.email)).toContain(email);

    const mail = await waitForMail(owner, email);
    expect(mail.subject).toBe(`Join ${team.organizationName} on Sheaf`);
    expect(mail.text).toContain('as a checker');
    expect(mail.html).toContain('Accept the invitation');
    const link = linkIn(mail, '/invite/');
    expect(link.startsWith(`${server.url}/invite/`)).toBe(true);
    const token = decodeURIComponent(link.slice(`${server.url}/invite/`.length));
    // The dev inbox page shows it too, with the link clickable.
    const inboxPage = await owner.get('/dev/mail');
    expect(inboxPage.headers.get('content-type')).toContain('text/html');
    expect(inboxPage.text).toContain(`to ${email}`);
    expect(inboxPage.text).toContain(`<a href="${link}">`);

    // The invitation page works before anyone signs in.
    const newcomer = server.client();
    const preview = await newcomer.get(`/api/invitations/${token}`);
    expect(preview.status).toBe(200);
    expect(preview.body.invitation).toEqual({
      organization: { id: team.organizationId, name: team.organizationName },
      email,
      role: 'checker',
      expired: false,
      accepted: false,
    });

    expect((await newcomer.post(`/api/invitations/${token}/accept`)).status).toBe(401);
    const signup = await newcomer.post('/api/auth/signup', { email, password: TEST_PASSWORD, name: 'Nora Checker' });
    expect(signup.status).toBe(201);
    const accepted = await newcomer.post(`/api/invitations/${token}/accept`);
    expect(accepted.status).toBe(200);
    expect(accepted.body).toMatchObject({ organization: { id: team.organizationId }, role: 'checker' });

    const me = await newcomer.get('/api/auth/me');
    expect(me.body.memberships).toEqual([
      { organization: { id: team.organizationId, name: team.organizationName, slug: expect.any(String) }, role: 'checker' },
    ]);
    // A checker reads the organization's sheets but cannot create one.
    expect((await newcomer.get(`/api/projects/${team.project.id}/sheets`)).status).toBe(200);
    expect((await newcomer.post(`/api/projects/${team.project.id}/sheets`, { title: 'Not mine to make' })).status).toBe(403);

    const after = await owner.get(`/api/orgs/${team.organizationId}/members`);
    expect(after.body.invitations.map((i: { email: string }) => i.email)).not.toContain(email);
    expect(after.body.members).toContainEqual(expect.objectContaining({ user: expect.objectContaining({ email }), role: 'checker' }));
    expect((await newcomer.get(`/api/invitations/${token}`)).body.invitation.accepted).toBe(true);

    const audit: { action: string; subject: string }[] = await server.deps.dataSource.query(
      `SELECT action, subject FROM audit_events WHERE organization_id = $1 AND subject = $2 ORDER BY id`,
      [team.organizationId, email],
    );
    expect(audit.map((a) => a.action)).toEqual(['invitation.sent', 'invitation.accepted']);
  });

  it('refuses to invite a current member, and only the invited address may accept', async () => {
    const owner = await signedInClient(server, team.users.owner);
    const again = await owner.post(`/api/orgs/${team.organizationId}/invitations`, { email: team.users.viewer.email, role: 'engineer' });
    expect(again.status).toBe(409);
    expect(again.body.error.message).toBe(`email: ${team.users.viewer.email} is already a member of ${team.organizationName}`);

    const email = uniqueEmail('intended');
    await owner.post(`/api/orgs/${team.organizationId}/invitations`, { email, role: 'viewer' });
    const token = decodeURIComponent(linkIn(await waitForMail(owner, email), '/invite/').split('/invite/')[1] as string);
    const wrongPerson = await signedInClient(server, team.users.outsider);
    const refused = await wrongPerson.post(`/api/invitations/${token}/accept`);
    expect(refused.status).toBe(403);
    expect(refused.body.error).toEqual({
      code: 'forbidden',
      message: `this invitation was sent to ${email}; sign in with that address to accept it`,
    });
  });

  it('replaces an open invitation to the same address, so only the newest link works', async () => {
    const owner = await signedInClient(server, team.users.owner);
    const email = uniqueEmail('twice');
    await owner.post(`/api/orgs/${team.organizationId}/invitations`, { email, role: 'viewer' });
    const first = linkIn(await waitForMail(owner, email), '/invite/');
    await owner.post(`/api/orgs/${team.organizationId}/invitations`, { email, role: 'engineer' });
    const second = linkIn(await waitForMail(owner, email, (m) => !m.text.includes(first)), '/invite/');
    expect(second).not.toBe(first);
    const tokenOf = (link: string) => link.split('/invite/')[1] as string;
    expect((await owner.get(`/api/invitations/${tokenOf(first)}`)).status).toBe(404);
    expect((await owner.get(`/api/invitations/${tokenOf(second)}`)).body.invitation.role).toBe('engineer');
    const open = (await owner.get(`/api/orgs/${team.organizationId}/members`)).body.invitations.filter((i: { email: string }) => i.email === email);
    expect(open).toHaveLength(1);
  });
});
