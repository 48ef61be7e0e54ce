/**
 * Websocket upgrades on the HTTP server: live co-editing of sheets at `/collab/:sheetId`. The
 * session, the signed-in user, the `Origin` and the permission table are checked on the upgrade
 * request itself (express-session and passport do not run on upgrades); see README.md.
 */
import { STATUS_CODES, type IncomingMessage, type Server } from 'node:http';
import type { Duplex } from 'node:stream';
import { SESSION_COOKIE } from '../app';
import { createAuthenticator } from '../auth/passport';
import type { AppDeps } from '../deps';
import { authorizeUpgrade, collabSheetIdOf, originChecker, type UpgradeAuthorizerDeps } from './authorizeUpgrade';
import { COLLAB_CLOSE } from './closeCodes';
import type { CollabLogger } from './collabMetrics';
import { CollabServer, type CollabServerOptions } from './CollabServer';
import { PostgresSheetPersistence } from './sheetPersistence';

/** Closes what the upgrade handlers hold (open websockets, rooms). */
export interface UpgradeHandle {
  close(): Promise<void>;
}

/** The handle, with the co-editing server for its metrics, live content and settings. */
export interface CollabUpgradeHandle extends UpgradeHandle {
  collab: CollabServer;
}

const collabServers = new WeakMap<Server, CollabServer>();

/** The co-editing server attached to an HTTP server (tests, health pages, live reads of a sheet). */
export function collabServerOf(server: Server): CollabServer | undefined {
  return collabServers.get(server);
}

/**
 * Install the websocket upgrade handler. `deps` defaults to those of the Express app already
 * listening on `server` (`app.locals.deps`), so the app and the websockets share one database,
 * one session store and one configuration.
 *
 * `close()` stops accepting websockets, closes the open ones with 4503 (`shuttingDown`), stores
 * and compacts every open sheet, and frees the rooms.
 */
export function attachUpgradeHandlers(
  server: Server,
  deps: AppDeps = depsOfListeningApp(server),
  options: Partial<Omit<CollabServerOptions, 'persistence' | 'logger'>> = {},
): CollabUpgradeHandle {
  const logger: CollabLogger = deps.logger.child({ component: 'collab' });
  const collab = new CollabServer({
    ...options,
    persistence: new PostgresSheetPersistence(deps.dataSource, logger),
    logger,
  });
  collabServers.set(server, collab);

  // The app's session store, cookie name and secret; sessions are only read here.
  const authenticator = createAuthenticator(deps);
  const authorizer: UpgradeAuthorizerDeps = {
    dataSource: deps.dataSource,
    session: { cookieName: SESSION_COOKIE, secret: deps.config.sessionSecret, store: deps.sessionStore },
    passportSession: authenticator.session(),
    isAllowedOrigin: originChecker(deps.urls.publicUrl, deps.config.nodeEnv === 'production'),
  };

  const onUpgrade = (request: IncomingMessage, socket: Duplex, head: Buffer): void => {
    // Another endpoint's upgrade (a dev server's hot reload, say) is left to its own listener.
    if (collabSheetIdOf(request.url) === null && server.listenerCount('upgrade') > 1) return;
    // Until the handshake completes nothing else listens for socket errors (a reset, say).
    const onError = (error: Error): void => logger.warn({ err: error }, 'collab upgrade socket error');
    socket.on('error', onError);
    void decide(request, socket, head).finally(() => socket.off('error', onError));
  };

  async function decide(request: IncomingMessage, socket: Duplex, head: Buffer): Promise<void> {
    if (collab.isClosing) {
      collab.refuse(request, socket, head, COLLAB_CLOSE.shuttingDown);
      return;
    }
    let decision;
    try {
      decision = await authorizeUpgrade(request, authorizer);
    } catch (error) {
      logger.error({ err: error }, 'could not authorize a collab connection');
      if (!socket.destroyed) collab.refuse(request, socket, head, COLLAB_CLOSE.unavailable);
      return;
    }
    if (socket.destroyed) return;
    switch (decision.kind) {
      case 'accept':
        collab.accept(request, socket, head, decision.sheetId, decision.identity);
        return;
      case 'reject-close':
        collab.refuse(request, socket, head, decision.code);
        return;
      case 'reject-http':
        collab.metrics.connectionsRefused++;
        rejectHttp(socket, decision.status, decision.reason);
        return;
    }
  }

  server.on('upgrade', onUpgrade);
  return {
    collab,
    async close() {
      server.off('upgrade', onUpgrade);
      await collab.close();
    },
  };
}

function depsOfListeningApp(server: Server): AppDeps {
  for (const listener of server.listeners('request')) {
    const deps = (listener as { locals?: { deps?: AppDeps } }).locals?.deps;
    if (deps !== undefined) return deps;
  }
  throw new Error('attachUpgradeHandlers: no Express app with locals.deps listens on this server yet; pass deps');
}

function rejectHttp(socket: Duplex, status: number, reason: string): void {
  socket.once('finish', () => socket.destroy());
  socket.end(
    `HTTP/1.1 ${status} ${STATUS_CODES[status] ?? ''}\r\nConnection: close\r\nContent-Type: text/plain\r\nContent-Length: ${Buffer.byteLength(reason)}\r\n\r\n${reason}`,
  );
}
