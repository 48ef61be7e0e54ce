// A project-local PostgreSQL cluster on 127.0.0.1, installed from Debian's packages when missing.
// Data lives under .data/pg (git-ignored). Started as root, the cluster runs as the unprivileged
// `postgres` system user, because initdb and the server refuse to run as root.
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, symlinkSync, writeFileSync, chmodSync, lstatSync } from 'node:fs';
import { join } from 'node:path';
import { aptInstall, isRoot, run } from './run.mjs';
import { step } from './log.mjs';

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

export function clusterPaths(root) {
  const home = join(root, '.data', 'pg');
  return { home, data: join(home, 'data'), socket: join(home, 'run'), log: join(home, 'server.log') };
}

export function pgPort() {
  return Number(process.env.PGPORT ?? 55432);
}

/** True when the cluster's postmaster answers. */
export function isClusterRunning(bin, root) {
  const { data } = clusterPaths(root);
  if (!existsSync(join(data, 'PG_VERSION'))) return false;
  return asServerUser(bin, 'pg_ctl', ['-D', data, 'status'], { quiet: true, allowFail: true }).status === 0;
}

/**
 * Initialises (once) and starts the project cluster. Returns {url, adminUrl, startedHere}.
 * `startedHere` is false when the cluster was already running (another `npm start` or test run).
 */
export function startCluster(root) {
  const bin = ensurePgInstalled();
  ensureServerUser();
  clusterHome(root);
  const { home, data, socket, log } = clusterPaths(root);
  const port = pgPort();
  mkdirSync(socket, { recursive: true });
  if (!existsSync(join(data, 'PG_VERSION'))) {
    step(`creating the PostgreSQL cluster in ${data}`);
    mkdirSync(data, { recursive: true });
    chmodSync(data, 0o700);
    chownTo(home);
    asServerUser(bin, 'initdb', ['-D', data, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8'], { quiet: true });
  }
  chownTo(socket);
  let startedHere = false;
  if (!isClusterRunning(bin, root)) {
    step(`starting PostgreSQL on 127.0.0.1:${port}`);
    const opts = `-k ${socket} -p ${port} -c listen_addresses=127.0.0.1`;
    // pg_ctl removes a stale postmaster.pid left by a killed server by itself.
    const res = asServerUser(bin, 'pg_ctl', ['-D', data, '-l', log, '-w', '-t', '60', '-o', opts, 'start'], { quiet: true, allowFail: true });
    if (res.status !== 0) {
      const tail = existsSync(log) ? readFileSync(log, 'utf8').split('\n').slice(-15).join('\n') : '';
      throw new Error(`PostgreSQL did not start on port ${port}:\n${res.stdout}${res.stderr}\n${tail}`);
    }
    startedHere = true;
  }
  const base = `postgres://postgres@127.0.0.1:${port}`;
  return { bin, base, adminUrl: `${base}/postgres`, startedHere };
}

export function stopCluster(root) {
  const bin = findPgBinDir();
  if (!bin || !isClusterRunning(bin, root)) return;
  step('stopping PostgreSQL');
  asServerUser(bin, 'pg_ctl', ['-D', clusterPaths(root).data, '-m', 'fast', '-w', 'stop'], { quiet: true, allowFail: true });
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

