// The head brewer releases a packaged batch with a description and a photo; the taproom manager finds it
// on their home screen and opens its briefing sheet. Screenshots of the taproom at tablet and desktop sizes.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import type { BrowserContext, Locator, Page } from 'playwright-core';
import { openBrowser, screenshot, signIn } from './browser';
import { DEMO_PEOPLE } from '../../server/seed/demo';
import { abv } from '../../shared/brewing';

const maren = DEMO_PEOPLE.find((p) => p.role === 'head_brewer')!;
const priya = DEMO_PEOPLE.find((p) => p.role === 'taproom_manager')!;
const DESCRIPTION =
  'Roasted quince and golden beet over a soft wheat base: orchard fruit on the nose, a dry, gently earthy finish.';

let brewer: BrowserContext;
let taproom: BrowserContext;
let beerName: string;

beforeAll(async () => {
  brewer = await openBrowser();
  taproom = await openBrowser();
});
afterAll(async () => {
  await brewer?.close();
  await taproom?.close();
});

describe('releasing a beer to the taproom (Chromium, 1024×768)', () => {
  it('the head brewer releases a packaged batch with a description and a photo', async () => {
    const page = await brewer.newPage();
    await signIn(page, maren.email);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Taproom' }).click();
    await page.getByRole('link', { name: 'Tasting and release' }).click();
    // The demo brewery has one packaged batch whose release is not started.
    const row = page.getByRole('row').filter({ hasText: 'Packaged' }).filter({ hasText: 'Not started' });
    await expect.poll(() => row.count()).toBe(1);
    beerName = (await row.getByRole('cell').nth(1).textContent())!.trim();
    await row.getByRole('link', { name: /^Release / }).click();
    await page.getByRole('heading', { level: 1, name: `Release ${beerName}` }).waitFor();

    const photo = await sharp({ create: { width: 1200, height: 900, channels: 3, background: '#c47f2c' } })
      .composite([
        {
          input: Buffer.from(
            '<svg width="1200" height="900"><rect x="420" y="150" width="360" height="620" rx="40" fill="#f3e3b5"/></svg>',
          ),
        },
      ])
      .jpeg()
      .toBuffer();
    await page
      .getByLabel('Add a photo or lab sheet')
      .setInputFiles({ name: 'low-tide-pour.jpg', mimeType: 'image/jpeg', buffer: photo });
    await page.getByRole('radio', { name: 'low-tide-pour.jpg' }).check();

    await page.getByLabel('Taproom description').fill(DESCRIPTION);
    await page.getByLabel('Serving notes').fill('Tulip glass, leave room for the aroma.');
    await page.getByRole('button', { name: 'Save release sheet' }).click();
    await page.getByText('Draft (not shown to the taproom)').waitFor();

    // The ABV on screen is the one shared/brewing computes from the logged OG and FG shown beside it.
    const stat = async (label: string) =>
      (await page.getByText(label, { exact: true }).locator('..').textContent())!.slice(label.length);
    const og = Number(await stat('OG (measured)'));
    const fg = Number(await stat('FG (last reading)'));
    expect(og).toBeGreaterThan(fg);
    expect(await stat('ABV')).toBe(`${abv(og, fg).toFixed(1)}%`);

    await page.getByRole('button', { name: 'Release to the taproom' }).click();
    const dialog = page.getByRole('dialog', { name: 'Confirm the final numbers' });
    await expect.poll(() => dialog.textContent()).toContain(`ABV ${abv(og, fg).toFixed(1)} %`);
    await dialog.getByRole('button', { name: 'Confirm and release' }).click();
    await page.getByText(`On tap, released by ${maren.displayName}`).waitFor();
    await screenshot(page, 'taproom-release-page-1024.png');
  });

  it('the taproom manager finds it on their home screen and opens its briefing sheet', async () => {
    const page = await taproom.newPage();
    const scripts: string[] = [];
    page.on('request', (r) => {
      if (r.resourceType() === 'script') scripts.push(new URL(r.url()).pathname);
    });
    await signIn(page, priya.email);
    await page.getByRole('heading', { level: 1, name: 'Taproom' }).waitFor();
    const onTap = page.getByRole('region', { name: 'On tap' });
    const card = onTap.getByLabel(beerName, { exact: true });
    await card.getByRole('heading', { name: beerName }).waitFor();
    await expect.poll(() => card.textContent()).toContain(DESCRIPTION);
    // The photo the head brewer chose, served to the taproom as a thumbnail.
    const img = card.getByRole('img', { name: `${beerName} in the glass` });
    await expect.poll(() => img.evaluate((el: HTMLImageElement) => el.complete && el.naturalWidth)).toBe(480);
    await screenshot(page, 'taproom-home-1024.png');

    await page.getByLabel('Search beers').fill(beerName.split(' ').at(-1)!);
    await expect.poll(() => onTap.getByRole('heading', { level: 3 }).allTextContents()).toEqual([beerName]);
    await card.getByRole('link', { name: 'Staff briefing sheet' }).click();
    const sheet = page.getByRole('article', { name: `Briefing: ${beerName}` });
    await sheet.getByRole('heading', { level: 2, name: beerName }).waitFor();
    await expect.poll(() => sheet.textContent()).toContain(DESCRIPTION);
    await expect.poll(() => sheet.textContent()).toContain('Tulip glass, leave room for the aroma.');
    await expect.poll(() => sheet.textContent()).toMatch(/On tap since/);
    await expect
      .poll(() =>
        sheet
          .getByRole('img', { name: `${beerName} in the glass` })
          .evaluate((el: HTMLImageElement) => el.complete && el.naturalWidth > 0),
      )
      .toBe(true);
    await screenshot(page, 'taproom-briefing-1024.png');
    // As printed: the app's menu and the page's buttons stay off the paper.
    await page.emulateMedia({ media: 'print' });
    await expect.poll(() => page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
    await screenshot(page, 'taproom-briefing-print.png');
    await page.emulateMedia({ media: 'screen' });

    // The taproom screens are their own chunks: the recipe editor is never downloaded.
    expect(scripts.some((s) => /taproom-home-/.test(s))).toBe(true);
    expect(scripts.filter((s) => /editor-page-|recipe-editor/.test(s))).toEqual([]);
  });

  it('the bar screen and the taproom home read well at desktop size', async () => {
    const desktop = await openBrowser({ width: 1440, height: 900 });
    try {
      const page = await desktop.newPage();
      await signIn(page, priya.email);
      await page
        .getByRole('region', { name: 'On tap' })
        .getByRole('heading', { name: beerName, exact: true })
        .waitFor();
      await screenshot(page, 'taproom-home-desktop.png');
      await page.getByRole('link', { name: 'Bar screen' }).click();
      await page.getByRole('heading', { level: 1, name: /^On tap at / }).waitFor();
      await page.getByText(beerName, { exact: true }).waitFor();
      await screenshot(page, 'taproom-bar-screen-desktop.png');
    } finally {
      await desktop.close();
    }
  });
});

/** Whether an element's content runs past its own box (a cut-off name, a number spilling out of its frame). */
const overflows = (l: Locator) => l.evaluate((el) => el.scrollWidth > el.clientWidth + 1);
/** How many lines of text an element takes. */
const lines = (l: Locator) =>
  l.evaluate((el) => Math.round(el.getBoundingClientRect().height / parseFloat(getComputedStyle(el).lineHeight)));

async function openBoard(page: Page) {
  await page.getByRole('link', { name: 'Bar screen' }).click();
  await page.getByRole('heading', { level: 1, name: /^On tap at / }).waitFor();
  await page
    .getByRole('region', { name: /^On tap at / })
    .getByRole('listitem')
    .first()
    .waitFor();
}

describe('the bar screen and the briefing sheet on a phone (Chromium, 390×844)', () => {
  it('the bar screen keeps every name whole, the ABV clear of it and the swatches one width', async () => {
    const phone = await openBrowser({ width: 390, height: 844 });
    try {
      const page = await phone.newPage();
      await signIn(page, priya.email);
      await openBoard(page);
      const board = page.getByRole('region', { name: /^On tap at / });
      expect(await overflows(board)).toBe(false);
      const rows = await board.getByRole('listitem').all();
      expect(rows.length).toBeGreaterThan(1);
      const swatchWidths = new Set<number>();
      const nameLefts = new Set<number>();
      for (const row of rows) {
        const [name, detail] = await row.locator('p').all();
        const abv = row.getByText(/ %$/);
        expect(await overflows(name!)).toBe(false);
        expect(await lines(detail!), (await detail!.textContent()) ?? '').toBeLessThanOrEqual(2);
        const n = (await name!.boundingBox())!;
        const a = (await abv.boundingBox())!;
        expect(a.y >= n.y + n.height || a.x >= n.x + n.width, 'the ABV overlaps the name').toBe(true);
        expect(await lines(abv)).toBe(1);
        swatchWidths.add(Math.round((await row.locator('span').first().boundingBox())!.width));
        nameLefts.add(Math.round(n.x));
      }
      expect(swatchWidths.size).toBe(1);
      expect(nameLefts.size).toBe(1);
      await screenshot(page, 'taproom-bar-screen-390.png');
    } finally {
      await phone.close();
    }
  });

  it('the briefing sheet keeps each number on one line inside its box', async () => {
    const phone = await openBrowser({ width: 390, height: 844 });
    try {
      const page = await phone.newPage();
      await signIn(page, priya.email);
      await page.getByRole('region', { name: 'On tap' }).getByRole('heading', { level: 3 }).first().waitFor();
      // The batch number stays on one line on the tap card ("Batch 2026-" / "003" before).
      const batch = page
        .getByRole('region', { name: 'On tap' })
        .getByText(/^Batch \d/)
        .first();
      expect(await lines(batch)).toBe(1);
      await screenshot(page, 'taproom-home-390.png');
      await page.getByRole('link', { name: 'Staff briefing sheet' }).first().click();
      const sheet = page.getByRole('article', { name: /^Briefing: / });
      await sheet.getByRole('heading', { level: 2 }).first().waitFor();
      for (const label of ['ABV', 'Bitterness', 'Colour']) {
        const fact = sheet.getByText(label, { exact: true }).locator('..');
        expect(await overflows(fact), label).toBe(false);
        expect(await lines(fact.locator(':scope > div').nth(1)), label).toBe(1);
      }
      await screenshot(page, 'taproom-briefing-390.png');
    } finally {
      await phone.close();
    }
  });
});

describe('the bar screen as a full-screen view (Chromium, 1024×768)', () => {
  it('keeps Tab inside it, shows where focus is, and Escape goes back to the taproom', async () => {
    const page = await taproom.newPage();
    await signIn(page, priya.email);
    await page.goto('/taproom?q=a');
    await page.getByRole('heading', { level: 1, name: 'Taproom' }).waitFor();
    await openBoard(page);
    const board = page.getByRole('region', { name: /^On tap at / });
    // The app behind it (the menu, Sign out among it) is inert: out of reach of Tab, clicks and screen readers.
    expect(await page.locator('#root').evaluate((el) => el.hasAttribute('inert'))).toBe(true);
    // Tab goes round the board's own controls (and out to the browser's), never into the app behind it.
    for (let i = 0; i < 6; i++) {
      await page.keyboard.press('Tab');
      expect(await page.locator('#root').evaluate((el) => el.contains(document.activeElement))).toBe(false);
    }
    const close = board.getByRole('button', { name: 'Close' });
    await page.keyboard.press('Shift+Tab');
    expect(
      await close.evaluate(
        (el) =>
          el === document.activeElement && el.matches(':focus-visible') && getComputedStyle(el).outlineStyle !== 'none',
      ),
    ).toBe(true);
    await screenshot(page, 'taproom-bar-screen-focus-1024.png', { fullPage: false });
    await page.keyboard.press('Escape');
    await page.waitForURL((url) => url.pathname === '/taproom' && url.search === '?q=a');
    await page.getByRole('button', { name: 'Sign out' }).waitFor();

    // Opened on its own (a TV's bookmark), Escape leaves to the taproom.
    await page.goto('/taproom/board');
    await page.getByRole('heading', { level: 1, name: /^On tap at / }).waitFor();
    await page.keyboard.press('Escape');
    await page.waitForURL((url) => url.pathname === '/taproom');
    await page.close();
  });
});

describe('taking a beer off tap (Chromium, 1024×768)', () => {
  it('the head brewer takes the released beer off tap: it leaves the taproom home and the bar screen', async () => {
    const page = await brewer.newPage();
    await page.goto('/releases');
    const row = page.getByRole('row').filter({ hasText: beerName });
    await row.getByRole('link', { name: /^Release / }).waitFor();
    expect(await row.getByRole('cell').nth(3).textContent()).toBe('On tap');
    await row.getByRole('link', { name: /^Release / }).click();
    await page.getByRole('button', { name: 'Take off tap…' }).click();
    await page.getByRole('button', { name: `Take ${beerName} off tap` }).click();
    await page.getByText(`Off tap, taken off by ${maren.displayName}`).waitFor();
    await page.getByText('Off tap (kept for the record)').waitFor();
    await screenshot(page, 'taproom-release-off-tap-1024.png');

    const bar = await taproom.newPage();
    await signIn(bar, priya.email);
    const onTap = bar.getByRole('region', { name: 'On tap' });
    await onTap.getByRole('heading', { level: 3 }).first().waitFor();
    expect(await onTap.getByRole('heading', { level: 3 }).allTextContents()).not.toContain(beerName);
    await openBoard(bar);
    const names = await bar
      .getByRole('region', { name: /^On tap at / })
      .getByRole('listitem')
      .allTextContents();
    expect(names.some((n) => n.includes(beerName))).toBe(false);

    // Taken off by mistake: it goes back on.
    await page.getByRole('button', { name: 'Put back on tap' }).click();
    await page.getByText(`On tap, released by ${maren.displayName}`).waitFor();
    await page.goto('/releases');
    await row.getByRole('link', { name: /^Release / }).waitFor();
    expect(await row.getByRole('cell').nth(3).textContent()).toBe('On tap');
    await bar.goto('/taproom');
    await onTap.getByRole('heading', { level: 3, name: beerName }).waitFor();
    await page.close();
    await bar.close();
  });
});
