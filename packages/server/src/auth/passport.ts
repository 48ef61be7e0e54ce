import type { Request, Response } from 'express';
import passport from 'passport';
import { Strategy as GitHubStrategy, type Profile, type StrategyOptionsWithRequest } from 'passport-github2';
import { Strategy as LocalStrategy } from 'passport-local';
import type { AppDeps } from '../deps';
import type { SheafSessionStore } from './sessionStore';
import { User } from '../entities/User';
import { FAKE_OAUTH_PATHS } from '../fakes/oauthProvider';
import { findUserByEmail, publicUser } from '../services/accounts';
import { verifyPassword } from '../services/passwords';
import { signInWithProvider, type ProviderProfile } from '../services/providerAccounts';

/** The app's own passport instance. */
export type Authenticator = InstanceType<typeof passport.Passport>;

/** The provider endpoints in use: configured ones, or the local fake provider's in development and test. */
export function githubEndpoints(deps: Pick<AppDeps, 'config' | 'urls'>): {
  authorizeUrl: string;
  tokenUrl: string;
  profileUrl: string;
  emailsUrl: string;
  callbackUrl: string;
} | null {
  const github = deps.config.github;
  if (!github) return null;
  const { publicUrl, internalUrl } = deps.urls;
  return {
    authorizeUrl: github.authorizeUrl ?? `${publicUrl}${FAKE_OAUTH_PATHS.authorize}`,
    tokenUrl: github.tokenUrl ?? `${internalUrl}${FAKE_OAUTH_PATHS.token}`,
    profileUrl: github.profileUrl ?? `${internalUrl}${FAKE_OAUTH_PATHS.user}`,
    emailsUrl: github.emailsUrl ?? `${internalUrl}${FAKE_OAUTH_PATHS.emails}`,
    callbackUrl: `${publicUrl}/auth/github/callback`,
  };
}

interface RawEmail {
  value?: string;
  primary?: boolean;
  verified?: boolean;
}

function toProviderProfile(profile: Profile): ProviderProfile {
  const emails = ((profile.emails ?? []) as RawEmail[])
    .filter((e): e is RawEmail & { value: string } => typeof e.value === 'string')
    .map((e) => ({ email: e.value, primary: e.primary === true, verified: e.verified === true }));
  return {
    provider: 'github',
    providerUserId: String(profile.id),
    login: profile.username ?? null,
    name: profile.displayName || null,
    emails,
  };
}

/**
 * A passport instance per app (no global state): local e-mail + password, and GitHub sign-in
 * when configured. Sessions keep only the user id; each request reloads the user.
 */
export function createAuthenticator(deps: AppDeps): Authenticator {
  const authenticator = new passport.Passport();
  const { dataSource } = deps;

  authenticator.use(
    'local',
    new LocalStrategy({ usernameField: 'email', passwordField: 'password', session: true }, (email, password, done) => {
      findUserByEmail(dataSource.manager, email)
        .then(async (user) => {
          const valid = await verifyPassword(user?.passwordHash, password);
          done(null, valid && user ? publicUser(user) : false);
        })
        .catch(done);
    }),
  );

  const endpoints = githubEndpoints(deps);
  if (endpoints && deps.config.github) {
    authenticator.use(
      'github',
      new GitHubStrategy(
        {
          clientID: deps.config.github.clientId,
          clientSecret: deps.config.github.clientSecret,
          callbackURL: endpoints.callbackUrl,
          authorizationURL: endpoints.authorizeUrl,
          tokenURL: endpoints.tokenUrl,
          userProfileURL: endpoints.profileUrl,
          userEmailURL: endpoints.emailsUrl,
          scope: ['user:email'],
          allRawEmails: true,
          // passport-oauth2 keeps a random state in the session and checks it on the callback.
          state: true,
          passReqToCallback: true,
        } as unknown as StrategyOptionsWithRequest,
        (req: Request, _accessToken: string, _refreshToken: string, profile: Profile, done: (error: unknown, user?: unknown) => void) => {
          signInWithProvider(dataSource, toProviderProfile(profile), req.ip)
            .then((result) => done(null, publicUser(result.user)))
            .catch((error: unknown) => done(error));
        },
      ),
    );
  }

  authenticator.serializeUser((user, done) => done(null, user.id));
  // Every signed-in request: the user read with the session (sessionStore.ts), else one small
  // query for the three public fields. A deleted user is nobody.
  authenticator.deserializeUser((req: Request, id: string, done: (error: unknown, user?: Express.User | false) => void) => {
    const read = (deps.sessionStore as Partial<SheafSessionStore>).takeUserOf?.(req.sessionID, id);
    if (read !== undefined) {
      done(null, read === null ? false : publicUser(read));
      return;
    }
    dataSource
      .query(`SELECT id, email, name FROM users WHERE id = $1`, [id])
      .then((rows: Array<Pick<User, 'id' | 'email' | 'name'>>) => done(null, rows[0] ? publicUser(rows[0]) : false))
      .catch(done);
  });
  return authenticator;
}

/** Runs a strategy and resolves with the user it accepted, or false. */
export function authenticateWith(
  authenticator: Authenticator,
  strategy: string,
  req: Request,
  res: Response,
): Promise<Express.User | false> {
  return new Promise((resolve, reject) => {
    authenticator.authenticate(strategy, { session: false }, (error: unknown, user: Express.User | false) => {
      if (error) reject(error instanceof Error ? error : new Error(String(error)));
      else resolve(user);
    })(req, res, (error: unknown) => reject(error instanceof Error ? error : new Error(String(error))));
  });
}

/** Signs the user in (passport regenerates the session first, so an old session id is worthless). */
export function logIn(req: Request, user: Express.User): Promise<void> {
  return new Promise((resolve, reject) => req.logIn(user, (error?: unknown) => (error ? reject(error as Error) : resolve())));
}

/** Signs out (passport regenerates the session, dropping the old CSRF token with it). */
export function logOut(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.logOut((error?: unknown) => (error ? reject(error as Error) : resolve())));
}
