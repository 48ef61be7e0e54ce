// Templates and materials from a user's seat: an engineer starts a sheet from a built-in template
// through the parameter form (a bad value is refused beside its field, the preview shows the
// results with their verdicts), and a viewer reads the materials library with its sources.
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

describe('templates and materials', () => {
  it('creates a sheet from a built-in template through the parameter form and shows its results', async () => {
    const context = await browser.newContext({ viewport: { width: 1360, height: 900 } });
    const page = await context.newPage();
    await signIn(page, 'engineer@demo.sheaf.test');

    await page.goto(`${baseUrl()}/templates`);
    const card = page.getByRole('article').filter({ hasText: 'Thin-walled cylinder under internal pressure' });
    await expect.poll(() => card.count(), { timeout: 15_000 }).toBe(1);
    expect(await page.getByRole('article').count()).toBeGreaterThanOrEqual(9);
    await screenshot(page, 'templates-gallery');

    await card.getByRole('link', { name: /new sheet from/i }).click();
    await page.waitForURL(/\/templates\/builtin%3Athin-walled-cylinder\/new$/);
    const thickness = page.getByLabel(/Wall thickness/);
    await thickness.waitFor();

    // Thin-wall theory: t at most r/10 = 6 mm for the 60 mm radius.
    await thickness.fill('7 mm');
    await page.getByLabel(/Internal pressure/).fill('18 kN');
    await page.getByRole('button', { name: /create the sheet/i }).click();
    await expect.poll(() => page.getByText(/Wall thickness \(t\): must be at most 6 mm \(got 7 mm\)/).count()).toBe(1);
    await expect.poll(() => page.getByText(/Internal pressure \(p\): expected a stress/).count()).toBe(1);
    expect(page.url()).toMatch(/\/new$/);
    await screenshot(page, 'templates-parameter-form-errors');

    await thickness.fill('5 mm');
    await page.getByLabel(/Internal pressure/).fill('18');
    await page.getByLabel('Sheet title').fill('Accumulator shell, 18 MPa');
    // Hoop stress pr/t = 18 MPa * 60 / 5 = 216 MPa (common practice, no source).
    const preview = page.getByRole('table', { name: 'Results with these values' });
    await expect.poll(() => preview.getByRole('row').filter({ hasText: 's_hoop' }).innerText(), { timeout: 15_000 }).toMatch(/216 MPa/);
    await expect.poll(() => preview.getByRole('row').filter({ hasText: /^vonMises/ }).innerText()).toMatch(/n = .*Pass/s);
    await screenshot(page, 'templates-parameter-form');

    await page.getByRole('button', { name: /create the sheet/i }).click();
    await page.waitForURL(/\/sheets\/[0-9a-f-]{36}$/, { timeout: 15_000 });
    await expect.poll(() => page.getByText(/Made from/).count(), { timeout: 15_000 }).toBeGreaterThan(0);
    const body = await page.locator('main').innerText();
    expect(body).toMatch(/Accumulator shell, 18 MPa/);
    expect(body).toMatch(/18 MPa/);
    expect(body).toMatch(/5 mm/);

    // The live sheet evaluates the checks with the library material and shows its values and source.
    const check = page.locator('#cell-c1');
    await expect.poll(() => check.innerText(), { timeout: 20_000 }).toMatch(/Pass/);
    expect(await check.innerText()).toMatch(/655 MPa[\s\S]*Shigley/);

    // A material whose yield strength is not confirmed against its source: its option says so,
    // and the check shows the caution under the values it uses.
    const material = check.getByLabel(/^material of/);
    expect(await material.locator('option', { hasText: '17-4 PH' }).innerText()).toMatch(/Sy source not confirmed/);
    await material.selectOption('ss-17-4ph-h1025');
    await expect.poll(() => check.innerText()).toMatch(/1000 MPa[\s\S]*unconfirmed[\s\S]*Caution, source not confirmed: Yield strength Sy was not confirmed/);
    await check.scrollIntoViewIfNeeded();
    await screenshot(page, 'sheet-material-unconfirmed');
    await material.selectOption('aisi-4140-qt650');
    await expect.poll(() => check.innerText()).not.toMatch(/Caution, source not confirmed/);

    const sheetId = page.url().split('/').pop() as string;
    const api = await page.evaluate(async (id) => (await fetch(`/api/sheets/${id}`)).json(), sheetId);
    expect(api.sheet.template).toEqual({ id: 'builtin:thin-walled-cylinder', version: 2 });
    await screenshot(page, 'templates-sheet-from-template');
    await context.close();
  });

  it('lists the built-in materials with their bases and published sources', async () => {
    const context = await browser.newContext({ viewport: { width: 1360, height: 900 } });
    const page = await context.newPage();
    await signIn(page, 'viewer@demo.sheaf.test');
    await page.goto(`${baseUrl()}/materials`);
    const a36 = page.getByRole('rowgroup').filter({ hasText: 'ASTM A36 structural steel' });
    await expect.poll(() => a36.count(), { timeout: 15_000 }).toBe(1);
    const text = await a36.innerText();
    expect(text).toMatch(/250 MPa/);
    expect(text).toMatch(/ASTM A36\/A36M-19, Table 3/);
    expect(text).toMatch(/min\./);
    // A viewer reads; adding is for owners and engineers.
    expect(await page.getByRole('button', { name: 'Add a material' }).count()).toBe(0);

    await page.getByLabel('Category').selectOption('soil');
    await expect.poll(() => page.getByRole('rowgroup').filter({ hasText: 'Dense sand' }).count()).toBe(1);
    expect(await page.getByRole('rowgroup').filter({ hasText: 'ASTM A36' }).count()).toBe(0);
    await screenshot(page, 'materials-library');

    // A value whose source could not be confirmed carries the mark beside its basis and its source line.
    await page.getByLabel('Category').selectOption('rock');
    const rock = page.getByRole('rowgroup').filter({ hasText: 'Weathered sandstone' });
    await expect.poll(() => rock.count()).toBe(1);
    expect(await rock.innerText()).toMatch(/100 kPa[\s\S]*unconfirmed[\s\S]*Not confirmed/);
    await screenshot(page, 'materials-library-unconfirmed');
    await context.close();
  });
});
