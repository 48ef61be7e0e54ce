import { createServer, type Server } from 'node:http';
import type { Express } from 'express';
import type { AddressInfo } from 'node:net';
import { createApp } from './app';
import { attachUpgradeHandlers } from './collab/upgradeHandlers';
import type { Config } from './config';
import { openResources, type AppDeps, type ResourceOverrides } from './deps';
import { SERVER_VERSION } from './version';

/** A listening Sheaf server. */
export interface RunningServer {
  server: Server;
  /** Where the server is reached, e.g. `http://127.0.0.1:41234`. */
  url: string;
  deps: AppDeps;
  app: Express;
  /** Stops accepting, ends open connections and websockets, and closes the database and mail. */
  close(): Promise<void>;
}

function bindHost(host: string): string {
  // `localhost` may resolve to ::1 alone; bind the IPv4 loopback that every client falls back to.
  return host === 'localhost' ? '127.0.0.1' : host;
}

function urlHost(address: AddressInfo, configuredHost: string): string {
  if (configuredHost === 'localhost') return 'localhost';
  if (address.address === '0.0.0.0' || address.address === '::') return 'localhost';
  return address.family === 'IPv6' ? `[${address.address}]` : address.address;
}

/**
 * Opens the resources, listens on `config.host:config.port` (port 0 picks a free one), then
 * builds the app: the public URL and the server's own address are known only once it listens.
 */
export async function startServer(config: Config, overrides: ResourceOverrides = {}): Promise<RunningServer> {
  const resources = await openResources(config, overrides);
  const server = createServer();
  try {
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(config.port, bindHost(config.host), () => {
        server.off('error', reject);
        resolve();
      });
    });
  } catch (error) {
    await resources.close();
    throw error;
  }
  const address = server.address() as AddressInfo;
  const internalHost = address.family === 'IPv6' ? `[${address.address === '::' ? '::1' : address.address}]` : address.address === '0.0.0.0' ? '127.0.0.1' : address.address;
  const internalUrl = `http://${internalHost}:${address.port}`;
  const publicUrl = config.publicUrl ?? `http://${urlHost(address, config.host)}:${address.port}`;
  const { close: closeResources, ...rest } = resources;
  const deps: AppDeps = { ...rest, urls: { publicUrl, internalUrl }, version: SERVER_VERSION };
  const app = createApp(deps);
  server.on('request', app);
  const upgrades = attachUpgradeHandlers(server);
  // Routes that read or lock a sheet's live document reach the co-editing server through the app.
  app.locals.collab = upgrades.collab;

  let closing: Promise<void> | undefined;
  return {
    server,
    url: publicUrl,
    deps,
    app,
    close() {
      closing ??= (async () => {
        await upgrades.close();
        const closed = new Promise<void>((resolve) => server.close(() => resolve()));
        server.closeIdleConnections();
        // Give requests in flight a moment, then end whatever is still open.
        const timer = setTimeout(() => server.closeAllConnections(), 2000);
        await closed;
        clearTimeout(timer);
        await closeResources();
      })();
      return closing;
    },
  };
}
