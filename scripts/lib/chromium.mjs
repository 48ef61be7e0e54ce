// Debian's Chromium for the browser tests: installed with apt-get when missing, never downloaded.
import { existsSync } from 'node:fs';
import { aptInstall } from './run.mjs';
import { step } from './log.mjs';

export function ensureChromium() {
  const path = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
  if (existsSync(path)) return path;
  step('Chromium not found: installing it from Debian packages');
  aptInstall(['chromium']);
  if (!existsSync(path)) throw new Error(`chromium was installed but ${path} is missing`);
  return path;
}
