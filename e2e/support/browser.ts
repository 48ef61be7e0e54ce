// Debian's Chromium driven by playwright-core; screenshots go to reports/screenshots/.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { inject } from 'vitest';

const root = new URL('../..', import.meta.url).pathname;
export const screenshotDir = join(root, 'reports', 'screenshots');

export function baseUrl(): string {
  return inject('baseUrl');
}

export async function launchBrowser(): Promise<Browser> {
  return chromium.launch({
    executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(screenshotDir, { recursive: true });
  const path = join(screenshotDir, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}

/** Signs in through the form as one of the seeded demo accounts. */
export async function signIn(page: Page, email: string, password = 'sheaf-demo-2026'): Promise<void> {
  await page.goto(`${baseUrl()}/signin`);
  await page.getByLabel(/e-?mail/i).fill(email);
  await page.getByLabel(/password/i).fill(password);
  await page.getByRole('button', { name: /sign in$/i }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/signin'));
}
