// Entries the server refuses for good leave the tablet's queue: two brew-day steps typed offline while the head
// brewer signs the day off elsewhere are set aside with the reason, a later reading on another batch still goes,
// one set-aside step is sent again as a note on the batch and the other is discarded after a confirmation.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openBrowser, screenshot, signedPost, signIn } from './browser';
import { DEMO_PASSWORD, DEMO_PEOPLE } from '../../server/seed/demo';

const eventually = <T>(fn: () => T | Promise<T>) => expect.poll(fn, { timeout: 30_000 });
const [maren, ilya] = DEMO_PEOPLE as [(typeof DEMO_PEOPLE)[0], (typeof DEMO_PEOPLE)[0]];

const post = (page: Page, url: string, data: unknown) => signedPost(page, url, data);

async function logOf(page: Page, batchId: number) {
  return (await (await page.request.get(`/api/batches/${batchId}/log`)).json()) as {
    kind: string;
    data: { text?: string };
  }[];
}

/** Marks the current step done with nothing typed, and waits for the screen to move on. */
async function doneWithCurrentStep(page: Page): Promise<string> {
  const step = (await page.getByTestId('current-step').textContent())!;
  // A tap within a second of the last step logged is taken as the same press (see useTapGuard).
  await page.waitForTimeout(1100);
  await page.getByRole('button', { name: 'Done', exact: true }).click();
  await eventually(() => page.getByTestId('current-step').textContent()).not.toBe(step);
  return step;
}

describe('entries refused for good are set aside (Chromium, 1024×768)', () => {
  let head: BrowserContext;
  let tablet: BrowserContext;
  let office: Page;
  let page: Page;
  let brewDay: number;
  let other: number;

  beforeAll(async () => {
    head = await openBrowser();
    tablet = await openBrowser();
    office = await head.newPage();
    await signIn(office, maren.email);
    const [recipe] = (await (await office.request.get('/api/recipes')).json()) as { latestVersionId: number }[];
    const plan = { recipeVersionId: recipe!.latestVersionId, brewDate: new Date().toISOString().slice(0, 10) };
    brewDay = (await post(office, '/api/batches', plan)).id!;
    other = (await post(office, '/api/batches', plan)).id!;
    page = await tablet.newPage();
    await signIn(page, ilya.email);
    // The first step of each batch, sent online: the brew day has something to sign, and the other batch is brewing.
    for (const id of [brewDay, other])
      await post(page, `/api/batches/${id}/log`, { kind: 'step', stepKey: 'strike-water', label: 'Heat strike water' });
  });
  afterAll(async () => {
    await tablet?.setOffline(false);
    await head?.close();
    await tablet?.close();
  });

  it('sets aside the steps the sign-off refused, with the reason, while a later reading on another batch goes', async () => {
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => undefined));
    // Opened online once, so both screens open again with the network gone.
    await page.goto(`/cellar/batches/${other}`);
    await eventually(() => page.getByRole('form', { name: 'Log a reading' }).count()).toBe(1);
    await page.goto(`/batches/${brewDay}`);
    await eventually(() => page.evaluate(() => Boolean(navigator.serviceWorker.controller))).toBe(true);
    await eventually(() => page.getByTestId('current-step').count()).toBe(1);

    await tablet.setOffline(true);
    const first = await doneWithCurrentStep(page);
    const second = await doneWithCurrentStep(page);
    await eventually(() => page.getByTestId('waiting-count').textContent()).toBe('2 waiting to send');

    await page.goto(`/cellar/batches/${other}`);
    const form = page.getByRole('form', { name: 'Log a reading' });
    await eventually(() => form.count()).toBe(1);
    await form.getByRole('button', { name: /^Hydrometer/ }).click();
    await form.getByLabel('Gravity (SG)').fill('1.052');
    await form.getByLabel('Temperature (°F)').fill('66');
    await form.getByRole('button', { name: 'Save reading' }).click();
    await eventually(() => page.getByTestId('waiting-count').textContent()).toBe('1 waiting to send');

    // Meanwhile, in the office, the head brewer signs the brew day off.
    await post(office, `/api/batches/${brewDay}/sign-off`, { password: DEMO_PASSWORD });

    await tablet.setOffline(false);
    await eventually(async () => (await logOf(page, other)).filter((e) => e.kind === 'reading').length).toBe(1);
    await eventually(() => page.getByTestId('waiting-count').count()).toBe(0);

    await page.goto(`/batches/${brewDay}`);
    await eventually(() => page.getByTestId('set-aside-count').textContent()).toBe(
      '2 set aside: the server refused them',
    );
    const items = page.getByTestId('set-aside-item');
    expect(await items.nth(0).textContent()).toContain(`Not saved: ${first}`);
    expect(await items.nth(1).textContent()).toContain(`Not saved: ${second}`);
    for (const i of [0, 1]) expect(await items.nth(i).textContent()).toContain('The brew day is signed off');
    expect(await page.getByTestId('waiting-item').count()).toBe(0);
    expect((await logOf(page, brewDay)).filter((e) => e.kind === 'step')).toHaveLength(1);

    // They survive a reload.
    await page.reload();
    await eventually(() => page.getByTestId('set-aside-item').count()).toBe(2);
    await page.getByTestId('set-aside-item').first().scrollIntoViewIfNeeded();
    await screenshot(page, 'set-aside-1024.png', { fullPage: false });
  });

  it('sends one again as a note on the batch, with the reason, and discards the other after a confirmation', async () => {
    const items = page.getByTestId('set-aside-item');
    const note = items.nth(0).getByLabel('Note for the batch record');
    expect(await note.inputValue()).toMatch(/not saved: .+\. The brew day is signed off/);
    await items.nth(0).getByRole('button', { name: 'Send as a note' }).click();
    await eventually(() => items.count()).toBe(1);
    await eventually(async () => (await logOf(page, brewDay)).filter((e) => e.kind === 'note').length).toBe(1);
    const [sent] = (await logOf(page, brewDay)).filter((e) => e.kind === 'note');
    expect(sent!.data.text).toMatch(/The brew day is signed off/);

    await items.nth(0).getByRole('button', { name: 'Discard…' }).click();
    await items.nth(0).getByRole('button', { name: 'Discard for good' }).click();
    await eventually(() => page.getByTestId('set-aside-item').count()).toBe(0);
    expect((await logOf(page, brewDay)).filter((e) => e.kind === 'step')).toHaveLength(1);
  });
});
