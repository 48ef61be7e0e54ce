// One `npm start` per checkout: a pid file under .data/ says who holds it.
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';

function isAlive(pid) {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

/** Claims the checkout for this process, or returns the pid of the live holder. */
export function claimInstance(root) {
  const dir = join(root, '.data');
  mkdirSync(dir, { recursive: true });
  const file = join(dir, 'start.pid');
  if (existsSync(file)) {
    const pid = Number(readFileSync(file, 'utf8').trim());
    if (Number.isInteger(pid) && pid !== process.pid && isAlive(pid)) return { heldBy: pid };
  }
  writeFileSync(file, String(process.pid));
  return { release: () => rmSync(file, { force: true }) };
}

/** Resolves true when nothing listens on the port (on `host`, or on every interface). */
export function isPortFree(port, host) {
  return new Promise((resolve) => {
    const probe = createServer();
    probe.once('error', () => resolve(false));
    probe.once('listening', () => probe.close(() => resolve(true)));
    probe.listen(port, host);
  });
}
