// Starts the real app for the browser tests: migrate and seed the run's database, build the web
// app, and serve it on a free port. The base URL reaches the tests through `provide`.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';

const root = new URL('../..', import.meta.url).pathname;
const serverDir = join(root, 'packages', 'server');
const tsx = join(root, 'node_modules', '.bin', 'tsx');

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
  }
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolve(port));
    });
  });
}

function runOrThrow(command: string, args: string[], cwd: string, env: NodeJS.ProcessEnv): void {
  const result = spawnSync(command, args, { cwd, env, stdio: 'inherit' });
  if (result.status !== 0) throw new Error(`${command} ${args.join(' ')} failed with ${result.status}`);
}

let server: ChildProcess | undefined;

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  if (!process.env.DATABASE_URL) throw new Error('DATABASE_URL must name the browser tests database (npm test sets it)');
  const port = await freePort();
  const env = { ...process.env, NODE_ENV: 'test', PORT: String(port), HOST: '127.0.0.1', PUBLIC_URL: `http://localhost:${port}` };
  runOrThrow(tsx, ['src/db/migrate.ts'], serverDir, env);
  runOrThrow(tsx, ['src/db/seed.ts'], serverDir, env);
  if (process.env.SHEAF_SKIP_WEB_BUILD !== '1') {
    // The production build that `npm start` serves (NODE_ENV=test would give React's development build).
    runOrThrow(join(root, 'node_modules', '.bin', 'vite'), ['build', '--logLevel', 'warn'], join(root, 'packages', 'web'), { ...env, NODE_ENV: 'production' });
  }
  server = spawn(tsx, ['src/index.ts'], { cwd: serverDir, env, stdio: ['ignore', 'ignore', 'inherit'] });
  const baseUrl = `http://localhost:${port}`;
  for (let i = 0; i < 120; i += 1) {
    try {
      const res = await fetch(`${baseUrl}/api/health`);
      if (res.ok) break;
    } catch {
      // not listening yet
    }
    if (server.exitCode !== null) throw new Error(`the server exited with ${server.exitCode} before answering`);
    await new Promise((r) => setTimeout(r, 250));
  }
  project.provide('baseUrl', baseUrl);
  return async () => {
    if (!server || server.exitCode !== null) return;
    const exited = new Promise((r) => server?.once('exit', r));
    server.kill('SIGTERM');
    await Promise.race([exited, new Promise((r) => setTimeout(r, 10_000))]);
    if (server.exitCode === null) server.kill('SIGKILL');
  };
}
