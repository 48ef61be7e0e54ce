// Tiny console helpers for the bootstrap scripts (no dependencies: these run before npm install).
export function step(message) {
  process.stdout.write(`\x1b[2m[sheaf]\x1b[0m ${message}\n`);
}

export function fail(message) {
  process.stderr.write(`\x1b[31m[sheaf] ${message}\x1b[0m\n`);
  process.exit(1);
}
