import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, screenshot, signIn } from './browser';
import { readCaughtMail } from '../../server/dev/mail-catcher';
import { DEMO_PEOPLE } from '../../server/seed/demo';

/** Where the e2e server's mail catcher keeps what it received (tests/e2e/server.ts). */
const MAIL_DIR = `${process.env.KW_TEST_DATA_DIR}/mail`;
const write = { 'x-kettlewright': '1' };

/** The link in the newest mail to `to` whose path starts with `prefix`, once it has arrived. */
async function linkInMail(to: string, prefix: '/join/' | '/reset/'): Promise<string> {
  const find = () =>
    readCaughtMail(MAIL_DIR)
      .filter((m) => m.to.includes(to))
      .map((m) => m.text.match(new RegExp(`https?://\\S+${prefix}[A-Za-z0-9_-]+`))?.[0])
      .find(Boolean);
  await expect.poll(find, { timeout: 15_000 }).toBeTruthy();
  return find()!;
}

describe('resetting a password from the e-mailed link (Chromium, 1024×768)', () => {
  let head: BrowserContext;
  let person: BrowserContext;
  beforeAll(async () => {
    head = await openBrowser();
    person = await openBrowser();
  });
  afterAll(async () => {
    await head?.close();
    await person?.close();
  });

  it('forgot password → the mail → the link → a new password → signing in with it', async () => {
    // A teammate of their own, so the demo people keep their passwords for the other tests.
    const email = `reset-${Date.now()}@tidewrack.example`;
    const headPage = await head.newPage();
    await signIn(headPage, DEMO_PEOPLE[0]!.email);
    const invited = await headPage.request.post('/api/team/invites', {
      headers: write,
      data: { email, role: 'assistant_brewer' },
    });
    expect(invited.status()).toBe(201);
    const join = new URL(await linkInMail(email, '/join/'));
    const joined = await person.request.post(`/api/auth/invites/${join.pathname.split('/').pop()}`, {
      headers: write,
      data: { displayName: 'Rowan Vale', password: 'Brine-sluice copper 8 tides' },
    });
    expect(joined.status()).toBe(201);
    await person.clearCookies();

    const page = await person.newPage();
    await page.goto('/sign-in');
    await page.getByRole('link', { name: 'Forgot your password?' }).tap();
    await page.getByLabel('E-mail').fill(email);
    await page.getByRole('button', { name: 'Send a reset link' }).tap();
    await expect.poll(() => page.getByRole('status').textContent()).toMatch(/reset link is on its way/);

    const link = await linkInMail(email, '/reset/');
    const token = link.split('/reset/')[1]!;
    await page.goto(link);
    const field = page.getByLabel('New password');
    await field.waitFor();
    const shown = await page.locator('body').textContent();
    expect(shown).not.toContain('could not be loaded');
    expect(shown).not.toContain(token);
    await screenshot(page, 'password-reset-1024.png', { fullPage: false });
    await field.fill('Kettle steam over 9 barrels');
    await page.getByRole('button', { name: 'Save the new password' }).tap();
    await expect.poll(() => page.getByRole('status').textContent()).toMatch(/Your password is changed/);

    await signIn(page, email, 'Kettle steam over 9 barrels');
    expect(new URL(page.url()).pathname).toBe('/');

    // The link works once: opened again it says so, still without its secret on the page.
    await page.context().clearCookies();
    await page.goto(link);
    await expect
      .poll(() => page.getByRole('alert').textContent())
      .toBe('This reset link has been used or has expired. Ask for a new one from the sign-in page.');
    expect(await page.locator('body').textContent()).not.toContain(token);
  });
});
