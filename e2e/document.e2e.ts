// The issued calculation as a document, on screen and on paper. The demo engineer files a lug
// sheet with deliberately long equations and submits it; the demo checker notes a cell, resolves
// the note and approves revision 1 from the sheet; the revision's page then shows the calculation
// as issued (typeset equations, figures, the check summary, the note and its resolution, the
// content hash) with no equation cut off, and prints to PDF with Chromium with the title block on
// every page, no controls and no notes rail. The live sheet prints marked "Not issued — draft".
// Screenshots and the PDFs (and, where poppler-utils is installed, their pages as PNG) are kept
// in reports/screenshots/.
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, screenshot, screenshotDir, signIn } from './support/browser';

const ENGINEER = 'engineer@demo.sheaf.test';
const CHECKER = 'checker@demo.sheaf.test';

/**
 * The gantry-beam lug of the demo firm (our own numbers), written out longhand so that its
 * equations are longer than a page is wide: a moment summed over nine terms, and a stress whose
 * formula holds a fraction with a long numerator that cannot be broken.
 */
const LONG_LUG = {
  format: 'sheaf-sheet',
  version: 1,
  title: 'Lug with longhand equations',
  unitSystem: 'SI',
  cells: [
    { id: 'n1', kind: 'note', text: 'Sling load $P = 18\\,\\mathrm{kN}$ at $30^\\circ$; moment arm summed over nine load steps.' },
    { id: 'q1', kind: 'quantity', name: 'P', expr: '18 kN' },
    { id: 'q2', kind: 'quantity', name: 'e', expr: '35 mm' },
    { id: 'q3', kind: 'quantity', name: 'b', expr: '80 mm' },
    { id: 'q4', kind: 'quantity', name: 't', expr: '12 mm' },
    {
      id: 'q5',
      kind: 'quantity',
      name: 'Msum',
      expr: 'P*e + 0.5*P*e + 0.25*P*e + 0.125*P*e + 0.0625*P*e + 0.03125*P*e + 0.015625*P*e + 0.0078125*P*e + 0.00390625*P*e',
    },
    {
      id: 's1',
      kind: 'stress',
      name: 'S',
      sx: '(P*cos(30 deg) + 0.5*P*cos(30 deg) + 0.25*P*cos(30 deg) + 0.125*P*cos(30 deg) + 0.0625*P*cos(30 deg)) / (b * t) + 6 * Msum / (t * b^2)',
      sy: '0 MPa',
      txy: 'P * sin(30 deg) / (b * t)',
    },
    { id: 'p1', kind: 'principal', name: 'Pr', of: 'S' },
    { id: 'c1', kind: 'criterion', name: 'DE', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
    {
      id: 'ps',
      kind: 'pointset',
      name: 'Toe',
      source: { rows: [[80, -40, 25], [120, -35, 42], [60, -10, 12], [95, -20, 30]] },
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

/** A JSON request on the seat's session, with its CSRF token. */
async function api(page: Page, method: 'GET' | 'POST', path: string, data?: unknown): Promise<unknown> {
  const csrf = ((await (await page.request.get(`${baseUrl()}/api/auth/csrf`)).json()) as { token: string }).token;
  const response = await page.request.fetch(`${baseUrl()}${path}`, { method, headers: { 'x-csrf-token': csrf }, data });
  expect(response.ok(), `${method} ${path}: ${response.status()} ${await response.text()}`).toBe(true);
  return response.json();
}

/** Every equation of the page whose typeset width runs past its box (cut off or spilling). */
function overflowingEquations(page: Page): Promise<string[]> {
  return page.evaluate(() =>
    [...document.querySelectorAll<HTMLElement>('article .equation')]
      .filter((box) => {
        const html = box.querySelector('.katex-html');
        if (!html) return false;
        const right = Math.max(...[...html.querySelectorAll(':scope > .katex-base')].map((piece) => piece.getBoundingClientRect().right));
        return right > box.getBoundingClientRect().right + 1 || box.scrollWidth > box.clientWidth + 1;
      })
      .map((box) => box.closest('[data-cell-id]')?.getAttribute('data-cell-id') ?? '?'),
  );
}

/** The PDF's pages as PNG beside it, when poppler-utils is installed (for people to look at). */
function pagesAsPng(pdf: string): void {
  if (!existsSync('/usr/bin/pdftoppm')) return;
  spawnSync('/usr/bin/pdftoppm', ['-r', '70', '-png', pdf, pdf.replace(/\.pdf$/, '-page')]);
}

/** Page count of a PDF written by Chromium (one `/Type /Page` object per page). */
function pageCount(bytes: Buffer): number {
  return bytes.toString('latin1').match(/\/Type\s*\/Page(?!s)/g)?.length ?? 0;
}

describe('the issued calculation', () => {
  it('approves a sheet, shows revision 1 as a document with equations and figures, and prints it', async () => {
    const engineer = await seat(ENGINEER);
    const checker = await seat(CHECKER);

    // The engineer files the sheet and submits it to the checker.
    const me = (await api(engineer, 'GET', '/api/auth/me')) as { memberships: { organization: { id: string } }[] };
    const orgId = me.memberships[0]!.organization.id;
    const projects = (await api(engineer, 'GET', `/api/orgs/${orgId}/projects`)) as { projects: { id: string; name: string }[] };
    const project = projects.projects.find((p) => /lug/i.test(p.name)) ?? projects.projects[0]!;
    const created = (await api(engineer, 'POST', `/api/projects/${project.id}/sheets`, { title: LONG_LUG.title, content: LONG_LUG })) as { sheet: { id: string } };
    const sheetId = created.sheet.id;
    const checkerId = ((await api(checker, 'GET', '/api/auth/me')) as { user: { id: string } }).user.id;
    await api(engineer, 'POST', `/api/sheets/${sheetId}/submit`, { checkerUserId: checkerId });

    // The checker notes the check, the engineer answers, the checker resolves it and approves.
    const note = (await api(checker, 'POST', `/api/sheets/${sheetId}/notes`, { cellId: 'c1', body: 'Required factor 1.5: name the clause that sets it.' })) as { thread: { id: string } };
    await api(engineer, 'POST', `/api/sheets/${sheetId}/notes`, { cellId: 'c1', parentId: note.thread.id, body: 'Clause 4.2 of the design basis.' });
    await api(checker, 'POST', `/api/sheets/${sheetId}/notes/${note.thread.id}/resolve`);
    await checker.goto(`${baseUrl()}/sheets/${sheetId}`);
    const header = checker.getByRole('region', { name: 'Check and approval' });
    await header.getByRole('button', { name: 'Approve…' }).click();
    await checker.getByRole('button', { name: 'Approve revision 1' }).click();
    await expect.poll(() => header.innerText()).toContain('Revision 1 is approved by Chandra Patel');

    // The revision's page: the calculation as issued.
    await header.getByRole('link', { name: 'Issued revision 1' }).click();
    const article = checker.getByRole('article', { name: 'Revision 1 as issued' });
    await article.waitFor({ timeout: 20_000 });
    const revision = (await api(checker, 'GET', `/api/sheets/${sheetId}/revisions/1`)) as { revision: { contentSha256: string } };
    expect(await article.locator('[data-content-hash]').innerText()).toBe(revision.revision.contentSha256);
    expect(await checker.getByRole('region', { name: 'Title block' }).innerText()).toMatch(/Prepared\s+Eamon Reyes[\s\S]*Checked\s+Chandra Patel[\s\S]*Approved\s+Chandra Patel/i);
    // Equations typeset, with the numbers in; figures drawn; no field to type in.
    for (const id of ['q5', 's1', 'p1', 'c1', 'ps']) expect(await article.locator(`#cell-${id} .equation .katex`).count(), id).toBeGreaterThan(0);
    for (const id of ['s1', 'p1', 'c1']) expect(await article.locator(`[data-figure-of="${id}"] svg`).count(), id).toBeGreaterThan(0);
    expect(await article.locator('.cm-editor, select, textarea').count()).toBe(0);
    expect(await article.locator('#cell-n1 .katex').count()).toBeGreaterThan(0);
    expect(await checker.getByRole('alert').count()).toBe(0); // the stored results reproduce
    const summary = checker.getByRole('region', { name: 'Summary of checks' });
    expect(await summary.innerText()).toMatch(/DE\s+von Mises \(distortion energy\)\s+[\d.]+\s+1\.5\s+Pass/);
    const notes = checker.getByRole('region', { name: 'Notes on cell 9, DE' });
    expect(await notes.innerText()).toMatch(/Required factor 1\.5[\s\S]*Clause 4\.2[\s\S]*Resolved by Chandra Patel/);
    // The longhand equations are wrapped or set smaller, never cut off.
    expect(await overflowingEquations(checker)).toEqual([]);
    await screenshot(checker, 'document-revision');

    // On paper (A4 width): the title block heads the page, no controls, the same equations fit.
    await checker.setViewportSize({ width: 700, height: 1000 });
    await checker.emulateMedia({ media: 'print' });
    expect(await checker.locator('thead [aria-label="Title block"]').isVisible()).toBe(true);
    expect(await checker.locator('main button:visible, main .btn:visible').count()).toBe(0);
    expect(await overflowingEquations(checker)).toEqual([]);
    await screenshot(checker, 'document-revision-print');
    const documentPdf = join(screenshotDir, 'document-revision.pdf');
    await checker.pdf({ path: documentPdf, format: 'A4', printBackground: true });
    const bytes = readFileSync(documentPdf);
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    expect(pageCount(bytes)).toBeGreaterThanOrEqual(3);
    pagesAsPng(documentPdf);
    await checker.emulateMedia({ media: 'screen' });
    await checker.setViewportSize({ width: 1440, height: 1000 });

    // The live sheet prints as a draft.
    await engineer.goto(`${baseUrl()}/sheets/${sheetId}`);
    await engineer.locator('[data-live="true"]').waitFor({ timeout: 20_000 });
    await engineer.emulateMedia({ media: 'print' });
    const mark = engineer.locator('thead [data-not-issued]');
    expect(await mark.isVisible()).toBe(true);
    expect(await mark.innerText()).toMatch(/NOT ISSUED — DRAFT[\s\S]*revision 1/i);
    expect(await engineer.getByRole('complementary', { name: 'Notes' }).isVisible()).toBe(false);
    expect(await engineer.locator('main button:visible').count()).toBe(0);
    await screenshot(engineer, 'document-live-sheet-print');
    const draftPdf = join(screenshotDir, 'document-live-sheet.pdf');
    await engineer.pdf({ path: draftPdf, format: 'A4', printBackground: true });
    expect(pageCount(readFileSync(draftPdf))).toBeGreaterThanOrEqual(2);
    pagesAsPng(draftPdf);
  }, 240_000);
});
