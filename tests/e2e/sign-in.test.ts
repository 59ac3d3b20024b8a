import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import path from 'node:path';
import { inflateSync } from 'node:zlib';
import { readFileSync } from 'node:fs';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, signIn, SCREENSHOT_DIR } from './browser';
import { DEMO_PEOPLE } from '../../server/seed/demo';

/** Counts distinct colours in an 8-bit RGB(A) PNG: a blank page has one or two. */
function distinctColours(png: Buffer): number {
  const width = png.readUInt32BE(16);
  const colourType = png[25];
  const channels = colourType === 6 ? 4 : 3;
  const chunks: Buffer[] = [];
  for (let offset = 8; offset < png.length;) {
    const length = png.readUInt32BE(offset);
    const type = png.toString('ascii', offset + 4, offset + 8);
    if (type === 'IDAT') chunks.push(png.subarray(offset + 8, offset + 8 + length));
    offset += 12 + length;
  }
  const raw = inflateSync(Buffer.concat(chunks));
  const stride = width * channels + 1;
  const colours = new Set<number>();
  // Sample rows; filter bytes make exact decoding unnecessary for a "not blank" check on unfiltered-or-sub rows.
  for (let row = 0; row * stride < raw.length && colours.size < 50; row += 7) {
    for (let x = 1; x < stride; x += channels * 13) colours.add(raw.readUIntBE(row * stride + x, 3));
  }
  return colours.size;
}

describe('signing in (Chromium)', () => {
  let context: BrowserContext;
  beforeAll(async () => {
    context = await openBrowser();
  });
  afterAll(async () => {
    await context?.close();
  });

  it('the head brewer signs in and lands on the home screen', async () => {
    const page = await context.newPage();
    await signIn(page, DEMO_PEOPLE[0]!.email);
    await expect
      .poll(() => page.getByRole('heading', { level: 1 }).textContent())
      .toMatch(/Good (morning|afternoon|evening), Maren/);
    await expect.poll(() => page.getByRole('navigation', { name: 'Main' }).textContent()).toContain('Team');
    const file = path.join(SCREENSHOT_DIR, 'home-head-brewer-1024.png');
    await page.screenshot({ path: file, fullPage: true });
    expect(distinctColours(readFileSync(file))).toBeGreaterThan(5);
  });

  it('the taproom manager has no Team menu item', async () => {
    const page = await context.newPage();
    await page.context().clearCookies();
    await signIn(page, DEMO_PEOPLE[2]!.email);
    await expect.poll(() => page.getByRole('navigation', { name: 'Main' }).textContent()).not.toContain('Team');
  });

  it('the team page asks before a role change or a block takes effect, and Cancel leaves the person as they were', async () => {
    const page = await context.newPage();
    await page.context().clearCookies();
    await signIn(page, DEMO_PEOPLE[0]!.email);
    await page.goto('/team');
    const assistant = DEMO_PEOPLE[1]!;
    const row = page.getByRole('row').filter({ hasText: assistant.email });
    await row.getByLabel(`Role of ${assistant.displayName}`).selectOption('taproom_manager');
    await row.getByRole('button', { name: 'Cancel' }).click();
    expect(await row.getByLabel(`Role of ${assistant.displayName}`).inputValue()).toBe('assistant_brewer');
    await row.getByRole('button', { name: 'Block access…' }).click();
    expect(await row.getByRole('button', { name: `Block ${assistant.displayName}` }).count()).toBe(1);
    await row.getByRole('button', { name: 'Cancel' }).click();
    expect(await row.getByRole('button', { name: 'Block access…' }).count()).toBe(1);
    const team = await page.evaluate(() =>
      fetch('/api/team', { headers: { 'x-kettlewright': '1' } }).then((r) => r.json()),
    );
    expect(team.members.find((m: { email: string }) => m.email === assistant.email)).toMatchObject({
      role: 'assistant_brewer',
      disabled: false,
    });
  });

  it('the taproom manager who types a brewing address is told it is not for their role, with no form to fill', async () => {
    const page = await context.newPage();
    await page.context().clearCookies();
    await signIn(page, DEMO_PEOPLE[2]!.email);
    for (const address of ['/team', '/reports/production', '/batches/new']) {
      await page.goto(address);
      await expect.poll(() => page.getByText('Not open to your role').count()).toBe(1);
      expect(await page.locator('main form, main input, main select').count()).toBe(0);
    }
    expect(await page.getByText('This page is for the head brewer.').count()).toBe(1);
    await page.getByRole('link', { name: 'Go to the home screen' }).click();
    await expect.poll(() => page.getByText('Not open to your role').count()).toBe(0);
  });
});
