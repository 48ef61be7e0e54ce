/** Benchmark worker: runs a batch kernel on its slice of shared columns when asked. */
import { parentPort } from 'node:worker_threads';
import { principalAndVonMisesBatch, principalAndVonMisesPlaneBatch } from '../src/batch/factorBatch';

interface Job {
  kind: '3d' | 'plane';
  columns: Record<string, Float64Array>;
  out: { s1: Float64Array; s2: Float64Array; s3: Float64Array; factor: Float64Array };
  // For plane states s1 and s2 receive p1 and p2.
  from: number;
  to: number;
  Sy: number;
}

parentPort!.on('message', (job: Job) => {
  const slice = (a: Float64Array) => a.subarray(job.from, job.to);
  const c = job.columns;
  if (job.kind === '3d') {
    principalAndVonMisesBatch(
      { sx: slice(c.sx!), sy: slice(c.sy!), sz: slice(c.sz!), txy: slice(c.txy!), tyz: slice(c.tyz!), tzx: slice(c.tzx!) },
      job.Sy,
      { s1: slice(job.out.s1), s2: slice(job.out.s2), s3: slice(job.out.s3) },
      slice(job.out.factor),
    );
  } else {
    principalAndVonMisesPlaneBatch(
      { sx: slice(c.sx!), sy: slice(c.sy!), txy: slice(c.txy!) },
      job.Sy,
      slice(job.out.s1),
      slice(job.out.s2),
      slice(job.out.factor),
    );
  }
  parentPort!.postMessage('done');
});
