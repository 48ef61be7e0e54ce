// Time from opening a sheet's page to its first evaluated result, and to the live (co-edited)
// copy, measured in Chromium against a running Sheaf server. Printed, not asserted.
//
//   npx tsx e2e/bench/firstResult.ts http://localhost:3000 [sheet id] [runs]
//
// Signs in as the demo engineer; without a sheet id it takes the organization's first sheet.
// Each run is a fresh browser context (cold caches for the page's scripts), so the figure
// includes loading and parsing the editor's code, then evaluating the sheet.
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { chromium, type Page } from 'playwright-core';

const base = (process.argv[2] ?? '').replace(/\/$/, '');
if (!/^https?:\/\//.test(base)) {
  console.error('usage: npx tsx e2e/bench/firstResult.ts <server url> [sheet id] [runs]');
  process.exit(2);
}
const wantedSheet = process.argv[3] || undefined;
const runs = Number(process.argv[4] ?? 5);
const email = process.env.SHEAF_BENCH_EMAIL ?? 'engineer@demo.sheaf.test';
const password = process.env.SHEAF_BENCH_PASSWORD ?? 'sheaf-demo-2026';

/**
 * Marks, relative to navigation start, when the first result and the live copy appear. Given
 * as text: a function would be rewritten by the TypeScript runner (name helpers the page lacks).
 */
const observe = `
  const marks = {};
  window.__sheafMarks = marks;
  const check = () => {
    if (marks.firstResult === undefined && document.querySelector('[data-cell-id] [data-result-state="ok"]')) {
      marks.firstResult = performance.now();
    }
    if (marks.live === undefined && document.querySelector('[data-live="true"] [data-result-state="ok"]')) {
      marks.live = performance.now();
    }
  };
  new MutationObserver(check).observe(document, { childList: true, subtree: true, attributes: true });
`;

async function signIn(page: Page): Promise<void> {
  await page.goto(`${base}/signin`);
  await page.getByLabel(/e-?mail/i).fill(email);
  await page.getByLabel(/password/i).fill(password);
  await page.getByRole('button', { name: /sign in$/i }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/signin'));
}

async function firstSheet(page: Page): Promise<{ id: string; cells: number; title: string }> {
  return page.evaluate(async (wanted) => {
    const me = (await (await fetch('/api/auth/me')).json()) as { memberships: { organization: { id: string } }[] };
    const orgId = me.memberships[0]!.organization.id;
    const list = (await (await fetch(`/api/orgs/${orgId}/sheets`)).json()) as { sheets: { id: string }[] };
    const id = wanted ?? list.sheets[0]!.id;
    const detail = (await (await fetch(`/api/sheets/${id}`)).json()) as { sheet: { title: string; content: { cells: unknown[] } } };
    return { id, cells: detail.sheet.content.cells.length, title: detail.sheet.title };
  }, wantedSheet);
}

const browser = await chromium.launch({
  executablePath: process.env.CHROMIUM_PATH || '/usr/bin/chromium',
  args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
});
try {
  const results: { firstResult: number; live: number }[] = [];
  let sheet: { id: string; cells: number; title: string } | undefined;
  for (let run = 0; run < runs; run++) {
    const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
    const page = await context.newPage();
    await signIn(page);
    sheet ??= await firstSheet(page);
    await page.addInitScript({ content: observe });
    await page.goto(`${base}/sheets/${sheet.id}`);
    try {
      await page.waitForFunction(() => {
        const marks = (window as unknown as { __sheafMarks?: Record<string, number> }).__sheafMarks;
        return marks?.firstResult !== undefined && marks.live !== undefined;
      }, undefined, { timeout: 60_000 });
    } catch (error) {
      const shot = join(tmpdir(), 'firstResult-timeout.png');
      await page.screenshot({ path: shot, fullPage: true });
      const seen = await page.evaluate(() => (window as unknown as { __sheafMarks?: unknown }).__sheafMarks);
      throw new Error(`no result within 60 s on ${page.url()} (marks so far: ${JSON.stringify(seen)}; screenshot ${shot})`, { cause: error });
    }
    const marks = await page.evaluate(() => (window as unknown as { __sheafMarks: { firstResult: number; live: number } }).__sheafMarks);
    results.push(marks);
    await context.close();
  }
  const stats = (values: number[]) => {
    const sorted = [...values].sort((a, b) => a - b);
    const median = sorted[Math.floor(sorted.length / 2)]!;
    return `median ${median.toFixed(0)} ms (min ${sorted[0]!.toFixed(0)}, max ${sorted.at(-1)!.toFixed(0)})`;
  };
  console.log(`sheet "${sheet?.title}" (${sheet?.cells} cells), ${runs} cold page loads against ${base}`);
  console.log(`  navigation start -> first evaluated result: ${stats(results.map((r) => r.firstResult))}`);
  console.log(`  navigation start -> live copy evaluated:    ${stats(results.map((r) => r.live))}`);
} finally {
  await browser.close();
}
