/**
 * Building a CodeMirror editor measures the page, and a sheet has dozens of fields. Editors are
 * built a few at a time between frames, top to bottom, so the first results show at once and
 * the page stays responsive; a field someone clicks or tabs into is built right away.
 */
interface Job {
  run: () => void;
  done: boolean;
}

const queue: Job[] = [];
let pending = false;
/** Time spent building editors per turn of the event loop, ms. */
const BUDGET_MS = 12;

function pump(): void {
  pending = false;
  const start = performance.now();
  while (queue.length > 0 && performance.now() - start < BUDGET_MS) {
    const job = queue.shift()!;
    if (job.done) continue;
    job.done = true;
    job.run();
  }
  if (queue.length > 0) schedule();
}

function schedule(): void {
  if (pending) return;
  pending = true;
  setTimeout(pump, 0);
}

/** Queue `run`; the returned function cancels it if it has not run yet. */
export function queueEditor(run: () => void): () => void {
  const job: Job = { run, done: false };
  queue.push(job);
  schedule();
  return () => {
    job.done = true;
  };
}

/** Build every queued editor now (tests, and before printing). */
export function flushQueuedEditors(): void {
  while (queue.length > 0) {
    const job = queue.shift()!;
    if (job.done) continue;
    job.done = true;
    job.run();
  }
}
