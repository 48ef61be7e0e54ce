import { inject } from 'vitest';
import { loadConfig } from '../../src/config';
import type { ResourceOverrides } from '../../src/deps';
import type { Route } from '../../src/routes/defineRoute';
import { startServer, type RunningServer } from '../../src/server';
import { TestClient } from './TestClient';

export interface TestServer extends RunningServer {
  /** A new client with an empty cookie jar. */
  client(): TestClient;
  /** The API's route table as mounted. */
  routes: Route[];
}

/** Limits high enough that a test file's own traffic never trips them (the rate-limit test uses the real ones). */
export const RELAXED_RATE_LIMITS = { signInPerIp: 10_000, signInPerAccount: 10_000, signUpPerIp: 10_000, resetPerIp: 10_000 };

/**
 * Starts a real Sheaf server on 127.0.0.1, port 0, against the run's migrated database, with the
 * fake SMTP and fake OAuth provider of the test environment. Call `close()` in afterAll.
 */
export async function startTestServer(
  options: { env?: Record<string, string>; overrides?: ResourceOverrides } = {},
): Promise<TestServer> {
  const config = loadConfig({
    NODE_ENV: 'test',
    HOST: '127.0.0.1',
    PORT: '0',
    DATABASE_URL: inject('databaseUrl'),
    LOG_LEVEL: process.env.LOG_LEVEL ?? 'silent',
    ...options.env,
  });
  const running = await startServer(config, { rateLimits: RELAXED_RATE_LIMITS, ...options.overrides });
  return {
    ...running,
    routes: running.app.locals.routes as Route[],
    // The address the server listens on: in tests PUBLIC_URL may name a host nobody resolves.
    client: () => new TestClient(running.deps.urls.internalUrl),
  };
}
