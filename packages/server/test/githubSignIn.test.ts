import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Identity } from '../src/entities/Identity';
import type { FakeOAuthAccount } from '../src/fakes/oauthAccounts';
import { createUser, signedInClient, TEST_PASSWORD, userRow, type TestUser } from './helpers/fixtures';
import type { TestClient } from './helpers/TestClient';
import { startTestServer, type TestServer } from './helpers/testServer';

const tag = randomUUID().slice(0, 8);
let nextId = 90_000 + Math.floor(Math.random() * 5_000);

function account(name: string, email: string, verified = true): FakeOAuthAccount {
  nextId += 1;
  return {
    id: nextId,
    login: `${name.toLowerCase().replace(/\W+/g, '-')}-${tag}`,
    name,
    emails: [{ email, primary: true, verified }],
    note: 'test account',
  };
}

/**
 * The browser side of provider sign-in up to the provider's answer: Sheaf's redirect to the
 * provider, the consent page, and picking an account (the form post). Returns the callback URL
 * the provider sends the browser to.
 */
async function providerCallbackUrl(server: TestServer, client: TestClient, pick: FakeOAuthAccount | 'deny'): Promise<string> {
  const start = await client.get('/auth/github');
  expect(start.status).toBe(302);
  const authorize = new URL(start.location as string);
  expect(`${authorize.origin}${authorize.pathname}`).toBe(`${server.url}/fake-oauth/authorize`);
  expect(authorize.searchParams.get('redirect_uri')).toBe(`${server.url}/auth/github/callback`);
  const state = authorize.searchParams.get('state');
  expect(state).toMatch(/\S{8,}/);

  const consent = await client.get(authorize.toString());
  expect(consent.status).toBe(200);
  expect(consent.headers.get('content-type')).toContain('text/html');

  const form = new URLSearchParams({
    redirect_uri: authorize.searchParams.get('redirect_uri') as string,
    state: state as string,
    account: pick === 'deny' ? 'deny' : String(pick.id),
  });
  const picked = await client.request('POST', `${server.url}/fake-oauth/authorize`, {
    rawBody: form.toString(),
    headers: { 'content-type': 'application/x-www-form-urlencoded' },
  });
  expect(picked.status).toBe(302);
  const callback = new URL(picked.location as string, server.url).toString();
  expect(callback.startsWith(`${server.url}/auth/github/callback?`)).toBe(true);
  return callback;
}

/** The whole round trip, following Sheaf's callback; returns where Sheaf sent the browser at the end. */
async function signInWithProvider(server: TestServer, client: TestClient, pick: FakeOAuthAccount | 'deny'): Promise<string> {
  const callback = await providerCallbackUrl(server, client, pick);
  const answer = await client.get(callback);
  expect(answer.status).toBe(302);
  return answer.location as string;
}

describe('GitHub sign-in against the local fake provider', () => {
  let server: TestServer;
  let verifiedUser: TestUser;
  const accounts = {
    newcomer: account('Nadia Newcomer', `nadia-${tag}@fake-provider.test`),
    verifiedTwin: account('Vera Verified', `vera-${tag}@test.sheaf.test`),
    unverifiedTwin: account('Uma Unproven', `uma-${tag}@test.sheaf.test`),
    noVerifiedEmail: account('Nils Nomail', `nils-${tag}@fake-provider.test`, false),
  };

  beforeAll(async () => {
    server = await startTestServer({ overrides: { fakeOauthAccounts: Object.values(accounts) } });
    // Vera proved her address earlier (say, through an invitation); Uma never did.
    const rows: { id: string }[] = await server.deps.dataSource.query(
      `INSERT INTO users (email, name, password_hash, email_verified_at)
       SELECT $1, 'Vera Verified', password_hash, now() FROM users WHERE id = $2 RETURNING id`,
      [accounts.verifiedTwin.emails[0]?.email, (await createUser(server.deps.dataSource, 'hash-source')).id],
    );
    verifiedUser = { id: (rows[0] as { id: string }).id, email: accounts.verifiedTwin.emails[0]?.email as string, name: 'Vera Verified', password: TEST_PASSWORD };
  });
  afterAll(async () => {
    await server?.close();
  });

  it('lists the offered accounts on its consent page', async () => {
    const client = server.client();
    const start = await client.get('/auth/github');
    const page = await client.get(start.location as string);
    for (const offered of Object.values(accounts)) expect(page.text).toContain(offered.name);
    expect(page.text).toContain('(unverified)');
  });

  it('creates an account for a newcomer, signs in with a new session, and knows the identity next time', async () => {
    const client = server.client();
    await client.csrf();
    const anonymousSession = client.sessionId;
    expect(await signInWithProvider(server, client, accounts.newcomer)).toBe('/');
    expect(client.sessionId).toBeDefined();
    expect(client.sessionId).not.toBe(anonymousSession);

    const me = await client.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user).toMatchObject({ email: accounts.newcomer.emails[0]?.email, name: 'Nadia Newcomer' });
    expect(me.body.memberships).toEqual([]);

    const identity = await server.deps.dataSource.getRepository(Identity).findOneByOrFail({ provider: 'github', providerUserId: String(accounts.newcomer.id) });
    expect(identity.userId).toBe(me.body.user.id);
    expect((await userRow(server.deps.dataSource, me.body.user.id)).emailVerifiedAt).not.toBeNull();

    const again = server.client();
    expect(await signInWithProvider(server, again, accounts.newcomer)).toBe('/');
    expect((await again.get('/api/auth/me')).body.user.id).toBe(me.body.user.id);
    const identities = await server.deps.dataSource.getRepository(Identity).countBy({ userId: me.body.user.id });
    expect(identities).toBe(1);

    const audit: { action: string }[] = await server.deps.dataSource.query(
      `SELECT action FROM audit_events WHERE actor_user_id = $1 ORDER BY id`,
      [me.body.user.id],
    );
    expect(audit.map((a) => a.action)).toEqual(['auth.signup', 'auth.signin', 'auth.signin']);
  });

  it('links to the existing account with the same verified e-mail, keeping its password', async () => {
    const client = server.client();
    expect(await signInWithProvider(server, client, accounts.verifiedTwin)).toBe('/');
    const me = await client.get('/api/auth/me');
    expect(me.body.user.id).toBe(verifiedUser.id);
    const identity = await server.deps.dataSource.getRepository(Identity).findOneByOrFail({ providerUserId: String(accounts.verifiedTwin.id) });
    expect(identity.userId).toBe(verifiedUser.id);
    // The password still signs in.
    await signedInClient(server, verifiedUser);
  });

  it('links to an account whose address was never proven, but clears its password and ends its sessions', async () => {
    const email = accounts.unverifiedTwin.emails[0]?.email as string;
    const squatter = server.client();
    const signup = await squatter.post('/api/auth/signup', { email, password: TEST_PASSWORD, name: 'Uma Unproven' });
    expect(signup.status).toBe(201);
    expect((await squatter.get('/api/auth/me')).status).toBe(200);

    const owner = server.client();
    expect(await signInWithProvider(server, owner, accounts.unverifiedTwin)).toBe('/');
    expect((await owner.get('/api/auth/me')).body.user.id).toBe(signup.body.user.id);

    expect((await squatter.get('/api/auth/me')).status).toBe(401);
    const retry = await server.client().post('/api/auth/signin', { email, password: TEST_PASSWORD });
    expect(retry.status).toBe(401);
    expect((await userRow(server.deps.dataSource, signup.body.user.id)).passwordHash).toBeNull();
  });

  it('refuses an account without a verified e-mail and says why', async () => {
    const client = server.client();
    expect(await signInWithProvider(server, client, accounts.noVerifiedEmail)).toBe('/signin?error=github-no-verified-email');
    expect((await client.get('/api/auth/me')).status).toBe(401);
  });

  it('sends the browser back to sign-in when the person cancels at the provider', async () => {
    const client = server.client();
    expect(await signInWithProvider(server, client, 'deny')).toBe('/signin?error=github-denied');
    expect((await client.get('/api/auth/me')).status).toBe(401);
  });

  it("rejects a callback carrying another browser's code and state (login forgery)", async () => {
    // The attacker gets a valid code for their own account but does not use it...
    const attacker = server.client();
    const forgedCallback = await providerCallbackUrl(server, attacker, accounts.newcomer);
    // ...and gets the victim's browser, which has a sign-in of its own under way, to open it.
    const victim = server.client();
    await victim.get('/auth/github');
    const answer = await victim.get(forgedCallback);
    expect(answer.status).toBe(302);
    expect(answer.location).toBe('/signin?error=github');
    expect((await victim.get('/api/auth/me')).status).toBe(401);
  });
});
