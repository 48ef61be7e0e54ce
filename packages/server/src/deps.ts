import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Request } from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import pg from 'pg';
import { DataSource } from 'typeorm';
import { fakesAllowed, type Config } from './config';
import { dataSourceOptions } from './db/options';
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

/** Opens the database, the session store and the mail transport (starting the fake SMTP where allowed). */
export async function openResources(config: Config, overrides: ResourceOverrides = {}): Promise<Resources> {
  const logger = overrides.logger ?? createLogger(config.logLevel);
  const ownsDataSource = !overrides.dataSource;
  const dataSource = overrides.dataSource ?? new DataSource(dataSourceOptions(config.databaseUrl));
  if (!dataSource.isInitialized) await dataSource.initialize();

  const sessionPool = new pg.Pool({ connectionString: config.databaseUrl, max: 5, application_name: 'sheaf-sessions' });
  const PgStore = connectPgSimple(session);
  const sessionStore = new PgStore({
    pool: sessionPool,
    tableName: 'sessions',
    createTableIfMissing: false,
    pruneSessionInterval: config.nodeEnv === 'test' ? false : 15 * 60,
    errorLog: (...args: unknown[]) => logger.error({ args }, 'session store error'),
  });

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
