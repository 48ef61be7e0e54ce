import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createUser, linkIn, signedInClient, waitForMail } from './helpers/fixtures';
import { startTestServer, type TestServer } from './helpers/testServer';

describe('password reset by e-mailed one-time link', () => {
  let server: TestServer;

  beforeAll(async () => {
    server = await startTestServer();
  });
  afterAll(async () => {
    await server?.close();
  });

  it('mails a link valid for an hour that sets a new password once and signs the user out everywhere', async () => {
    const user = await createUser(server.deps.dataSource, 'forgetful');
    const elsewhere = await signedInClient(server, user);
    expect((await elsewhere.get('/api/auth/me')).status).toBe(200);

    const client = server.client();
    const requested = await client.post('/api/auth/reset/request', { email: user.email.toUpperCase() });
    expect(requested.status).toBe(202);
    expect(requested.text).toBe('');

    const mail = await waitForMail(client, user.email);
    expect(mail.subject).toBe('Set a new Sheaf password');
    expect(mail.text).toContain('for 60 minutes');
    const link = linkIn(mail, '/reset/');
    const token = link.split('/reset/')[1] as string;
    const stored: { expires_at: Date; created_at: Date }[] = await server.deps.dataSource.query(
      `SELECT expires_at, created_at FROM password_resets WHERE user_id = $1`,
      [user.id],
    );
    expect(stored).toHaveLength(1);
    expect((stored[0]!.expires_at.getTime() - stored[0]!.created_at.getTime()) / 60_000).toBeCloseTo(60, 1);

    const confirmed = await client.post('/api/auth/reset/confirm', { token, password: 'my new long passphrase' });
    expect(confirmed.status).toBe(204);

    expect((await elsewhere.get('/api/auth/me')).status).toBe(401);
    expect((await server.client().post('/api/auth/signin', { email: user.email, password: user.password })).status).toBe(401);
    expect((await server.client().post('/api/auth/signin', { email: user.email, password: 'my new long passphrase' })).status).toBe(200);
    expect((await client.post('/api/auth/reset/confirm', { token, password: 'yet another passphrase' })).status).toBe(400);

    const audit: { n: number }[] = await server.deps.dataSource.query(
      `SELECT count(*)::int AS n FROM audit_events WHERE action = 'auth.password-reset' AND actor_user_id = $1`,
      [user.id],
    );
    expect(audit[0]?.n).toBe(1);
  });

  it('answers 202 for an unknown address too, and sends nothing', async () => {
    const client = server.client();
    const nobody = `nobody-${Date.now()}@test.sheaf.test`;
    expect((await client.post('/api/auth/reset/request', { email: nobody })).status).toBe(202);
    // A known address sent afterwards arrives; the unknown one never does.
    const known = await createUser(server.deps.dataSource, 'known');
    await client.post('/api/auth/reset/request', { email: known.email });
    await waitForMail(client, known.email);
    const inbox = await client.get('/api/dev/mail');
    expect(inbox.body.messages.some((m: { to: string }) => m.to.includes(nobody))).toBe(false);
  });
});
