import 'reflect-metadata';
import { ConfigError, loadConfig } from './config';
import { createLogger } from './logger';
import { startServer } from './server';

/** Starts Sheaf's server from the environment and stops it cleanly on SIGTERM or SIGINT. */
async function main(): Promise<void> {
  let config;
  try {
    config = loadConfig();
  } catch (error) {
    if (error instanceof ConfigError) {
      process.stderr.write(`sheaf server: ${error.message}\n`);
      process.exit(1);
    }
    throw error;
  }
  const logger = createLogger(config.logLevel);
  const running = await startServer(config, { logger });
  logger.info(
    { url: running.url, env: config.nodeEnv, fakeSmtp: running.deps.devInbox?.port ?? null },
    `Sheaf server listening on ${running.url}`,
  );

  let stopping = false;
  const stop = (signal: NodeJS.Signals) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'shutting down');
    running
      .close()
      .then(() => {
        logger.info('stopped');
        process.exit(0);
      })
      .catch((error: unknown) => {
        logger.error({ err: error }, 'shutdown failed');
        process.exit(1);
      });
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
  // Started by `npm start` with an IPC channel: if that process dies (even by kill -9), the
  // channel closes and the server stops too, so no orphan keeps the port or the database busy.
  if (process.send) process.on('disconnect', () => stop('SIGTERM'));
}

main().catch((error: unknown) => {
  process.stderr.write(`sheaf server failed to start: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}\n`);
  process.exit(1);
});
