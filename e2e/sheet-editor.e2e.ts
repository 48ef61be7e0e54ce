// The sheet editor from three seats at once: the demo engineer in two browser windows (the seed
// has one engineer) and the demo checker. An engineer imports a sheet holding every kind of cell
// (after an invalid file is refused with the field named), edits a quantity, and the other
// window and the checker see the new result and the moved point on Mohr's circle; the checker's
// editor is read-only. Screenshots of the sheet are saved for review.
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { baseUrl, launchBrowser, screenshot, screenshotDir, signIn } from './support/browser';

const ENGINEER = 'engineer@demo.sheaf.test';
const CHECKER = 'checker@demo.sheaf.test';

/** Every kind of cell of format v1, with our own numbers (the lifting lug of the demo firm). */
const EVERY_KIND = {
  format: 'sheaf-sheet',
  version: 1,
  title: 'Lifting lug, every kind of cell',
  unitSystem: 'SI',
  cells: [
    {
      id: 'n1',
      kind: 'note',
      text: 'Load case **LC2** on the gantry-beam lug: $F = 18\\,kN$ on a $40 \\times 12\\,mm$ section.\n\n$$\n\\sigma_x = \\frac{F}{A}\n$$',
    },
    { id: 'q_load', kind: 'quantity', name: 'load', expr: '18 kN' },
    { id: 'q_area', kind: 'quantity', name: 'area', expr: '40 mm * 12 mm' },
    { id: 's1', kind: 'stress', name: 'S', sx: 'load / area', sy: '0 MPa', txy: '22 MPa' },
    { id: 's3', kind: 'stress', name: 'Soil', sx: '-70 kPa', sy: '-150 kPa', txy: '18 kPa', sz: '-80 kPa', tyz: '0 kPa', tzx: '0 kPa' },
    { id: 'g1', kind: 'rosette', name: 'G', layout: 'rectangular', ea: '420e-6', eb: '310e-6', ec: '-95e-6', E: '68.9 GPa', nu: '0.33' },
    { id: 'r1', kind: 'rotate', name: 'R', of: 'S', angle: '30 deg' },
    { id: 'p1', kind: 'principal', name: 'P', of: 'S' },
    { id: 'c1', kind: 'criterion', name: 'C', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
    {
      id: 'pts',
      kind: 'pointset',
      name: 'Pts',
      source: { rows: [[80, -40, 25], [100, 20, 5], [-30, -60, 10]] },
      columns: { sx: 0, sy: 1, txy: 2 },
      unit: 'MPa',
      theory: 'von-mises',
      strength: { Sy: '250 MPa' },
      required: '1.5',
    },
  ],
};

let browser: Browser;
const contexts: BrowserContext[] = [];

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  for (const context of contexts) await context.close();
  await browser?.close();
});

async function seat(email: string): Promise<Page> {
  const context = await browser.newContext({ viewport: { width: 1440, height: 1000 } });
  contexts.push(context);
  const page = await context.newPage();
  await signIn(page, email);
  return page;
}

/** Opens a sheet and waits for its live copy (the saved copy shows first, read-only). */
async function openLive(page: Page, path: string): Promise<void> {
  await page.goto(`${baseUrl()}${path}`);
  await page.locator('[data-live="true"]').waitFor({ timeout: 20_000 });
}

const number = (page: Page, cell: string, value: string) =>
  page.locator(`#cell-${cell} dl[aria-label^="Results"] [data-value="${value}"] [data-number]`).innerText();

describe('sheet editor', () => {
  it('imports, co-edits and shows the change to every seat, read-only for the checker', async () => {
    const engineer = await seat(ENGINEER);

    // The project page: an invalid file is refused with its fields named; nothing is created.
    await engineer.goto(`${baseUrl()}/projects`);
    await engineer.getByRole('link', { name: /Gantry beam lifting lug/ }).first().click();
    const fileInput = engineer.getByLabel('Sheet file', { exact: true });
    await fileInput.waitFor({ timeout: 20_000 });
    const broken = { ...EVERY_KIND, cells: [{ ...EVERY_KIND.cells[1], expr: 18 }, { ...EVERY_KIND.cells[3], theory: 'x' }] };
    await fileInput.setInputFiles({ name: 'lug-broken.sheet.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(broken)) });
    const problems = engineer.getByRole('list', { name: 'Problems in the file' });
    await expect.poll(() => problems.innerText(), { timeout: 10_000 }).toMatch(/cells\[0\]\.expr: must be a string/);
    expect(await problems.innerText()).toMatch(/cells\[1\]: unknown field "theory"/);
    expect(engineer.url()).toMatch(/\/projects\//);
    await screenshot(engineer, 'sheet-import-invalid-file');

    // A valid file becomes a new sheet, and the page opens it.
    await fileInput.setInputFiles({ name: 'lug.sheet.json', mimeType: 'application/json', buffer: Buffer.from(JSON.stringify(EVERY_KIND)) });
    await engineer.waitForURL(/\/sheets\/[0-9a-f-]{36}$/, { timeout: 20_000 });
    const sheetPath = new URL(engineer.url()).pathname;
    await engineer.locator('[data-live="true"]').waitFor({ timeout: 20_000 });

    const second = await seat(ENGINEER);
    const checker = await seat(CHECKER);
    await openLive(second, sheetPath);
    await openLive(checker, sheetPath);

    // Every kind is there with its result; 18 kN / 480 mm² = 37.5 MPa (arithmetic).
    for (const page of [engineer, second, checker]) {
      await expect.poll(() => number(page, 's1', 'sx'), { timeout: 10_000 }).toBe('37.5');
      expect(await page.locator('[data-cell-id]').count()).toBe(EVERY_KIND.cells.length);
    }
    expect(await engineer.locator('#cell-c1 [data-verdict]').getAttribute('data-verdict')).toBe('pass');
    expect(await engineer.locator('#cell-s3 [data-figure="mohr-circles-3d"] [data-part="admissible-region"]').count()).toBe(1);
    expect(await engineer.locator('#cell-c1 [data-figure="failure-envelope"]').count()).toBe(1);
    expect(await engineer.locator('#cell-n1 .katex').count()).toBeGreaterThan(0);

    // The checker reads live but cannot change anything.
    expect(await checker.locator('[data-connection="live"]').innerText()).toMatch(/Read-only/);
    expect(await checker.getByRole('button', { name: /Add cell/ }).count()).toBe(0);
    expect(await checker.getByRole('button', { name: /^Delete/ }).count()).toBe(0);
    // A read-only editor (it shows where others type), never an editable one.
    const checkerField = checker.locator('#cell-q_load [data-field="expr"] .cm-content');
    await expect.poll(() => checkerField.getAttribute('contenteditable'), { timeout: 10_000 }).toBe('false');
    expect(await checkerField.getAttribute('aria-readonly')).toBe('true');
    expect(await checker.locator('.cm-content[contenteditable="true"]').count()).toBe(0);

    // Presence: the second window shows the engineer's other window, and where they are.
    await engineer.locator('#cell-q_load [data-field="expr"] .cm-content').click();
    await expect.poll(() => second.getByRole('region', { name: 'Who is in this sheet' }).innerText(), { timeout: 10_000 }).toMatch(
      /Eamon Reyes.*in load/s,
    );
    await expect.poll(() => second.locator('#cell-q_load [data-peers]').count(), { timeout: 10_000 }).toBe(1);

    const pointBefore = await second.locator('#cell-s1 [data-point="X"]').getAttribute('data-x');
    expect(await second.locator('#cell-s1 [data-label="X"]').textContent()).toMatch(/37\.5/);

    // One engineer edits the load; 24 kN / 480 mm² = 50 MPa everywhere else.
    await engineer.keyboard.press('Control+A');
    await engineer.keyboard.type('24 kN');
    await expect.poll(() => number(engineer, 's1', 'sx'), { timeout: 5_000 }).toBe('50');
    for (const page of [second, checker]) {
      await expect.poll(() => number(page, 's1', 'sx'), { timeout: 10_000 }).toBe('50');
      await expect.poll(() => page.locator('#cell-s1 [data-label="X"]').textContent(), { timeout: 10_000 }).toMatch(/\(50(\.0)?,/);
    }
    const pointAfter = await second.locator('#cell-s1 [data-point="X"]').getAttribute('data-x');
    expect(Number(pointAfter)).not.toBeCloseTo(Number(pointBefore), 1);
    // The engineer's caret (with their name) may sit after the text in the checker's copy.
    expect(await checkerField.innerText()).toMatch(/^24 kN/);

    // Turning the rotated diameter writes the angle into the rotate cell for everyone.
    const handle = engineer.locator('#cell-r1 [data-part="rotation-handle"]');
    await handle.focus();
    await engineer.keyboard.press('PageUp');
    await expect.poll(() => second.locator('#cell-r1 [data-field="angle"] .cm-content').innerText(), { timeout: 10_000 }).toMatch(/^40 deg/);
    await expect.poll(() => number(checker, 'r1', 'angle'), { timeout: 10_000 }).toBe('40');

    await engineer.evaluate(() => (document.activeElement as HTMLElement | null)?.blur());
    await screenshot(engineer, 'sheet-editor-every-kind');
    await screenshot(checker, 'sheet-editor-checker-read-only');
    for (const id of ['s1', 's3', 'r1', 'c1', 'pts', 'g1']) {
      const cell = engineer.locator(`#cell-${id}`);
      await cell.scrollIntoViewIfNeeded();
      await cell.screenshot({ path: join(screenshotDir, `sheet-cell-${id}.png`) });
    }

    // Export: the live sheet as a format v1 file named after its calc number, with the new load.
    const [download] = await Promise.all([engineer.waitForEvent('download'), engineer.getByRole('button', { name: 'Export file' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^GBL-\d{3}\.sheet\.json$/);
    const exported = JSON.parse(readFileSync(await download.path(), 'utf8')) as typeof EVERY_KIND;
    expect(exported.format).toBe('sheaf-sheet');
    expect(exported.cells.map((c) => c.id)).toEqual(EVERY_KIND.cells.map((c) => c.id));
    expect(exported.cells[1]).toEqual({ id: 'q_load', kind: 'quantity', name: 'load', expr: '24 kN' });

    // Reorder by dragging the note's handle below the area quantity; the other window follows.
    const area = engineer.locator('#cell-q_area');
    const areaBox = (await area.boundingBox())!;
    // Dropped on the lower half of a cell, a cell lands below it.
    await engineer.getByRole('button', { name: /Drag to move note 1/ }).dragTo(area, {
      targetPosition: { x: 200, y: areaBox.height - 8 },
    });
    const order = (page: Page) => page.locator('[data-cell-id]').evaluateAll((cells) => cells.map((c) => c.getAttribute('data-cell-id')));
    await expect.poll(() => order(second), { timeout: 10_000 }).toEqual(['q_load', 'q_area', 'n1', 's1', 's3', 'g1', 'r1', 'p1', 'c1', 'pts']);
    // And back with the keyboard: Alt+Arrow up twice on the focused note.
    await engineer.locator('#cell-n1').getByRole('button', { name: 'Edit note' }).focus();
    await engineer.keyboard.press('Alt+ArrowUp');
    await engineer.keyboard.press('Alt+ArrowUp');
    await expect.poll(() => order(checker), { timeout: 10_000 }).toEqual(EVERY_KIND.cells.map((c) => c.id));

    // US customary for the whole sheet: the same numbers in ksi (50 MPa / 6.894757 = 7.2519 ksi).
    await engineer.getByLabel('Units').selectOption('US');
    await expect.poll(() => number(second, 's1', 'sx'), { timeout: 10_000 }).toBe('7.2519');
    await screenshot(second, 'sheet-editor-us-customary');
  }, 180_000);
});
