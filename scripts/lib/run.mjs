// Child-process helpers for the bootstrap scripts.
import { spawnSync, spawn } from 'node:child_process';

/** Runs a command to completion, inheriting stdio unless `quiet`; returns {status, stdout, stderr}. */
export function run(command, args, options = {}) {
  const { quiet = false, env, cwd, allowFail = false } = options;
  const result = spawnSync(command, args, {
    cwd,
    env: env ?? process.env,
    stdio: quiet ? ['ignore', 'pipe', 'pipe'] : 'inherit',
    encoding: 'utf8',
  });
  if (result.error) {
    if (allowFail) return { status: 127, stdout: '', stderr: String(result.error) };
    throw result.error;
  }
  if (result.status !== 0 && !allowFail) {
    const detail = quiet ? `\n${result.stdout ?? ''}${result.stderr ?? ''}` : '';
    throw new Error(`${command} ${args.join(' ')} exited with ${result.status}${detail}`);
  }
  return { status: result.status ?? 1, stdout: result.stdout ?? '', stderr: result.stderr ?? '' };
}

/** Starts a long-running child; resolves with its exit code. */
export function runAsync(command, args, options = {}) {
  const child = spawn(command, args, { stdio: 'inherit', ...options });
  const done = new Promise((resolve) => {
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 128 : 1)));
  });
  return { child, done };
}

export function isRoot() {
  return typeof process.getuid === 'function' && process.getuid() === 0;
}

export function hasCommand(name) {
  return run('sh', ['-c', `command -v ${name}`], { quiet: true, allowFail: true }).status === 0;
}

let aptUpdated = false;
/** Installs Debian packages with apt-get (root only), running `apt-get update` once first. */
export function aptInstall(packages) {
  if (!isRoot()) {
    throw new Error(`missing ${packages.join(', ')}: install them with apt-get (needs root)`);
  }
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!aptUpdated) {
    run('apt-get', ['update', '-q'], { env });
    aptUpdated = true;
  }
  run('apt-get', ['install', '-y', '-q', '--no-install-recommends', ...packages], { env });
}
