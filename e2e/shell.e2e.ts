// The app shell from a user's seat: health, sign-in, the demo sheets list, the caution line,
// the not-found page, and no request leaving the app's own origin.
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, screenshot, signIn } from './support/browser';

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

describe('the app shell', () => {
  it('answers /api/health with the version and a database round trip', async () => {
    const res = await fetch(`${baseUrl()}/api/health`);
    expect(res.status).toBe(200);
    const body = (await res.json()) as { status: string; version: string; db: { roundTripMs: number } };
    expect(body.status).toBe('ok');
    expect(body.version).toMatch(/^\d+\.\d+\.\d+/);
    expect(body.db.roundTripMs).toBeGreaterThanOrEqual(0);
  });

  it('signs the demo engineer in and lists the demo sheets, with the caution line', async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    const foreign: string[] = [];
    const origin = new URL(baseUrl()).origin;
    page.on('request', (request) => {
      const url = request.url();
      if (!url.startsWith(origin) && !url.startsWith('data:') && !url.startsWith('blob:')) foreign.push(url);
    });
    await signIn(page, 'engineer@demo.sheaf.test');
    await page.goto(`${baseUrl()}/sheets`);
    await expect.poll(() => page.getByRole('link', { name: /lifting lug/i }).count(), { timeout: 15_000 }).toBeGreaterThan(0);
    const footer = await page.locator('footer').innerText();
    expect(footer).toMatch(/judgement of a qualified engineer/i);
    expect(footer).toMatch(/governing codes/i);
    await screenshot(page, 'shell-sheets-list');
    expect(foreign).toEqual([]);
    await context.close();
  });

  it('shows a not-found page for an unknown address', async () => {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, 'viewer@demo.sheaf.test');
    await page.goto(`${baseUrl()}/no-such-page-here`);
    await expect.poll(() => page.getByRole('heading', { name: /not found/i }).count()).toBeGreaterThan(0);
    await screenshot(page, 'shell-not-found');
    await context.close();
  });
});
