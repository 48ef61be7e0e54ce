import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TOUCH_EVERY_MS } from '../src/auth/sessionStore';
import { createUser, signedInClient } from './helpers/fixtures';
import { startTestServer, type TestServer } from './helpers/testServer';

/**
 * A signed-in request reads its session and its user in one query, and the session row's expiry
 * is written at most once per ten minutes: cheaper, and not one bit less current. A renamed user
 * shows the new name on the next request; a deleted user is nobody at once.
 */
describe('sessions read with their user', () => {
  let server: TestServer;

  beforeAll(async () => {
    server = await startTestServer();
  });
  afterAll(async () => {
    await server?.close();
  });

  /** The session's stored expiry; the session id is the cookie's value before the signature. */
  async function storedExpiry(sessionCookie: string): Promise<Date> {
    const sid = decodeURIComponent(sessionCookie).replace(/^s:/, '').split('.')[0];
    const [row] = await server.deps.dataSource.query(`SELECT expire FROM sessions WHERE sid = $1`, [sid]);
    return row.expire as Date;
  }

  it('sees a rename at once, and a deleted user as nobody at once', async () => {
    const user = await createUser(server.deps.dataSource, 'reader');
    const client = await signedInClient(server, user);
    expect((await client.get('/api/auth/me')).body.user).toEqual({ id: user.id, email: user.email, name: user.name });

    await server.deps.dataSource.query(`UPDATE users SET name = 'Renamed reader' WHERE id = $1`, [user.id]);
    expect((await client.get('/api/auth/me')).body.user.name).toBe('Renamed reader');

    await server.deps.dataSource.query(`DELETE FROM users WHERE id = $1`, [user.id]);
    const after = await client.get('/api/auth/me');
    expect([after.status, after.body.error.code]).toEqual([401, 'not-signed-in']);
  });

  it(`writes the session's expiry once, not on every request (at most every ${TOUCH_EVERY_MS / 60_000} minutes)`, async () => {
    const user = await createUser(server.deps.dataSource, 'toucher');
    const client = await signedInClient(server, user);
    await client.get('/api/auth/me');
    const first = await storedExpiry(client.sessionId!);
    await new Promise((resolve) => setTimeout(resolve, 1100));
    for (let i = 0; i < 3; i++) expect((await client.get('/api/auth/me')).status).toBe(200);
    expect(await storedExpiry(client.sessionId!)).toEqual(first);
  });
});
