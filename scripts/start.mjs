#!/usr/bin/env node
// `npm start`: install what is missing, start PostgreSQL on loopback, migrate, seed the demo once,
// build the web app and serve everything on http://localhost:$PORT. Ctrl-C stops it all cleanly.
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { ensureNpmPackages } from './lib/deps.mjs';
import { prepareDatabase } from './lib/database.mjs';
import { fail, step } from './lib/log.mjs';
import { ROOT, SERVER_DIR, TSX } from './lib/paths.mjs';
import { otherLiveLeases, stopCluster, takeLease } from './lib/postgres.mjs';
import { run } from './lib/run.mjs';
import { claimInstance, isPortFree } from './lib/singleInstance.mjs';

const port = Number(process.env.PORT ?? 3000);

const claim = claimInstance(ROOT);
if (claim.heldBy) {
  fail(`Sheaf is already running from this folder (process ${claim.heldBy}). Stop it with Ctrl-C first.`);
}
if (!(await isPortFree(port))) {
  claim.release();
  fail(`port ${port} is in use by another program: stop it or set PORT to a free port.`);
}
const releaseLease = takeLease(ROOT);

try {
  ensureNpmPackages(ROOT);
} catch (error) {
  fail(`could not install the npm packages: ${error.message}`);
}

let db;
try {
  db = await prepareDatabase(ROOT);
} catch (error) {
  fail(`could not prepare PostgreSQL: ${error.message}`);
}

const env = {
  ...process.env,
  DATABASE_URL: db.url,
  DATABASE_OWNER_URL: db.ownerUrl,
  PORT: String(port),
  NODE_ENV: process.env.NODE_ENV ?? 'development',
  TURBO_TELEMETRY_DISABLED: '1',
};

try {
  step('running database migrations');
  run(TSX, ['src/db/migrate.ts'], { cwd: SERVER_DIR, env });
  step('seeding the demo organization (once)');
  run(TSX, ['src/db/seed.ts'], { cwd: SERVER_DIR, env });
  if (process.env.SHEAF_SKIP_WEB_BUILD !== '1') {
    step('building the web app');
    run(join(ROOT, 'node_modules', '.bin', 'vite'), ['build', '--logLevel', 'warn'], { cwd: join(ROOT, 'packages', 'web'), env });
  }
} catch (error) {
  shutdownDatabase();
  fail(error.message);
}

const demo = JSON.parse(
  run(TSX, ['-e', "import('./src/db/demoAccounts.ts').then(m => console.log(JSON.stringify({ password: m.DEMO_PASSWORD, organization: m.DEMO_ORGANIZATION.name, accounts: m.DEMO_ACCOUNTS })))"], {
    cwd: SERVER_DIR,
    env,
    quiet: true,
  }).stdout.trim().split('\n').pop(),
);

step('starting the server');
// node --import tsx (not the tsx wrapper) makes the server a direct child, and the IPC channel
// lets it notice when this process dies.
const server = spawn(process.execPath, ['--import', 'tsx', 'src/index.ts'], {
  cwd: SERVER_DIR,
  env,
  stdio: ['inherit', 'inherit', 'inherit', 'ipc'],
});
let stopping = false;

waitForHealth().then((ok) => {
  if (!ok || stopping) return;
  const lines = [
    '',
    `  Sheaf is running at http://localhost:${port}`,
    `  Demo organization ${demo.organization}; sign in with password ${demo.password} as:`,
    ...demo.accounts.map((a) => `    ${a.role.padEnd(9)} ${a.email}`),
    '  Press Ctrl-C to stop the server and the database.',
    '',
  ];
  process.stdout.write(lines.join('\n') + '\n');
});

async function waitForHealth() {
  for (let i = 0; i < 120 && !stopping; i += 1) {
    try {
      const res = await fetch(`http://127.0.0.1:${port}/api/health`);
      if (res.ok) return true;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 500));
  }
  return false;
}

function shutdownDatabase() {
  releaseLease();
  if (otherLiveLeases(ROOT) === 0 && !process.env.DATABASE_URL) stopCluster(ROOT);
  claim.release();
}

function stop(signal) {
  if (stopping) return;
  stopping = true;
  step(`${signal}: stopping the server`);
  server.kill('SIGTERM');
}

process.on('SIGINT', () => stop('SIGINT'));
process.on('SIGTERM', () => stop('SIGTERM'));
server.on('exit', (code) => {
  shutdownDatabase();
  process.exit(stopping ? 0 : (code ?? 1));
});
