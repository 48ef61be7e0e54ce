// Installs the npm packages when node_modules is missing or older than package-lock.json.
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { run } from './run.mjs';
import { step } from './log.mjs';

export function ensureNpmPackages(root) {
  const lock = join(root, 'package-lock.json');
  const marker = join(root, 'node_modules', '.sheaf-lock-hash');
  const hash = createHash('sha256').update(readFileSync(lock)).digest('hex');
  if (existsSync(marker) && readFileSync(marker, 'utf8') === hash) return;
  step('installing npm packages (package-lock.json changed or node_modules missing)');
  const env = { ...process.env, PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD: '1', TURBO_TELEMETRY_DISABLED: '1' };
  run('npm', ['install', '--no-audit', '--no-fund'], { cwd: root, env });
  writeFileSync(marker, hash);
}
