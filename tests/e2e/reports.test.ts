// Reports in Chromium at tablet size: the head brewer reads last month's production (with the note that official
// forms differ by country, a CSV download and a print button) and a recipe's batch history chart; the taproom
// manager cannot open the production figures. Screenshots into test-results/screenshots/.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, screenshot, signIn } from './browser';
import { DEMO_PEOPLE } from '../../server/seed/demo';

const maren = DEMO_PEOPLE.find((p) => p.role === 'head_brewer')!;
const priya = DEMO_PEOPLE.find((p) => p.role === 'taproom_manager')!;

let brewer: BrowserContext;
let taproom: BrowserContext;

beforeAll(async () => {
  brewer = await openBrowser();
  taproom = await openBrowser();
});
afterAll(async () => {
  await brewer?.close();
  await taproom?.close();
});

describe('reports (Chromium, 1024×768)', () => {
  it('shows the US head brewer last month’s production per beer in barrels only, with CSV and print', async () => {
    const page = await brewer.newPage();
    await signIn(page, maren.email);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Production' }).click();
    await expect.poll(() => page.getByRole('heading', { name: 'Monthly production' }).count()).toBe(1);
    await expect.poll(() => page.getByText('Official production and excise forms differ by country').count()).toBe(1);
    // The demo brewery brewed within the last weeks: last month (the default) has figures and a total.
    const total = page.getByRole('row').filter({ hasText: 'Total' });
    await expect.poll(() => total.count(), { timeout: 15_000 }).toBe(1);
    expect(await total.textContent()).toMatch(/^Total(\d+\.\d\d){4}$/);
    // A US brewery never meets a litre: the figures are in barrels and no hectolitre is shown beside them.
    expect(await page.getByRole('columnheader', { name: 'Brewed (knockout) (bbl)' }).count()).toBe(1);
    expect(await page.locator('main').textContent()).not.toMatch(/\bhL\b|hectolitre/i);
    const csv = page.getByRole('link', { name: 'Download CSV' });
    expect(await csv.getAttribute('href')).toMatch(/^\/api\/reports\/production\/csv\?month=\d{4}-\d{2}$/);
    const response = await page.request.get((await csv.getAttribute('href'))!);
    expect(response.status()).toBe(200);
    expect(await response.text()).toContain('Official forms differ by country');
    expect(await page.getByRole('button', { name: 'Print' }).count()).toBe(1);
    await screenshot(page, 'reports-production-1024.png');
  });

  it('charts a recipe’s batches, planned against measured OG', async () => {
    const page = await brewer.newPage();
    await page.goto('/reports/history');
    const select = page.getByLabel('Recipe');
    await expect.poll(() => select.locator('option').count()).toBeGreaterThan(1);
    // Pick the first recipe the demo brewery has brewed.
    const values = await select
      .locator('option')
      .evaluateAll((options) => options.map((o) => (o as HTMLOptionElement).value).filter(Boolean));
    let found = false;
    for (const value of values) {
      await select.selectOption(value);
      const rows = page.locator('tbody tr');
      await expect
        .poll(
          async () => (await rows.count()) > 0 || (await page.getByText('No batches of this recipe yet').count()) > 0,
        )
        .toBe(true);
      if ((await rows.count()) > 0) {
        found = true;
        break;
      }
    }
    expect(found).toBe(true);
    await expect.poll(() => page.locator('.recharts-line').count()).toBeGreaterThanOrEqual(2);
    await screenshot(page, 'reports-history-1024.png');
  });

  it('refuses the production figures to the taproom manager', async () => {
    const page = await taproom.newPage();
    await signIn(page, priya.email);
    expect(await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Production' }).count()).toBe(
      0,
    );
    await page.goto('/reports/production');
    await expect.poll(() => page.getByText('Not open to your role').count(), { timeout: 15_000 }).toBe(1);
    expect(await page.getByRole('link', { name: 'Download CSV' }).count()).toBe(0);
  });
});
