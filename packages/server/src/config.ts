import { z } from 'zod';

/** The project-local cluster's database, as the app's role, when DATABASE_URL is not given. */
export const LOCAL_DATABASE_URL = 'postgres://sheaf_app@127.0.0.1:55432/sheaf';
const DEV_SESSION_SECRET = 'sheaf-development-session-secret-not-for-production';

const optionalUrl = z.url({ error: 'must be a URL' }).optional();

const EnvSchema = z.object({
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  PORT: z.coerce.number({ error: 'must be a number' }).int().min(0).max(65535).default(3000),
  HOST: z.string().min(1).default('localhost'),
  DATABASE_URL: z.string().regex(/^postgres(ql)?:\/\//, { error: 'must be a postgres:// URL' }).optional(),
  DATABASE_OWNER_URL: z.string().regex(/^postgres(ql)?:\/\//, { error: 'must be a postgres:// URL' }).optional(),
  SESSION_SECRET: z.string().min(1).optional(),
  PUBLIC_URL: optionalUrl,
  TRUST_PROXY: z.coerce.number({ error: 'must be a hop count (0, 1, 2, ...)' }).int().min(0).max(10).optional(),
  SMTP_URL: z.string().regex(/^smtps?:\/\//, { error: 'must be an smtp:// or smtps:// URL' }).optional(),
  SMTP_PORT: z.coerce.number({ error: 'must be a number' }).int().min(0).max(65535).default(0),
  MAIL_FROM: z.string().min(3).default('Sheaf <no-reply@sheaf.localhost>'),
  OAUTH_GITHUB_CLIENT_ID: z.string().min(1).optional(),
  OAUTH_GITHUB_CLIENT_SECRET: z.string().min(1).optional(),
  OAUTH_GITHUB_AUTHORIZE_URL: optionalUrl,
  OAUTH_GITHUB_TOKEN_URL: optionalUrl,
  OAUTH_GITHUB_PROFILE_URL: optionalUrl,
  OAUTH_GITHUB_EMAILS_URL: optionalUrl,
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).optional(),
});

export type NodeEnv = 'development' | 'test' | 'production';

export interface GithubOAuthConfig {
  clientId: string;
  clientSecret: string;
  /** Left undefined in development and test: the local fake provider's address is filled in at start. */
  authorizeUrl?: string;
  tokenUrl?: string;
  profileUrl?: string;
  emailsUrl?: string;
}

/** The server's settings, read once from the environment. */
export interface Config {
  nodeEnv: NodeEnv;
  port: number;
  host: string;
  databaseUrl: string;
  sessionSecret: string;
  /** Address browsers use; derived from the bound port when not set. */
  publicUrl?: string;
  /** How many reverse proxies stand in front (express `trust proxy` hop count). */
  trustProxyHops: number;
  /** Undefined in development and test: the server starts its own fake SMTP inbox. */
  smtpUrl?: string;
  fakeSmtpPort: number;
  mailFrom: string;
  /** Null when GitHub sign-in is not configured (production without client id). */
  github: GithubOAuthConfig | null;
  logLevel: string;
}

/** Thrown when the environment is invalid; the message names each variable at fault. */
export class ConfigError extends Error {
  override name = 'ConfigError';
}

/** Reads and checks the environment. Development and test get working defaults; production must say. */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = EnvSchema.safeParse(env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `${issue.path.join('.')}: ${issue.message}`);
    throw new ConfigError(`invalid environment:\n  ${lines.join('\n  ')}`);
  }
  const e = parsed.data;
  const production = e.NODE_ENV === 'production';
  const problems: string[] = [];

  if (production && !e.DATABASE_URL) problems.push('DATABASE_URL: required in production');
  if (production && (!e.SESSION_SECRET || e.SESSION_SECRET.length < 32)) {
    problems.push('SESSION_SECRET: required in production, at least 32 characters');
  }
  if (production && !e.SMTP_URL) problems.push('SMTP_URL: required in production (invitations and resets are sent by mail)');
  if (production && !e.PUBLIC_URL) problems.push('PUBLIC_URL: required in production (links in e-mails point there)');
  if (production && e.OAUTH_GITHUB_CLIENT_ID) {
    for (const key of ['OAUTH_GITHUB_CLIENT_SECRET', 'OAUTH_GITHUB_AUTHORIZE_URL', 'OAUTH_GITHUB_TOKEN_URL', 'OAUTH_GITHUB_PROFILE_URL'] as const) {
      if (!e[key]) problems.push(`${key}: required in production when OAUTH_GITHUB_CLIENT_ID is set`);
    }
  }
  if (problems.length > 0) throw new ConfigError(`invalid environment:\n  ${problems.join('\n  ')}`);

  const github: GithubOAuthConfig | null =
    production && !e.OAUTH_GITHUB_CLIENT_ID
      ? null
      : {
          clientId: e.OAUTH_GITHUB_CLIENT_ID ?? 'sheaf-dev-client',
          clientSecret: e.OAUTH_GITHUB_CLIENT_SECRET ?? 'sheaf-dev-client-secret',
          authorizeUrl: e.OAUTH_GITHUB_AUTHORIZE_URL,
          tokenUrl: e.OAUTH_GITHUB_TOKEN_URL,
          profileUrl: e.OAUTH_GITHUB_PROFILE_URL,
          emailsUrl: e.OAUTH_GITHUB_EMAILS_URL,
        };

  return {
    nodeEnv: e.NODE_ENV,
    port: e.PORT,
    host: e.HOST,
    databaseUrl: databaseUrlFromEnv(env),
    sessionSecret: e.SESSION_SECRET ?? DEV_SESSION_SECRET,
    publicUrl: e.PUBLIC_URL?.replace(/\/+$/, ''),
    trustProxyHops: e.TRUST_PROXY ?? (production ? 1 : 0),
    smtpUrl: e.SMTP_URL,
    fakeSmtpPort: e.SMTP_PORT,
    mailFrom: e.MAIL_FROM,
    github,
    logLevel: e.LOG_LEVEL ?? (e.NODE_ENV === 'test' ? 'silent' : 'info'),
  };
}

/** DATABASE_URL, or the project-local cluster's default database (on PGPORT) outside production. */
export function databaseUrlFromEnv(env: NodeJS.ProcessEnv = process.env): string {
  if (env.DATABASE_URL) return env.DATABASE_URL;
  if (env.NODE_ENV === 'production') throw new ConfigError('DATABASE_URL: required in production');
  return env.PGPORT ? LOCAL_DATABASE_URL.replace(':55432/', `:${env.PGPORT}/`) : LOCAL_DATABASE_URL;
}

/**
 * Where migrations run: DATABASE_OWNER_URL (the role that owns the tables), or DATABASE_URL when
 * one role does both (then the app's role owns the tables, which the server warns about).
 */
export function migrationUrlFromEnv(env: NodeJS.ProcessEnv = process.env): string {
  if (env.DATABASE_OWNER_URL) return env.DATABASE_OWNER_URL;
  if (!env.DATABASE_URL && env.NODE_ENV !== 'production') return databaseUrlFromEnv(env).replace('//sheaf_app@', '//sheaf_owner@');
  return databaseUrlFromEnv(env);
}

/** True where the local stand-ins (fake OAuth provider, fake SMTP, dev inbox) may be mounted. */
export function fakesAllowed(config: Config): boolean {
  return config.nodeEnv !== 'production';
}
