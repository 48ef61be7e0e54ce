/**
 * Engine benchmark: prints figures, asserts nothing (targets are printed beside them).
 *
 *   npm run bench -w @sheaf/engine
 *
 * 1. Batch: 3D principal stresses + von Mises factor over 1,000,000 random points, one thread and
 *    two worker threads; plane states likewise.
 * 2. The same batch in vectorised numpy (bench/numpy_batch.py), as a ratio.
 * 3. A generated 500-cell sheet: full evaluation, and re-evaluation after one input edit.
 */
import { spawnSync } from 'node:child_process';
import { writeFileSync, mkdtempSync, rmSync } from 'node:fs';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { Worker } from 'node:worker_threads';
import { allocatePrincipal } from '../src/batch/columns';
import { criterionFactorBatch, principalAndVonMisesBatch, principalAndVonMisesPlaneBatch } from '../src/batch/factorBatch';
import { principalPlaneBatch } from '../src/batch/principalPlaneBatch';
import { createEvaluator } from '../src/sheet/createEvaluator';
import { randomColumns } from './data';
import { generatedSheet } from './sheet500';

const N = 1_000_000;
const SY = 250e6;
const fmt = (x: number) => (x >= 1e6 ? `${(x / 1e6).toFixed(1)} M` : x.toFixed(0));

interface Rate {
  best: number;
  median: number;
  /** Points per second of this process's CPU time over all runs: less sensitive to other load. */
  cpu?: number;
}

/** CPU time of this process in ms (user + system); with workers it counts every thread. */
function cpuMs(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1e3;
}

/** Points/s over `runs` runs after `warm` warm-up runs: best and median wall clock, and per CPU time. */
function rate(run: () => void, runs = 7, warm = 2): Rate {
  for (let i = 0; i < warm; i++) run();
  const rates: number[] = [];
  const cpu0 = cpuMs();
  for (let i = 0; i < runs; i++) {
    const t = performance.now();
    run();
    rates.push(N / ((performance.now() - t) / 1e3));
  }
  const cpu = (runs * N) / ((cpuMs() - cpu0) / 1e3);
  rates.sort((a, b) => a - b);
  return { best: rates[rates.length - 1]!, median: rates[Math.floor(rates.length / 2)]!, cpu };
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

function line(label: string, r: Rate, target?: number): void {
  const verdict = target === undefined ? '' : r.best >= target ? `  (target ≥ ${fmt(target)}/s: met)` : `  (target ≥ ${fmt(target)}/s: NOT met)`;
  const cpu = r.cpu === undefined ? '' : `, per CPU second ${fmt(r.cpu)}`;
  console.log(`  ${label.padEnd(48)} best ${fmt(r.best)} points/s, median ${fmt(r.median)}/s${cpu}${verdict}`);
}

async function workers(kind: '3d' | 'plane', count: number, columns: Record<string, Float64Array>): Promise<Rate> {
  const shared = (n: number) => new Float64Array(new SharedArrayBuffer(n * 8));
  const out = { s1: shared(N), s2: shared(N), s3: shared(N), factor: shared(N) };
  // Workers load the TypeScript kernel through tsx, like the main thread.
  const pool = Array.from({ length: count }, () => new Worker(new URL('./worker.mjs', import.meta.url)));
  const runOnce = () =>
    Promise.all(
      pool.map(
        (w, k) =>
          new Promise<void>((resolve, reject) => {
            w.once('message', () => resolve());
            w.once('error', reject);
            const from = Math.floor((k * N) / count);
            const to = Math.floor(((k + 1) * N) / count);
            w.postMessage({ kind, columns, out, from, to, Sy: SY });
          }),
      ),
    );
  for (let i = 0; i < 3; i++) await runOnce();
  const rates: number[] = [];
  for (let i = 0; i < 7; i++) {
    const t = performance.now();
    await runOnce();
    rates.push(N / ((performance.now() - t) / 1e3));
  }
  await Promise.all(pool.map((w) => w.terminate()));
  rates.sort((a, b) => a - b);
  return { best: rates[rates.length - 1]!, median: rates[Math.floor(rates.length / 2)]! };
}

function numpy(columns: Record<string, Float64Array>, plane: boolean): { points_per_s?: number; eigvalsh_points_per_s?: number; checksum?: number; error?: string } {
  const dir = mkdtempSync(join(tmpdir(), 'sheaf-bench-'));
  try {
    const file = join(dir, 'points.f64');
    const all = new Float64Array(6 * N);
    ['sx', 'sy', 'sz', 'txy', 'tyz', 'tzx'].forEach((k, i) => all.set(columns[k]!, i * N));
    writeFileSync(file, Buffer.from(all.buffer));
    const args = [new URL('./numpy_batch.py', import.meta.url).pathname, file, String(N), String(SY), ...(plane ? ['--plane'] : [])];
    const r = spawnSync('python3', args, { encoding: 'utf8', timeout: 600_000 });
    if (r.error) return { error: `python3 could not run (${r.error.message})` };
    if (r.status !== 0) return { error: r.stderr.trim().split('\n').pop() ?? 'python3 failed' };
    return JSON.parse(r.stdout.trim().split('\n').pop()!);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

async function sheetBenchmark(): Promise<void> {
  console.log('\nGenerated 500-cell sheet (load → stress → principal or criterion groups, one shared Sy):');
  const cells = generatedSheet();
  const cold = performance.now();
  createEvaluator({ cells });
  const coldMs = performance.now() - cold;
  // Let the JIT settle (the first evaluations run unoptimised code), then time.
  for (let i = 0; i < 10; i++) createEvaluator({ cells });
  const full: number[] = [];
  const fullRuns = 20;
  const fullCpu0 = cpuMs();
  for (let i = 0; i < fullRuns; i++) {
    const t = performance.now();
    createEvaluator({ cells });
    full.push(performance.now() - t);
  }
  const fullCpu = (cpuMs() - fullCpu0) / fullRuns;
  const fullMs = median(full);
  console.log(`  full evaluation: first (cold: expressions compiled, code not yet optimised) ${coldMs.toFixed(1)} ms;`);
  console.log(`    warm: median ${fullMs.toFixed(2)} ms wall, ${fullCpu.toFixed(2)} ms CPU per evaluation (target < 20 ms: ${Math.min(fullMs, fullCpu) < 20 ? 'met' : 'NOT met'})`);
  const ev = createEvaluator({ cells });
  const edits: number[] = [];
  let touched = 0;
  const editRuns = 300;
  const editCpu0 = cpuMs();
  for (let k = 0; k < editRuns; k++) {
    const i = (k * 37) % 160;
    const t = performance.now();
    const report = ev.update({ id: `f${i}`, kind: 'quantity', name: `F${i}`, expr: `${10 + (k % 23)} kN` });
    edits.push(performance.now() - t);
    touched += report.evaluated.length;
  }
  const editCpu = (cpuMs() - editCpu0) / editRuns;
  const editMs = median(edits);
  console.log(`  re-evaluation after editing one load: median ${(editMs * 1e3).toFixed(0)} µs wall, ${(editCpu * 1e3).toFixed(0)} µs CPU mean, ${(touched / edits.length).toFixed(1)} cells evaluated per edit (target < 1 ms: ${editMs < 1 ? 'met' : 'NOT met'})`);
  const renames: number[] = [];
  for (let k = 0; k < 40; k++) {
    const i = (k * 13) % 160;
    const t = performance.now();
    ev.update({ id: `s${i}`, kind: 'stress', name: `S${i}`, sx: `F${i} / A0 + ${k % 3} MPa`, sy: `${k % 7} MPa`, txy: `Sy / ${20 + (k % 5)}` });
    renames.push(performance.now() - t);
  }
  console.log(`  re-evaluation after an edit that changes references (graph rebuilt): median ${(median(renames) * 1e3).toFixed(0)} µs`);
  const shared: number[] = [];
  let sharedTouched = 0;
  for (let k = 0; k < 40; k++) {
    const t = performance.now();
    const report = ev.update({ id: 'sy', kind: 'quantity', name: 'Sy', expr: `${240 + (k % 9)} MPa` });
    shared.push(performance.now() - t);
    sharedTouched = report.evaluated.length;
  }
  console.log(`  re-evaluation after editing the shared Sy: median ${median(shared).toFixed(2)} ms, ${sharedTouched} cells evaluated`);
}

async function main(): Promise<void> {
  console.log(`Sheaf engine benchmark — Node ${process.version}, ${availableParallelism()} logical CPUs, load average ${loadavg().map((x) => x.toFixed(1)).join(' ')}`);
  console.log('(shared machine: wall-clock figures fall with other load; "per CPU second" counts only this process\'s CPU time)');
  // The sheet first, while the heap is small: the batch columns below take some 150 MB.
  await sheetBenchmark();

  const columns = randomColumns(N);
  const plane = { sx: columns.sx, sy: columns.sy, txy: columns.txy };
  const principal = allocatePrincipal(N);
  const factors = new Float64Array(N);

  console.log(`\nBatch, ${fmt(N)} random points (±300 MPa per component), single thread:`);
  const fused = rate(() => principalAndVonMisesBatch(columns, SY, principal, factors));
  line('3D principal + von Mises factor (fused)', fused, 10e6);
  line('3D principal + von Mises factor (any theory)', rate(() => criterionFactorBatch('von-mises', columns, { Sy: SY }, factors, principal)), 10e6);
  line('3D principal + Tresca factor', rate(() => criterionFactorBatch('tresca', columns, { Sy: SY }, factors, principal)));
  const p1 = new Float64Array(N);
  const p2 = new Float64Array(N);
  const planeVm = rate(() => principalAndVonMisesPlaneBatch(plane, SY, p1, p2, factors));
  line('plane principal + von Mises factor (fused)', planeVm, 30e6);
  line('plane principal + von Mises factor (any theory)', rate(() => criterionFactorBatch('von-mises', plane, { Sy: SY }, factors)), 30e6);
  line('plane principal p1, p2 only', rate(() => principalPlaneBatch(plane, p1, p2)));
  line('plane principal + Coulomb-Mohr factor', rate(() => criterionFactorBatch('coulomb-mohr', plane, { Sut: 200e6, Suc: 600e6 }, factors)));

  principalAndVonMisesBatch(columns, SY, principal, factors);
  let jsChecksum = 0;
  for (let i = 0; i < N; i++) if (Number.isFinite(factors[i]!)) jsChecksum += factors[i]!;

  console.log('\nBatch with worker threads (shared memory, rows split evenly):');
  for (const count of [1, 2]) {
    const w3 = await workers('3d', count, columns);
    line(`3D principal + von Mises, ${count} worker${count > 1 ? 's' : ''}`, w3);
    const wp = await workers('plane', count, columns);
    line(`plane + von Mises, ${count} worker${count > 1 ? 's' : ''}`, wp);
  }

  console.log('\nSame batch in vectorised numpy (bench/numpy_batch.py):');
  const np3 = numpy(columns, false);
  if (np3.error) {
    console.log(`  skipped: ${np3.error}`);
  } else {
    console.log(`  numpy 3D principal + von Mises factor: best ${fmt(np3.points_per_s!)} points/s; numpy.linalg.eigvalsh: ${fmt(np3.eigvalsh_points_per_s!)} points/s`);
    console.log(`  ratio engine / numpy (3D): ${(fused.best / np3.points_per_s!).toFixed(2)}×; factor checksums agree to ${(Math.abs(jsChecksum - np3.checksum!) / jsChecksum).toExponential(1)} relative`);
    const np2 = numpy(columns, true);
    if (!np2.error) console.log(`  numpy plane + von Mises: best ${fmt(np2.points_per_s!)} points/s; ratio engine / numpy (plane): ${(planeVm.best / np2.points_per_s!).toFixed(2)}×`);
  }

  console.log(`\nload average at the end: ${loadavg().map((x) => x.toFixed(1)).join(' ')}`);
}

await main();
