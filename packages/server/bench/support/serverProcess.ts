/**
 * A Sheaf server in a child process, as `npm start` runs it (`node --import tsx src/index.ts`),
 * so a load generator in this process does not share its event loop. Its CPU time and resident
 * memory are read from /proc.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const SERVER_DIR = fileURLToPath(new URL('../..', import.meta.url));

export interface ServerUsage {
  /** User + system CPU time so far, in seconds. */
  cpuSeconds: number;
  /** Resident set size, in bytes. */
  rssBytes: number;
}

export interface ServerProcess {
  url: string;
  pid: number;
  usage(): ServerUsage;
  stop(): Promise<void>;
}

const CLOCK_TICKS = 100;

function usageOf(pid: number): ServerUsage {
  const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
  // Fields after the command name (which may hold spaces) start at ") ".
  const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
  const utime = Number(fields[11]);
  const stime = Number(fields[12]);
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const rssKb = Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? 'NaN');
  return { cpuSeconds: (utime + stime) / CLOCK_TICKS, rssBytes: rssKb * 1024 };
}

export async function startServerProcess(env: Record<string, string>, port: number): Promise<ServerProcess> {
  // BENCH_CPU_PROF=<folder>: the server writes a V8 CPU profile there when it stops.
  const profile = process.env.BENCH_CPU_PROF ? ['--cpu-prof', `--cpu-prof-dir=${process.env.BENCH_CPU_PROF}`] : [];
  const child: ChildProcess = spawn(process.execPath, [...profile, '--import', 'tsx', 'src/index.ts'], {
    cwd: SERVER_DIR,
    env: { ...process.env, ...env, PORT: String(port), HOST: '127.0.0.1' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const url = `http://127.0.0.1:${port}`;
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  for (let attempt = 0; ; attempt++) {
    if (child.exitCode !== null) throw new Error(`the server exited with ${child.exitCode} before answering`);
    try {
      const response = await fetch(`${url}/api/health`);
      if (response.ok) break;
    } catch {
      // not listening yet
    }
    if (attempt > 240) throw new Error('the server did not answer /api/health within a minute');
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
  return {
    url,
    pid: child.pid!,
    usage: () => usageOf(child.pid!),
    async stop() {
      if (child.exitCode === null) child.kill('SIGTERM');
      await exited;
    },
  };
}
