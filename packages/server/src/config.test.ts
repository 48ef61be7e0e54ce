import { describe, expect, it } from 'vitest';
import { ConfigError, LOCAL_DATABASE_URL, loadConfig } from './config';

describe('loadConfig', () => {
  it('gives development working defaults, with the fake provider and SMTP left to start-up', () => {
    const config = loadConfig({});
    expect(config).toMatchObject({
      nodeEnv: 'development',
      port: 3000,
      host: 'localhost',
      databaseUrl: LOCAL_DATABASE_URL,
      trustProxyHops: 0,
      fakeSmtpPort: 0,
      smtpUrl: undefined,
      publicUrl: undefined,
      github: { clientId: 'sheaf-dev-client', authorizeUrl: undefined },
      logLevel: 'info',
    });
  });

  it('reads every variable it documents', () => {
    const config = loadConfig({
      NODE_ENV: 'test',
      PORT: '4100',
      HOST: '0.0.0.0',
      DATABASE_URL: 'postgres://sheaf@db.internal:5432/sheaf',
      SESSION_SECRET: 'x'.repeat(40),
      PUBLIC_URL: 'https://calcs.example.test/',
      TRUST_PROXY: '2',
      SMTP_URL: 'smtp://mail.example.test:2525',
      SMTP_PORT: '2526',
      MAIL_FROM: 'Calcs <calcs@example.test>',
      OAUTH_GITHUB_CLIENT_ID: 'id',
      OAUTH_GITHUB_CLIENT_SECRET: 'secret',
      OAUTH_GITHUB_AUTHORIZE_URL: 'https://provider.example.test/authorize',
      OAUTH_GITHUB_TOKEN_URL: 'https://provider.example.test/token',
      OAUTH_GITHUB_PROFILE_URL: 'https://api.provider.example.test/user',
      OAUTH_GITHUB_EMAILS_URL: 'https://api.provider.example.test/user/emails',
      LOG_LEVEL: 'debug',
    });
    expect(config).toEqual({
      nodeEnv: 'test',
      port: 4100,
      host: '0.0.0.0',
      databaseUrl: 'postgres://sheaf@db.internal:5432/sheaf',
      sessionSecret: 'x'.repeat(40),
      publicUrl: 'https://calcs.example.test',
      trustProxyHops: 2,
      smtpUrl: 'smtp://mail.example.test:2525',
      fakeSmtpPort: 2526,
      mailFrom: 'Calcs <calcs@example.test>',
      github: {
        clientId: 'id',
        clientSecret: 'secret',
        authorizeUrl: 'https://provider.example.test/authorize',
        tokenUrl: 'https://provider.example.test/token',
        profileUrl: 'https://api.provider.example.test/user',
        emailsUrl: 'https://api.provider.example.test/user/emails',
      },
      logLevel: 'debug',
    });
  });

  it('names each bad variable', () => {
    expect(() => loadConfig({ PORT: 'eighty', DATABASE_URL: 'mysql://x', TRUST_PROXY: 'true' })).toThrow(
      new ConfigError(
        'invalid environment:\n  PORT: must be a number\n  DATABASE_URL: must be a postgres:// URL\n  TRUST_PROXY: must be a hop count (0, 1, 2, ...)',
      ),
    );
  });

  it('requires production to say what development defaults', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', SESSION_SECRET: 'short' })).toThrow(
      new ConfigError(
        'invalid environment:\n' +
          '  DATABASE_URL: required in production\n' +
          '  SESSION_SECRET: required in production, at least 32 characters\n' +
          '  SMTP_URL: required in production (invitations and resets are sent by mail)\n' +
          '  PUBLIC_URL: required in production (links in e-mails point there)',
      ),
    );
  });

  it('runs production without provider sign-in when no client id is set, and trusts one proxy hop', () => {
    const config = loadConfig({
      NODE_ENV: 'production',
      DATABASE_URL: 'postgres://db/sheaf',
      SESSION_SECRET: 's'.repeat(32),
      SMTP_URL: 'smtps://mail.example.test',
      PUBLIC_URL: 'https://calcs.example.test',
    });
    expect(config.github).toBeNull();
    expect(config.trustProxyHops).toBe(1);
    expect(config.logLevel).toBe('info');
  });
});
