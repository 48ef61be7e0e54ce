// The check-and-approval workflow from three seats: the demo engineer prepares a lifting-lug
// sheet and submits it; the demo checker writes a note and returns it; the engineer fixes the
// lever arm, answers and submits again; the checker resolves the note and approves revision 1.
// An edit starts revision 2, which the owner takes over as checker (the seed has one checker,
// and the owner did not prepare it) and approves; revision 1 is then superseded, and the diff
// of the two lists the change. Screenshots of the notes rail, the check actions and the diff.
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, screenshot, signIn } from './support/browser';

const ENGINEER = 'engineer@demo.sheaf.test';
const CHECKER = 'checker@demo.sheaf.test';
const OWNER = 'owner@demo.sheaf.test';

/** The demo firm's gantry-beam lug at the weld toe (our own numbers): Sy 250 MPa, factor 1.5 required. */
const LUG = {
  format: 'sheaf-sheet',
  version: 1,
  title: 'Review walk-through lug',
  unitSystem: 'SI',
  cells: [
    { id: 'q1', kind: 'quantity', name: 'P', expr: '18 kN' },
    { id: 'q2', kind: 'quantity', name: 'e', expr: '35 mm' },
    { id: 'q3', kind: 'quantity', name: 't', expr: '12 mm' },
    { id: 's1', kind: 'stress', name: 'S', sx: 'P * cos(30 deg) / (40 mm * t) + P * sin(30 deg) * e / (t * (40 mm)^2 / 6)', sy: '0 MPa', txy: 'P * sin(30 deg) / (40 mm * t)' },
    { id: 'c1', kind: 'criterion', name: 'DE', of: 'S', theory: 'von-mises', strength: { Sy: '250 MPa' }, required: '1.5' },
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

/** Opens the sheet and waits for its check status and its live copy. */
async function open(page: Page, sheetId: string): Promise<void> {
  await page.goto(`${baseUrl()}/sheets/${sheetId}`);
  await page.getByRole('region', { name: 'Check and approval' }).waitFor({ timeout: 20_000 });
  await page.locator('[data-live="true"]').waitFor({ timeout: 20_000 });
}

/** Replaces the expression of a quantity cell through its editor, as a person types it. */
async function setExpression(page: Page, cellId: string, text: string): Promise<void> {
  const editor = page.locator(`[data-cell-id="${cellId}"] .cm-content[contenteditable="true"]`).last();
  await editor.click();
  await page.keyboard.press('Control+A');
  await page.keyboard.type(text);
}

const header = (page: Page) => page.getByRole('region', { name: 'Check and approval' });
const titleBlock = (page: Page) => page.getByRole('region', { name: 'Title block' });

/** The sheet's status as the server has it (what every seat will see). */
async function statusOf(page: Page, sheetId: string): Promise<string> {
  const response = await page.request.get(`${baseUrl()}/api/sheets/${sheetId}/review`);
  return ((await response.json()) as { review: { status: string } }).review.status;
}

describe('check and approval', () => {
  it('returns, fixes, resubmits, approves, starts revision 2, approves it and supersedes revision 1', async () => {
    const engineer = await seat(ENGINEER);
    const checker = await seat(CHECKER);
    const owner = await seat(OWNER);

    // The engineer files a new sheet in the lifting-lug project.
    const me = (await (await engineer.request.get(`${baseUrl()}/api/auth/me`)).json()) as { memberships: { organization: { id: string } }[] };
    const orgId = me.memberships[0]!.organization.id;
    const projects = (await (await engineer.request.get(`${baseUrl()}/api/orgs/${orgId}/projects`)).json()) as { projects: { id: string; name: string }[] };
    const project = projects.projects.find((p) => /lug/i.test(p.name)) ?? projects.projects[0]!;
    const csrf = ((await (await engineer.request.get(`${baseUrl()}/api/auth/csrf`)).json()) as { token: string }).token;
    const created = await engineer.request.post(`${baseUrl()}/api/projects/${project.id}/sheets`, {
      headers: { 'x-csrf-token': csrf },
      data: { title: LUG.title, content: LUG },
    });
    expect(created.status()).toBe(201);
    const sheetId = ((await created.json()) as { sheet: { id: string } }).sheet.id;

    // 1. Submit for check, naming the checker.
    await open(engineer, sheetId);
    await expect.poll(() => header(engineer).innerText()).toContain('Revision 1 is in preparation');
    await header(engineer).getByRole('button', { name: 'Submit for check…' }).click();
    const submitForm = engineer.getByRole('form', { name: 'Submit revision 1 for check' });
    await submitForm.getByLabel('Checker', { exact: true }).selectOption({ label: 'Chandra Patel (checker)' });
    await submitForm.getByLabel('Message to the checker (optional)').fill('Lug at the weld toe, LC2.');
    await screenshot(engineer, 'review-submit-for-check');
    await submitForm.getByRole('button', { name: 'Submit for check' }).click();
    await expect.poll(() => header(engineer).innerText()).toContain('is with Chandra Patel for check');
    expect(await statusOf(engineer, sheetId)).toBe('in-check');

    // 2. The checker writes a note on S and returns the sheet.
    await open(checker, sheetId);
    await checker.getByLabel('Write a note on').selectOption({ value: 's1' });
    await checker.getByRole('button', { name: 'Write', exact: true }).click();
    const sNotes = checker.getByRole('region', { name: /^Notes on .*S/ });
    await sNotes.getByRole('textbox').fill('Lever arm: the drawing gives 50 mm from the weld toe. @Eamon please check.');
    await sNotes.getByRole('button', { name: 'Add note' }).click();
    await expect.poll(() => sNotes.getByRole('article').count()).toBe(1);
    await expect.poll(() => header(checker).innerText()).toContain('1 open note');
    // The cell carries the open-note badge, which leads to its notes in the rail.
    const badge = checker.locator('[data-cell-id="s1"] a[href="#notes-s1"]');
    await expect.poll(() => badge.count()).toBe(1);
    expect(await badge.getAttribute('title')).toMatch(/^1 open note on /);
    await screenshot(checker, 'review-notes-rail');
    await header(checker).getByRole('button', { name: 'Return to preparer…' }).click();
    await checker.getByLabel('What should be fixed').fill('Use the lever arm from the drawing and answer the note on S.');
    await checker.getByRole('button', { name: 'Return to preparer', exact: true }).click();
    await expect.poll(() => header(checker).innerText()).toContain('Revision 1 is in preparation');
    expect(await statusOf(checker, sheetId)).toBe('draft');

    // 3. The engineer sees why, fixes the lever arm (and thickens the plate), answers and resubmits.
    await open(engineer, sheetId);
    await expect.poll(() => header(engineer).innerText()).toContain('Returned by Chandra Patel');
    await setExpression(engineer, 'q2', '50 mm');
    await setExpression(engineer, 'q3', '16 mm');
    const answer = engineer.getByRole('region', { name: /^Notes on .*S/ });
    await answer.getByRole('button', { name: 'Reply' }).click();
    await answer.getByRole('textbox').fill('50 mm from the toe; plate now 16 mm thick.');
    await answer.getByRole('button', { name: 'Reply' }).click();
    await expect.poll(() => answer.innerText()).toContain('plate now 16 mm thick');
    await header(engineer).getByRole('button', { name: 'Submit for check…' }).click();
    await engineer.getByRole('button', { name: 'Submit for check', exact: true }).click();
    await expect.poll(() => header(engineer).innerText()).toContain('is with Chandra Patel for check');

    // 4. The checker resolves the note and approves revision 1.
    await open(checker, sheetId);
    await checker.getByRole('region', { name: /^Notes on .*S/ }).getByRole('button', { name: 'Resolve' }).click();
    await expect.poll(() => header(checker).innerText()).not.toContain('open note');
    await expect.poll(() => checker.locator('[data-cell-id="s1"] a[href="#notes-s1"]').count()).toBe(0);
    await header(checker).getByRole('button', { name: 'Approve…' }).click();
    await screenshot(checker, 'review-check-actions');
    await checker.getByRole('button', { name: 'Approve revision 1' }).click();
    await expect.poll(() => header(checker).innerText()).toContain('Revision 1 is approved by Chandra Patel');
    await expect.poll(() => titleBlock(checker).innerText()).toMatch(/Prepared\s+Eamon Reyes/i);
    await expect.poll(() => titleBlock(checker).innerText()).toMatch(/Approved\s+Chandra Patel/i);

    // 5. An edit of the approved sheet starts revision 2; the engineer submits it.
    await open(engineer, sheetId);
    await setExpression(engineer, 'q1', '21 kN');
    await expect.poll(() => statusOf(engineer, sheetId), { timeout: 20_000 }).toBe('draft');
    await engineer.reload();
    await expect.poll(() => header(engineer).innerText()).toContain('Revision 2 is in preparation; revision 1 is issued.');
    await header(engineer).getByRole('button', { name: 'Submit for check…' }).click();
    await engineer.getByRole('form', { name: 'Submit revision 2 for check' }).getByLabel('Checker', { exact: true }).selectOption({ label: 'Chandra Patel (checker)' });
    await engineer.getByRole('button', { name: 'Submit for check', exact: true }).click();
    await expect.poll(() => header(engineer).innerText()).toContain('Revision 2 is with Chandra Patel');

    // 6. The owner takes the check over (they did not prepare it) and approves revision 2.
    await open(owner, sheetId);
    await header(owner).getByRole('button', { name: 'Reassign checker…' }).click();
    await owner.getByRole('form', { name: 'Reassign the checker' }).getByLabel('Checker', { exact: true }).selectOption({ label: 'Olivia Marsh (owner)' });
    await owner.getByRole('button', { name: 'Reassign', exact: true }).click();
    await expect.poll(() => header(owner).innerText()).toContain('is with Olivia Marsh for check');
    await header(owner).getByRole('button', { name: 'Approve…' }).click();
    await owner.getByRole('button', { name: 'Approve revision 2' }).click();
    await expect.poll(() => header(owner).innerText()).toContain('Revision 2 is approved by Olivia Marsh');

    // 7. Revision 1 is superseded; the diff lists the change of load and the results that moved.
    await engineer.goto(`${baseUrl()}/sheets/${sheetId}/revisions`);
    const rows = engineer.getByRole('table').first().getByRole('row');
    await expect.poll(() => rows.count()).toBe(3);
    expect(await rows.nth(1).innerText()).toMatch(/^2\s+Approved/);
    expect(await rows.nth(2).innerText()).toMatch(/^1\s+Superseded/);
    const inputs = engineer.getByRole('region', { name: 'Cells and inputs' });
    await expect.poll(() => inputs.innerText()).toMatch(/P\s*id q1\s+~?\s*Changed\s+expr\s+18 kN\s+21 kN/);
    const results = engineer.getByRole('region', { name: 'Results that moved' });
    expect(await results.innerText()).toMatch(/DE\s+factor\s*factor of safety\s+1\.8926\s+1\.622\d/);
    await screenshot(engineer, 'review-diff');

    // The first revision is still there, read-only, with the note it was checked with.
    await engineer.goto(`${baseUrl()}/sheets/${sheetId}/revisions/1`);
    await expect.poll(() => engineer.getByRole('note', { name: 'Issue' }).innerText()).toMatch(/^Revision 1, issued .*; superseded on .* by revision 2/);
    const notes = engineer.getByRole('region', { name: 'Notes on cell 4, S' });
    await expect.poll(() => notes.innerText()).toContain('Lever arm: the drawing gives 50 mm');
    expect(await engineer.locator('[data-cell-id="q2"]').innerText()).toContain('50 mm');
    await screenshot(engineer, 'review-past-revision');
    // Three people, two revisions: far longer than one page's test.
  }, 300_000);
});
