import { randomBytes } from 'node:crypto';
import express, { Router, type Request } from 'express';
import { escapeHtml, renderPage } from '../http/html';
import type { FakeOAuthAccount } from './oauthAccounts';

/** Paths of the fake provider, relative to the server's own address. */
export const FAKE_OAUTH_PATHS = {
  authorize: '/fake-oauth/authorize',
  token: '/fake-oauth/token',
  user: '/fake-oauth/user',
  emails: '/fake-oauth/user/emails',
} as const;

interface FakeOAuthOptions {
  accounts: FakeOAuthAccount[];
  clientId: string;
  clientSecret: string;
  /** The only redirect URI the provider sends codes to. */
  callbackUrl: string;
}

interface Grant {
  accountId: number;
  redirectUri: string;
  expiresAt: number;
}

const CODE_LIFETIME_MS = 60_000;

function oauthError(res: express.Response, status: number, error: string, description: string): void {
  res.status(status).json({ error, error_description: description });
}

function bearerToken(req: Request): string | undefined {
  const header = req.get('authorization') ?? '';
  const match = /^(?:token|bearer)\s+(\S+)$/i.exec(header);
  if (match) return match[1];
  return typeof req.query.access_token === 'string' ? req.query.access_token : undefined;
}

function consentPage(options: FakeOAuthOptions, redirectUri: string, state: string): string {
  const accounts = options.accounts
    .map(
      (account) => `
      <li style="margin:.75rem 0;list-style:none">
        <button type="submit" name="account" value="${account.id}"
          style="width:100%;text-align:left;padding:.6rem .8rem;border:1px solid #8a8f96;border-radius:4px;background:#fff">
          <strong>${escapeHtml(account.name)}</strong> <span class="tag">@${escapeHtml(account.login)}</span><br>
          <code>${escapeHtml(account.emails.map((e) => `${e.email}${e.verified ? '' : ' (unverified)'}`).join(', '))}</code><br>
          <small>${escapeHtml(account.note)}</small>
        </button>
      </li>`,
    )
    .join('');
  return renderPage(
    'Fake sign-in provider',
    `<h1>Fake sign-in provider</h1>
     <p class="lead">A local stand-in for the hosted sign-in service, for development and tests only.
     Pick the account to sign in as.</p>
     <form method="post" action="${FAKE_OAUTH_PATHS.authorize}">
       <input type="hidden" name="redirect_uri" value="${escapeHtml(redirectUri)}">
       <input type="hidden" name="state" value="${escapeHtml(state)}">
       <ul style="padding:0">${accounts}</ul>
       <button type="submit" name="account" value="deny">Cancel</button>
     </form>`,
  );
}

/**
 * A local stand-in for the OAuth provider (authorize page, token exchange, user and e-mail
 * endpoints), shaped like the hosted one so passport-github2 talks to it unchanged. Mounted only in
 * development and test. Codes and tokens live in memory.
 */
export function createFakeOAuthProvider(options: FakeOAuthOptions): Router {
  const router = Router();
  const codes = new Map<string, Grant>();
  const tokens = new Map<string, number>();
  const form = express.urlencoded({ extended: false, limit: '16kb' });

  router.get(FAKE_OAUTH_PATHS.authorize, (req, res) => {
    const { client_id: clientId, redirect_uri: redirectUri, state } = req.query;
    if (clientId !== options.clientId) {
      res.status(400).type('text/plain').send('client_id: unknown client');
      return;
    }
    if (typeof redirectUri !== 'string' || redirectUri !== options.callbackUrl) {
      res.status(400).type('text/plain').send(`redirect_uri: must be ${options.callbackUrl}`);
      return;
    }
    res.type('html').send(consentPage(options, redirectUri, typeof state === 'string' ? state : ''));
  });

  router.post(FAKE_OAUTH_PATHS.authorize, form, (req, res) => {
    const body = req.body as Record<string, string | undefined>;
    const redirectUri = body.redirect_uri ?? '';
    if (redirectUri !== options.callbackUrl) {
      res.status(400).type('text/plain').send(`redirect_uri: must be ${options.callbackUrl}`);
      return;
    }
    const target = new URL(redirectUri);
    if (body.state) target.searchParams.set('state', body.state);
    const account = options.accounts.find((a) => String(a.id) === body.account);
    if (!account) {
      target.searchParams.set('error', 'access_denied');
      res.redirect(302, target.toString());
      return;
    }
    const code = randomBytes(16).toString('hex');
    codes.set(code, { accountId: account.id, redirectUri, expiresAt: Date.now() + CODE_LIFETIME_MS });
    target.searchParams.set('code', code);
    res.redirect(302, target.toString());
  });

  router.post(FAKE_OAUTH_PATHS.token, form, express.json({ limit: '16kb' }), (req, res) => {
    const body = (req.body ?? {}) as Record<string, string | undefined>;
    if (body.client_id !== options.clientId || body.client_secret !== options.clientSecret) {
      oauthError(res, 401, 'invalid_client', 'client_id or client_secret is wrong');
      return;
    }
    const grant = body.code ? codes.get(body.code) : undefined;
    if (body.code) codes.delete(body.code);
    if (!grant || grant.expiresAt < Date.now()) {
      oauthError(res, 400, 'bad_verification_code', 'code is unknown, used or expired');
      return;
    }
    if (body.redirect_uri && body.redirect_uri !== grant.redirectUri) {
      oauthError(res, 400, 'redirect_uri_mismatch', 'redirect_uri differs from the one authorized');
      return;
    }
    const accessToken = randomBytes(20).toString('hex');
    tokens.set(accessToken, grant.accountId);
    res.json({ access_token: accessToken, token_type: 'bearer', scope: 'user:email' });
  });

  const accountFor = (req: Request): FakeOAuthAccount | undefined => {
    const token = bearerToken(req);
    const id = token ? tokens.get(token) : undefined;
    return options.accounts.find((a) => a.id === id);
  };

  router.get(FAKE_OAUTH_PATHS.user, (req, res) => {
    const account = accountFor(req);
    if (!account) {
      res.status(401).json({ message: 'Bad credentials' });
      return;
    }
    const primary = account.emails.find((e) => e.primary && e.verified);
    res.json({
      id: account.id,
      login: account.login,
      name: account.name,
      email: primary?.email ?? null,
    });
  });

  router.get(FAKE_OAUTH_PATHS.emails, (req, res) => {
    const account = accountFor(req);
    if (!account) {
      res.status(401).json({ message: 'Bad credentials' });
      return;
    }
    res.json(account.emails.map((e) => ({ ...e, visibility: e.primary ? 'private' : null })));
  });

  return router;
}
