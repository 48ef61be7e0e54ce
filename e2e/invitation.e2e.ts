// The invitation round trip from the users' seats: an owner invites by e-mail on the members
// page, the mail reaches the local fake SMTP, a new person follows the link, creates an account,
// joins, and lands in the organization with the invited role.
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { baseUrl, launchBrowser, screenshot, signIn } from './support/browser';

interface DevMail {
  to: string;
  subject: string;
  text: string;
}

let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
});

async function mailTo(address: string): Promise<DevMail | undefined> {
  const res = await fetch(`${baseUrl()}/api/dev/mail`);
  const body = (await res.json()) as { messages: DevMail[] };
  return body.messages.find((m) => m.to.includes(address));
}

describe('an invitation by e-mail', () => {
  it('takes a new person from the mailed link to the organization with the invited role', async () => {
    const invitee = `new.checker.${Date.now()}@example.test`;

    const ownerContext = await browser.newContext();
    const owner = await ownerContext.newPage();
    await signIn(owner, 'owner@demo.sheaf.test');
    await owner.goto(`${baseUrl()}/members`);
    const form = owner.getByRole('form', { name: 'Invite someone' });
    await form.getByLabel('E-mail').fill(invitee);
    await form.getByLabel('Role').selectOption('checker');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await expect.poll(() => owner.getByText(invitee).count()).toBeGreaterThan(0);
    await screenshot(owner, 'invitation-sent');

    await expect.poll(async () => (await mailTo(invitee)) !== undefined).toBe(true);
    const mail = (await mailTo(invitee)) as DevMail;
    const link = /https?:\/\/\S+\/invite\/[A-Za-z0-9_-]+/.exec(mail.text)?.[0];
    expect(link, `an /invite/ link in the mail text: ${mail.text}`).toBeTruthy();
    const path = new URL(link as string).pathname;

    const newContext = await browser.newContext();
    const page = await newContext.newPage();
    await page.goto(`${baseUrl()}${path}`);
    await page.getByRole('link', { name: 'Create an account' }).click();
    const signUp = page.getByRole('form', { name: 'Create an account' });
    await signUp.getByLabel('Name').fill('Nadia Okafor');
    await expect(await signUp.getByLabel('E-mail').inputValue()).toBe(invitee);
    await signUp.getByLabel('Password').fill('a-long-new-password-42');
    await signUp.getByRole('button', { name: 'Create account' }).click();
    await page.waitForURL((url) => url.pathname === path);
    await page.getByRole('button', { name: /^Join / }).click();
    await page.waitForURL((url) => url.pathname.startsWith('/sheets'));
    await screenshot(page, 'invitation-joined');

    const me = await page.evaluate(async () => {
      const res = await fetch('/api/auth/me');
      return (await res.json()) as { memberships: { organization: { name: string }; role: string }[] };
    });
    expect(me.memberships).toContainEqual(
      expect.objectContaining({ role: 'checker', organization: expect.objectContaining({ name: 'Northgate Lifting Ltd.' }) }),
    );
    await ownerContext.close();
    await newContext.close();
  });
});
