import { IsNull, Not } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PasswordReset } from '../src/entities/PasswordReset';
import { createPasswordReset } from '../src/services/passwordResets';
import { createInvitation, createTeam, createUser, signedInClient, TEST_PASSWORD, uniqueEmail, type Team } from './helpers/fixtures';
import { startTestServer, type TestServer } from './helpers/testServer';

/** The error body, asserted whole: status, code and the message that names the field. */
function expectError(response: { status: number; body: unknown }, status: number, code: string, message: string | RegExp): void {
  expect({ status: response.status, code: (response.body as { error?: { code?: string } }).error?.code }).toEqual({ status, code });
  const actual = (response.body as { error: { message: string } }).error.message;
  if (typeof message === 'string') expect(actual).toBe(message);
  else expect(actual).toMatch(message);
}

describe('bad input gets the documented status and a message naming the field', () => {
  let server: TestServer;
  let team: Team;

  beforeAll(async () => {
    server = await startTestServer();
    team = await createTeam(server.deps.dataSource, 'bad');
  });
  afterAll(async () => {
    await server?.close();
  });

  it('rejects a malformed e-mail and a short password at sign-up', async () => {
    const client = server.client();
    expectError(
      await client.post('/api/auth/signup', { email: 'not-an-address', password: TEST_PASSWORD, name: 'Ada' }),
      400,
      'invalid-field',
      'email: must be an e-mail address such as name@example.com',
    );
    expectError(
      await client.post('/api/auth/signup', { email: uniqueEmail(), password: 'short', name: 'Ada' }),
      400,
      'invalid-field',
      'password: must be at least 10 characters',
    );
    expectError(
      await client.post('/api/auth/signup', { email: 'x@', password: 'short', name: '' }),
      400,
      'invalid-field',
      'email: must be an e-mail address such as name@example.com; password: must be at least 10 characters; name: must not be empty',
    );
  });

  it('refuses a second account for the same address, whatever its case', async () => {
    const client = server.client();
    expectError(
      await client.post('/api/auth/signup', { email: team.users.viewer.email.toUpperCase(), password: TEST_PASSWORD, name: 'Twin' }),
      409,
      'conflict',
      'email: an account with this e-mail address already exists; sign in or reset the password',
    );
  });

  it('refuses a reused invitation (409) and an expired one (410)', async () => {
    const user = await createUser(server.deps.dataSource, 'reuse');
    const client = await signedInClient(server, user);
    const token = await createInvitation(server.deps.dataSource, { organizationId: team.organizationId, email: user.email, role: 'viewer' });
    expect((await client.post(`/api/invitations/${token}/accept`)).status).toBe(200);
    expectError(await client.post(`/api/invitations/${token}/accept`), 409, 'conflict', 'this invitation has already been used');

    const late = await createUser(server.deps.dataSource, 'late');
    const lateClient = await signedInClient(server, late);
    const expired = await createInvitation(server.deps.dataSource, {
      organizationId: team.organizationId,
      email: late.email,
      role: 'viewer',
      expiresInMs: -1000,
    });
    expect((await lateClient.get(`/api/invitations/${expired}`)).body.invitation.expired).toBe(true);
    expectError(
      await lateClient.post(`/api/invitations/${expired}/accept`),
      410,
      'expired',
      'this invitation has expired; ask an owner of the organization for a new one',
    );
    expectError(await lateClient.get('/api/invitations/no-such-token'), 404, 'not-found', 'invitation not found');
  });

  it('refuses an expired reset link (410), a used one and an unknown one (400)', async () => {
    const user = await createUser(server.deps.dataSource, 'reset-bad');
    const client = server.client();
    const expired = await createPasswordReset(server.deps.dataSource, user.id, -1);
    expectError(
      await client.post('/api/auth/reset/confirm', { token: expired, password: 'a fresh long passphrase' }),
      410,
      'expired',
      'token: this reset link has expired; ask for a new one',
    );
    const fresh = await createPasswordReset(server.deps.dataSource, user.id);
    expect((await client.post('/api/auth/reset/confirm', { token: fresh, password: 'a fresh long passphrase' })).status).toBe(204);
    for (const token of [fresh, 'made-up-token']) {
      expectError(
        await client.post('/api/auth/reset/confirm', { token, password: 'another long passphrase' }),
        400,
        'invalid-field',
        'token: this reset link is not valid or has already been used; ask for a new one',
      );
    }
    expectError(
      await client.post('/api/auth/reset/confirm', { token: 'made-up-token', password: 'short' }),
      400,
      'invalid-field',
      'password: must be at least 10 characters',
    );
    // Using one link spent the expired one too.
    expect(await server.deps.dataSource.getRepository(PasswordReset).countBy({ userId: user.id, usedAt: Not(IsNull()) })).toBe(2);
  });

  it('refuses state-changing requests without the CSRF token, with a wrong one, or from another site', async () => {
    const client = await signedInClient(server, team.users.engineer);
    const path = `/api/projects/${team.project.id}/sheets`;
    const message = 'x-csrf-token: missing or wrong; fetch one from GET /api/auth/csrf (a new one after every sign-in and sign-out)';
    expectError(await client.post(path, { title: 'No token' }, { csrf: false }), 403, 'csrf', message);
    expectError(await client.post(path, { title: 'Wrong token' }, { csrf: false, headers: { 'x-csrf-token': 'guess' } }), 403, 'csrf', message);
    expectError(
      await client.post(path, { title: 'Foreign page' }, { headers: { origin: 'https://elsewhere.example' } }),
      403,
      'csrf',
      'Origin: https://elsewhere.example may not send requests to this server',
    );
    expectError(
      await client.post(path, { title: 'Cross-site' }, { headers: { 'sec-fetch-site': 'cross-site' } }),
      403,
      'csrf',
      'Sec-Fetch-Site: requests from cross-site pages are refused',
    );
    // The same request with the token, from this origin, goes through.
    const good = await client.post(path, { title: 'With token' }, { headers: { origin: server.url, 'sec-fetch-site': 'same-origin' } });
    expect(good.status).toBe(201);
    // Reading needs no token.
    expect((await client.get(path)).status).toBe(200);
  });

  it('gives a new session and a new CSRF token at sign-in, so a token from before is dead', async () => {
    const client = server.client();
    const before = await client.csrf();
    const sessionBefore = client.sessionId;
    await client.signIn(team.users.viewer.email, TEST_PASSWORD);
    expect(client.sessionId).not.toBe(sessionBefore);
    expectError(
      await client.patch('/api/auth/me', { name: 'Stale token' }, { csrf: false, headers: { 'x-csrf-token': before } }),
      403,
      'csrf',
      /^x-csrf-token: missing or wrong/,
    );
    const after = await client.csrf();
    expect(after).not.toBe(before);
    expect((await client.patch('/api/auth/me', { name: team.users.viewer.name })).status).toBe(200);
  });

  it('checks sheet content, queries and ids, naming the field', async () => {
    const client = await signedInClient(server, team.users.engineer);
    expectError(
      await client.post(`/api/projects/${team.project.id}/sheets`, {
        title: 'Pad bearing',
        content: { format: 'sheaf-sheet', version: 2, cells: [{ id: 'k1' }] },
      }),
      400,
      'invalid-field',
      'content.version: must be 1 (the only version this server reads); content.cells.0.kind: is required',
    );
    expectError(
      await client.get(`/api/orgs/${team.organizationId}/sheets?status=finished`),
      400,
      'invalid-field',
      /^status: /,
    );
    expectError(await client.get('/api/sheets/not-a-uuid'), 404, 'not-found', 'sheet not found');
    expectError(await client.get('/api/sheets/00000000-0000-4000-8000-000000000000'), 404, 'not-found', 'sheet not found');
    expectError(
      await client.patch(`/api/sheets/${team.sheet.id}`, {}),
      400,
      'invalid-field',
      'body: give at least one of title, projectId',
    );
    expectError(
      await client.post(`/api/orgs/${team.organizationId}/projects`, { name: 'Jib crane', code: 'not a code!' }),
      400,
      'invalid-field',
      'code: must be 2 to 16 letters, digits or hyphens, starting and ending with a letter or digit',
    );
  });

  it('answers a wrong password with 401 and records the failure', async () => {
    const user = await createUser(server.deps.dataSource, 'wrong-password');
    const client = server.client();
    expectError(await client.post('/api/auth/signin', { email: user.email, password: 'not the password' }), 401, 'not-signed-in', 'e-mail or password is wrong');
    expectError(await client.post('/api/auth/signin', { email: uniqueEmail('nobody'), password: 'not the password' }), 401, 'not-signed-in', 'e-mail or password is wrong');
    const failures: { n: number }[] = await server.deps.dataSource.query(
      `SELECT count(*)::int AS n FROM audit_events WHERE action = 'auth.signin-failed' AND subject = $1`,
      [user.email],
    );
    expect(failures[0]?.n).toBe(1);
  });
});

describe('rate limits on sign-in, with the limits used in production', () => {
  let server: TestServer;

  beforeAll(async () => {
    server = await startTestServer({ overrides: { rateLimits: { signInPerAccount: 20, signInPerIp: 30, signUpPerIp: 2, resetPerIp: 3 } } });
  });
  afterAll(async () => {
    await server?.close();
  });

  it('answers 429 after 20 rapid failed sign-ins for one account, even with the right password, and not for others', async () => {
    const target = await createUser(server.deps.dataSource, 'hammered');
    const bystander = await createUser(server.deps.dataSource, 'bystander');
    const client = server.client();
    const statuses: number[] = [];
    for (let i = 0; i < 20; i += 1) {
      statuses.push((await client.post('/api/auth/signin', { email: target.email, password: `guess number ${i}` })).status);
    }
    expect(statuses).toEqual(Array(20).fill(401));
    expectError(
      await client.post('/api/auth/signin', { email: target.email, password: TEST_PASSWORD }),
      429,
      'rate-limited',
      'too many failed sign-ins for this account; wait 15 minutes and try again, or reset the password',
    );
    // The same address in capitals is the same account.
    expect((await client.post('/api/auth/signin', { email: target.email.toUpperCase(), password: TEST_PASSWORD })).status).toBe(429);
    // Another account from the same address still signs in.
    expect((await server.client().post('/api/auth/signin', { email: bystander.email, password: TEST_PASSWORD })).status).toBe(200);
  });

  it('answers 429 once one address has failed 30 times across accounts', async () => {
    const client = server.client();
    const statuses: number[] = [];
    // 22 failures so far from the test above; eight more different accounts reach 30.
    for (let i = 0; i < 8; i += 1) {
      statuses.push((await client.post('/api/auth/signin', { email: uniqueEmail('spray'), password: 'not the password' })).status);
    }
    expect(statuses).toEqual(Array(8).fill(401));
    const user = await createUser(server.deps.dataSource, 'after-spray');
    expectError(
      await client.post('/api/auth/signin', { email: user.email, password: TEST_PASSWORD }),
      429,
      'rate-limited',
      'too many failed sign-ins from this network address; wait 15 minutes and try again',
    );
  });

  it('limits sign-ups and reset requests per network address', async () => {
    const client = server.client();
    for (let i = 0; i < 2; i += 1) {
      expect((await client.post('/api/auth/signup', { email: uniqueEmail('limited'), password: TEST_PASSWORD, name: 'Limited' })).status).toBe(201);
    }
    expectError(
      await client.post('/api/auth/signup', { email: uniqueEmail('limited'), password: TEST_PASSWORD, name: 'Limited' }),
      429,
      'rate-limited',
      'too many sign-ups from this network address; wait 15 minutes and try again',
    );
    for (let i = 0; i < 3; i += 1) expect((await client.post('/api/auth/reset/request', { email: uniqueEmail() })).status).toBe(202);
    expectError(
      await client.post('/api/auth/reset/request', { email: uniqueEmail() }),
      429,
      'rate-limited',
      'too many password reset requests from this network address; wait 15 minutes and try again',
    );
  });
});
