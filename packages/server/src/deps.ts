import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Request } from 'express';
import session from 'express-session';
import pg from 'pg';
import { DataSource } from 'typeorm';
import { createSessionStore } from './auth/sessionStore';
import { fakesAllowed, type Config } from './config';
import { CONNECT_TIMEOUT_MS, dataSourceOptions } from './db/options';
import { SmtpInbox } from './fakes/smtpInbox';
import { DEFAULT_FAKE_ACCOUNTS, type FakeOAuthAccount } from './fakes/oauthAccounts';
import { createLogger, type Logger } from './logger';
import { Mailer } from './mail/mailer';

/** Limits on the unauthenticated routes attackers aim at; failures only for sign-in. */
export interface RateLimitSettings {
  windowMs: number;
  /** Failed sign-ins per e-mail address per window. */
  signInPerAccount: number;
  /** Failed sign-ins per client IP per window. */
  signInPerIp: number;
  signUpPerIp: number;
  resetPerIp: number;
}

export const DEFAULT_RATE_LIMITS: RateLimitSettings = {
  windowMs: 15 * 60 * 1000,
  signInPerAccount: 20,
  signInPerIp: 100,
  signUpPerIp: 20,
  resetPerIp: 10,
};

const packageDir = fileURLToPath(new URL('..', import.meta.url));

export interface Paths {
  /** The built web app (static files and index.html). */
  webDist: string;
  /** Font files served at /fonts/. */
  fonts: string;
}

export const DEFAULT_PATHS: Paths = {
  webDist: resolve(packageDir, '../web/dist'),
  fonts: resolve(packageDir, '../../fonts'),
};

/** Everything the Express app needs, built once per server. */
export interface AppDeps {
  config: Config;
  dataSource: DataSource;
  logger: Logger;
  sessionStore: session.Store;
  mailer: Mailer;
  /** The fake SMTP's inbox in development and test when no SMTP_URL is set; null otherwise. */
  devInbox: SmtpInbox | null;
  /** Accounts the fake OAuth provider offers (development and test only). */
  fakeOauthAccounts: FakeOAuthAccount[] | null;
  rateLimits: RateLimitSettings;
  paths: Paths;
  urls: {
    /** Where browsers reach the server; links in e-mails start here. */
    publicUrl: string;
    /** Where the server reaches itself (the fake provider's token and profile endpoints). */
    internalUrl: string;
  };
  version: string;
}

/** The deps of the app serving this request. */
export function depsOf(req: Request): AppDeps {
  return req.app.locals.deps as AppDeps;
}

export interface ResourceOverrides {
  /** An initialized DataSource to use (and not to destroy on close). */
  dataSource?: DataSource;
  logger?: Logger;
  fakeOauthAccounts?: FakeOAuthAccount[];
  rateLimits?: Partial<RateLimitSettings>;
  paths?: Partial<Paths>;
}

/** The long-lived parts of a server: database, session store, mail. */
export type Resources = Omit<AppDeps, 'urls' | 'version'> & { close(): Promise<void> };

/**
 * The app's role should be neither a superuser nor the owner of the tables: either could change
 * an issued revision or switch off the trigger that guards it (`npm run db:roles` sets up the two
 * roles). Said loudly at start; the server runs all the same.
 */
async function warnAboutPowerfulRole(dataSource: DataSource, logger: Logger, production: boolean): Promise<void> {
  const rows: Array<{ role: string; superuser: boolean; owns_revisions: boolean | null }> = await dataSource.query(
    `SELECT current_user AS role, r.rolsuper AS superuser,
            (SELECT c.relowner = r.oid FROM pg_class c WHERE c.oid = to_regclass('revisions')) AS owns_revisions
       FROM pg_roles r WHERE r.rolname = current_user`,
  );
  const facts = rows[0];
  if (facts === undefined || (!facts.superuser && !facts.owns_revisions)) return;
  const what = facts.superuser ? 'a superuser' : 'the owner of the tables';
  const message = `the server connects to PostgreSQL as ${facts.role}, ${what}: issued revisions are not protected from it; connect as the app role (npm run db:roles)`;
  if (production) logger.error({ role: facts.role }, message);
  else logger.warn({ role: facts.role }, message);
}

/** Opens the database, the session store and the mail transport (starting the fake SMTP where allowed). */
export async function openResources(config: Config, overrides: ResourceOverrides = {}): Promise<Resources> {
  const logger = overrides.logger ?? createLogger(config.logLevel);
  const ownsDataSource = !overrides.dataSource;
  // A restart of PostgreSQL ends every idle connection with an error event; without a listener
  // that event would stop the process. The pools drop such connections and open new ones.
  const onPoolError = (pool: string) => (error: Error & { code?: string }) =>
    logger.warn({ pool, error: error.message, code: error.code }, 'a pooled database connection ended; the pool opens a new one when needed');
  const dataSource = overrides.dataSource ?? new DataSource(dataSourceOptions(config.databaseUrl, 10, onPoolError('app')));
  if (!dataSource.isInitialized) await dataSource.initialize();
  await warnAboutPowerfulRole(dataSource, logger, config.nodeEnv === 'production');

  const sessionPool = new pg.Pool({
    connectionString: config.databaseUrl,
    max: 5,
    application_name: 'sheaf-sessions',
    connectionTimeoutMillis: CONNECT_TIMEOUT_MS,
  });
  sessionPool.on('error', onPoolError('sessions'));
  const sessionStore = createSessionStore(sessionPool, logger, { prune: config.nodeEnv !== 'test' });

  let devInbox: SmtpInbox | null = null;
  if (!config.smtpUrl && fakesAllowed(config)) {
    devInbox = new SmtpInbox(logger);
    await devInbox.start(config.fakeSmtpPort);
    logger.info({ port: devInbox.port }, 'fake SMTP inbox listening on 127.0.0.1');
  }
  const mailer = Mailer.create({ smtpUrl: config.smtpUrl, fakePort: devInbox?.port, from: config.mailFrom, logger });

  return {
    config,
    dataSource,
    logger,
    sessionStore,
    mailer,
    devInbox,
    fakeOauthAccounts: fakesAllowed(config) ? (overrides.fakeOauthAccounts ?? DEFAULT_FAKE_ACCOUNTS) : null,
    rateLimits: { ...DEFAULT_RATE_LIMITS, ...overrides.rateLimits },
    paths: { ...DEFAULT_PATHS, ...overrides.paths },
    async close() {
      await mailer.close();
      await devInbox?.stop();
      await sessionStore.close();
      await sessionPool.end();
      if (ownsDataSource && dataSource.isInitialized) await dataSource.destroy();
    },
  };
}
