// A project-local PostgreSQL cluster on 127.0.0.1, installed from Debian's packages when missing.
// Data lives under .data/pg (git-ignored). Started as root, the cluster runs as the unprivileged
// `postgres` system user, because initdb and the server refuse to run as root.
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, symlinkSync, writeFileSync, chmodSync, lstatSync } from 'node:fs';
import { join } from 'node:path';
import { aptInstall, isRoot, run, runAsync } from './run.mjs';
import { step } from './log.mjs';
import { isPortFree } from './singleInstance.mjs';

const SERVER_USER = 'postgres';

/** Finds the directory holding initdb/pg_ctl/postgres, or null. */
export function findPgBinDir() {
  const candidates = [];
  if (process.env.PG_BINDIR) candidates.push(process.env.PG_BINDIR);
  if (existsSync('/usr/lib/postgresql')) {
    const versions = readdirSync('/usr/lib/postgresql')
      .filter((v) => /^\d+$/.test(v))
      .sort((a, b) => Number(b) - Number(a));
    for (const v of versions) candidates.push(`/usr/lib/postgresql/${v}/bin`);
  }
  const fromConfig = run('pg_config', ['--bindir'], { quiet: true, allowFail: true });
  if (fromConfig.status === 0) candidates.push(fromConfig.stdout.trim());
  return candidates.find((dir) => ['initdb', 'pg_ctl', 'postgres'].every((b) => existsSync(join(dir, b)))) ?? null;
}

/** Returns the bin dir, installing Debian's postgresql package first when no server is found. */
export function ensurePgInstalled() {
  let bin = findPgBinDir();
  if (bin) return bin;
  step('PostgreSQL server not found: installing it from Debian packages');
  aptInstall(['postgresql']);
  bin = findPgBinDir();
  if (!bin) throw new Error('PostgreSQL was installed but initdb/pg_ctl were not found under /usr/lib/postgresql');
  return bin;
}

function asServerUser(bin, command, args, options = {}) {
  const exe = join(bin, command);
  if (isRoot()) return run('runuser', ['-u', SERVER_USER, '--', exe, ...args], options);
  return run(exe, args, options);
}

function serverUserCanReach(dir) {
  if (!isRoot()) return true;
  return run('runuser', ['-u', SERVER_USER, '--', 'test', '-w', dir], { quiet: true, allowFail: true }).status === 0;
}

function ensureServerUser() {
  if (!isRoot()) return;
  const known = run('id', ['-u', SERVER_USER], { quiet: true, allowFail: true });
  if (known.status !== 0) {
    run('useradd', ['--system', '--home-dir', '/var/lib/postgresql', '--shell', '/bin/sh', SERVER_USER]);
  }
}

function chownTo(path) {
  if (!isRoot()) return;
  run('chown', ['-R', `${SERVER_USER}:${SERVER_USER}`, path]);
}

/**
 * Where the cluster lives: `.data/pg` in the project. When the project folder cannot be entered
 * by the server user (a clone under a private home folder, say), the cluster lives under
 * /var/lib/sheaf-pg/<hash of the project path> and `.data/pg` links to it.
 */
function clusterHome(root) {
  const dataRoot = join(root, '.data');
  mkdirSync(dataRoot, { recursive: true });
  const local = join(dataRoot, 'pg');
  if (existsSync(local) && lstatSync(local).isSymbolicLink()) return local;
  if (existsSync(join(local, 'data', 'PG_VERSION'))) return local;
  mkdirSync(local, { recursive: true });
  chmodSync(dataRoot, 0o755);
  chownTo(local);
  if (serverUserCanReach(local)) return local;
  rmSync(local, { recursive: true, force: true });
  const hash = createHash('sha256').update(root).digest('hex').slice(0, 12);
  const outside = join('/var/lib/sheaf-pg', hash);
  mkdirSync(outside, { recursive: true });
  chownTo('/var/lib/sheaf-pg');
  symlinkSync(outside, local);
  step(`the project folder is private to root: the cluster lives in ${outside}`);
  return local;
}

/** The folders of a cluster living in `home`: data, socket folder, server log. */
export function clusterPathsIn(home) {
  return { home, data: join(home, 'data'), socket: join(home, 'run'), log: join(home, 'server.log'), portFile: join(home, 'port') };
}

export function clusterPaths(root) {
  return clusterPathsIn(join(root, '.data', 'pg'));
}

export const DEFAULT_PGPORT = 55432;

/** True when the cluster's postmaster answers. */
function isRunning(bin, paths) {
  if (!existsSync(join(paths.data, 'PG_VERSION'))) return false;
  return asServerUser(bin, 'pg_ctl', ['-D', paths.data, 'status'], { quiet: true, allowFail: true }).status === 0;
}

/** The port a running cluster listens on (line 4 of postmaster.pid), or null. */
function runningPort(paths) {
  const pidFile = join(paths.data, 'postmaster.pid');
  if (!existsSync(pidFile)) return null;
  const port = Number(readFileSync(pidFile, 'utf8').split('\n')[3]);
  return Number.isInteger(port) && port > 0 ? port : null;
}

function initCluster(bin, paths) {
  mkdirSync(paths.socket, { recursive: true });
  if (!existsSync(join(paths.data, 'PG_VERSION'))) {
    step(`creating the PostgreSQL cluster in ${paths.data}`);
    mkdirSync(paths.data, { recursive: true });
    chmodSync(paths.data, 0o700);
    chownTo(paths.home);
    asServerUser(bin, 'initdb', ['-D', paths.data, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8'], { quiet: true });
  }
  chownTo(paths.socket);
}

async function firstFreePort(from) {
  for (let port = from; port < from + 200 && port <= 65535; port += 1) {
    if (await isPortFree(port, '127.0.0.1')) return port;
  }
  throw new Error(`no free port between ${from} and ${from + 199} on 127.0.0.1`);
}

/**
 * The port to start a stopped cluster on. `PGPORT` when set (an error naming it when another
 * program holds it); otherwise the port this cluster used last, or 55432, or — when another
 * program (another checkout's cluster, say) holds that — the next free one, remembered for next time.
 */
async function choosePort(paths, requested) {
  if (requested !== undefined) {
    if (await isPortFree(requested, '127.0.0.1')) return requested;
    throw new Error(
      `port ${requested} on 127.0.0.1 (PGPORT) is taken by another program — another checkout's PostgreSQL, perhaps. ` +
        'Set PGPORT to a free port, or leave PGPORT unset and a free one is picked.',
    );
  }
  const remembered = existsSync(paths.portFile) ? Number(readFileSync(paths.portFile, 'utf8').trim()) : NaN;
  const preferred = Number.isInteger(remembered) && remembered > 0 ? remembered : DEFAULT_PGPORT;
  if (await isPortFree(preferred, '127.0.0.1')) return preferred;
  const picked = await firstFreePort(Math.max(preferred, DEFAULT_PGPORT) + 1);
  step(`port ${preferred} on 127.0.0.1 is taken by another program (another checkout's PostgreSQL?): using ${picked}`);
  return picked;
}

function requestedPort() {
  if (process.env.PGPORT === undefined || process.env.PGPORT === '') return undefined;
  const port = Number(process.env.PGPORT);
  if (!Number.isInteger(port) || port < 1 || port > 65535) throw new Error(`PGPORT: "${process.env.PGPORT}" is not a port number`);
  return port;
}

/**
 * Initialises (once) and starts the cluster living in `home` on 127.0.0.1. `port` asks for a
 * port (an error when taken); without it the port is chosen as `choosePort` says. A cluster that
 * is already running is used as it is, on the port it listens on.
 * Returns {bin, port, base, adminUrl, startedHere}.
 */
export async function startClusterIn(home, { port: requested } = {}) {
  const bin = ensurePgInstalled();
  ensureServerUser();
  const paths = clusterPathsIn(home);
  initCluster(bin, paths);
  let startedHere = false;
  let port = isRunning(bin, paths) ? runningPort(paths) : null;
  if (port === null) {
    port = await choosePort(paths, requested);
    step(`starting PostgreSQL on 127.0.0.1:${port}`);
    const opts = `-k ${paths.socket} -p ${port} -c listen_addresses=127.0.0.1`;
    // pg_ctl removes a stale postmaster.pid left by a killed server by itself.
    const res = asServerUser(bin, 'pg_ctl', ['-D', paths.data, '-l', paths.log, '-w', '-t', '60', '-o', opts, 'start'], { quiet: true, allowFail: true });
    if (res.status !== 0) {
      const tail = existsSync(paths.log) ? readFileSync(paths.log, 'utf8').split('\n').slice(-15).join('\n') : '';
      throw new Error(`PostgreSQL did not start on port ${port}:\n${res.stdout}${res.stderr}\n${tail}`);
    }
    writeFileSync(paths.portFile, String(port));
    startedHere = true;
  } else if (requested !== undefined && requested !== port) {
    step(`PostgreSQL of this checkout already runs on port ${port} (not PGPORT=${requested}): using it`);
  }
  const base = `postgres://postgres@127.0.0.1:${port}`;
  return { bin, port, base, adminUrl: `${base}/postgres`, startedHere };
}

/**
 * Initialises (once) and starts the project cluster (.data/pg) on PGPORT, or on a free port when
 * PGPORT is unset and 55432 is taken. Returns {bin, port, base, adminUrl, startedHere};
 * `startedHere` is false when it was already running (another `npm start` or test run).
 */
export async function startCluster(root) {
  ensureServerUser();
  clusterHome(root);
  return startClusterIn(clusterPaths(root).home, { port: requestedPort() });
}

/**
 * `pg_ctl stop|start|restart -m fast -w` on a cluster that has run before, without blocking the
 * event loop (a server in the same process goes on meanwhile). A fast stop ends every connection,
 * as a real restart or failover does. Resolves once pg_ctl is done.
 */
export async function controlClusterIn(home, action) {
  const bin = findPgBinDir();
  const paths = clusterPathsIn(home);
  const port = action === 'start' ? Number(readFileSync(paths.portFile, 'utf8').trim()) : runningPort(paths);
  const opts = `-k ${paths.socket} -p ${port} -c listen_addresses=127.0.0.1`;
  const args = ['-D', paths.data, '-l', paths.log, '-m', 'fast', '-w', '-t', '60', '-o', opts, action];
  const exe = join(bin, 'pg_ctl');
  const { done } = isRoot() ? runAsync('runuser', ['-u', SERVER_USER, '--', exe, ...args], { stdio: 'ignore' }) : runAsync(exe, args, { stdio: 'ignore' });
  const status = await done;
  if (status !== 0) throw new Error(`pg_ctl ${action} exited with ${status}; see ${paths.log}`);
}

export function stopClusterIn(home) {
  const bin = findPgBinDir();
  const paths = clusterPathsIn(home);
  if (!bin || !isRunning(bin, paths)) return;
  step('stopping PostgreSQL');
  asServerUser(bin, 'pg_ctl', ['-D', paths.data, '-m', 'fast', '-w', 'stop'], { quiet: true, allowFail: true });
}

export function stopCluster(root) {
  stopClusterIn(clusterPaths(root).home);
}

/** Makes a folder the server user may write (the cluster of a test lives in one). */
export function giveToServerUser(dir) {
  ensureServerUser();
  chmodSync(dir, 0o755);
  chownTo(dir);
}

/** Runs SQL against a server with psql from the same installation. */
export function psql(bin, url, sql) {
  const exe = existsSync(join(bin, 'psql')) ? join(bin, 'psql') : 'psql';
  return run(exe, ['-X', '-q', '-v', 'ON_ERROR_STOP=1', '-d', url, '-tAc', sql], { quiet: true });
}

export function createDatabaseIfMissing(bin, adminUrl, name) {
  const exists = psql(bin, adminUrl, `SELECT 1 FROM pg_database WHERE datname = '${name}'`).stdout.trim();
  if (exists !== '1') psql(bin, adminUrl, `CREATE DATABASE "${name}"`);
}

export function dropDatabase(bin, adminUrl, name) {
  psql(bin, adminUrl, `DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
}

/** Leases let concurrent test runs share the cluster: the last one out stops it. */
export function takeLease(root) {
  const dir = join(root, '.data', 'leases');
  mkdirSync(dir, { recursive: true });
  writeFileSync(join(dir, String(process.pid)), '');
  return () => rmSync(join(dir, String(process.pid)), { force: true });
}

export function otherLiveLeases(root) {
  const dir = join(root, '.data', 'leases');
  if (!existsSync(dir)) return 0;
  return readdirSync(dir).filter((name) => {
    const pid = Number(name);
    if (pid === process.pid || !Number.isInteger(pid)) return false;
    try {
      process.kill(pid, 0);
      return true;
    } catch {
      rmSync(join(dir, name), { force: true });
      return false;
    }
  }).length;
}

