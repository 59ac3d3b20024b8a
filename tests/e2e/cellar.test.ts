import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openBrowser, screenshot, signIn } from './browser';
import { DEMO_PEOPLE } from '../../server/seed/demo';

const write = { 'x-kettlewright': '1' };

/** The head brewer plans a batch into an empty fermenter and starts its brew day, through the API. */
async function fermentingBatch(page: Page): Promise<{ id: number; number: string; vessel: string; vesselId: number }> {
  const recipes = (await (await page.request.get('/api/recipes')).json()) as { latestVersionId: number }[];
  const vessels = (await (await page.request.get('/api/vessels')).json()) as {
    id: number;
    name: string;
    type: string;
    status: string;
    capacityL: number;
    currentBatchId: number | null;
  }[];
  // Room for the first recipe's batch with headspace: 20 bbl ≈ 2,347 L (1 US bbl = 117.348 L, 27 CFR 25.11).
  let fermenter = vessels.find(
    (v) => v.type === 'fermenter' && v.status === 'clean' && v.currentBatchId === null && v.capacityL >= 2347,
  );
  if (!fermenter) {
    const made = await page.request.post('/api/vessels', {
      headers: write,
      data: {
        name: `FV-${Date.now() % 100000}`,
        type: 'fermenter',
        // 40 bbl and 15 psi, sent in SI: 27 CFR 25.11 (1 bbl = 117.347765 L), NIST SP 811 (1 psi = 6.894757 kPa).
        capacityL: 40 * 117.347765304,
        ratedPressureKpa: 15 * 6.894757,
      },
    });
    fermenter = await made.json();
  }
  const planned = await page.request.post('/api/batches', {
    headers: write,
    data: {
      recipeVersionId: recipes[0]!.latestVersionId,
      brewDate: new Date().toISOString().slice(0, 10),
      fermenterId: fermenter!.id,
    },
  });
  expect(planned.status()).toBe(201);
  const batch = (await planned.json()) as { id: number; number: string };
  const brewing = await page.request.post(`/api/batches/${batch.id}/status`, {
    headers: write,
    data: { status: 'brewing' },
  });
  expect(brewing.status()).toBe(200);
  return { ...batch, vessel: fermenter!.name, vesselId: fermenter!.id };
}

describe('cellar readings on the tablet (Chromium, 1024×768)', () => {
  let head: BrowserContext;
  let assistant: BrowserContext;
  beforeAll(async () => {
    head = await openBrowser();
    assistant = await openBrowser();
  });
  afterAll(async () => {
    await head?.close();
    await assistant?.close();
  });

  it('the assistant logs three readings; the chart shows three points and the D-rest line; the board shows the latest gravity', async () => {
    const headPage = await head.newPage();
    await signIn(headPage, DEMO_PEOPLE[0]!.email);
    const batch = await fermentingBatch(headPage);

    const page = await assistant.newPage();
    await signIn(page, DEMO_PEOPLE[1]!.email);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Cellar' }).click();
    await page.getByRole('article', { name: batch.vessel }).click();
    await page.waitForURL(`**/cellar/batches/${batch.id}`);

    const points = page.locator('[data-testid="gravity-point"]');
    const form = page.getByRole('form', { name: 'Log a reading' });
    for (const [i, [gravity, temp]] of (
      [
        ['1.052', '66'],
        ['1.031', '67'],
        ['1.021', '67.5'],
      ] as const
    ).entries()) {
      await form.getByRole('button', { name: /^Hydrometer/ }).click();
      await form.getByLabel('Gravity (SG)').fill(gravity);
      await form.getByLabel('Temperature (°F)').fill(temp);
      await form.getByRole('button', { name: 'Save reading' }).click();
      await expect.poll(() => points.count(), { timeout: 15_000 }).toBe(i + 1);
    }

    const chart = page.getByRole('figure', { name: 'Fermentation chart' });
    await expect.poll(() => chart.textContent()).toMatch(/D-rest at 1\.0\d\d/);
    await expect.poll(() => page.getByLabel('Readings and cellar work').textContent()).toContain('1.021');
    // The next reading starts empty: the last temperature and the usual method are offered, not filled in.
    expect(await form.getByLabel('Temperature (°F)').inputValue()).toBe('');
    expect(await form.getByRole('button', { name: 'Last: 67.5 °F' }).count()).toBe(1);
    expect(await form.getByRole('button', { name: 'Hydrometer usual' }).getAttribute('aria-pressed')).toBe('false');
    await page.getByRole('heading', { name: 'Fermentation curve' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'cellar-batch-reading-1024.png', { fullPage: false });
    await screenshot(page, 'cellar-batch-full-1024.png');

    await page.getByRole('link', { name: 'Vessel board' }).click();
    const tile = page.getByRole('article', { name: batch.vessel });
    await expect.poll(() => tile.getByTestId('board-gravity').textContent()).toBe('1.021');
    expect(await tile.textContent()).toContain(batch.number);
    await page.evaluate(() => window.scrollTo(0, 0));
    await screenshot(page, 'cellar-board-1024.png', { fullPage: false });
    await screenshot(page, 'cellar-board-full-1024.png');

    // 1.021 was misread: the assistant corrects it in the batch record; the cellar and the board show the correction.
    await page.goBack();
    await page.getByRole('link', { name: 'Correct a reading' }).click();
    await page.waitForURL(`**/batches/${batch.id}/record`);
    await page
      .getByTestId('log-entry')
      .filter({ hasText: '1.021' })
      .getByRole('button', { name: /Correct entry/ })
      .click();
    const dialog = page.getByRole('dialog', { name: /Correct entry/ });
    await dialog.getByLabel('Gravity (SG)').fill('1.019');
    await dialog.getByLabel('Reason').fill('Read the hydrometer at the meniscus top; it is 1.019');
    await screenshot(page, 'cellar-reading-correction-1024.png', { fullPage: false });
    await dialog.getByRole('button', { name: 'Save correction' }).click();
    await expect
      .poll(() => page.getByTestId('log-entry').filter({ hasText: 'Correction: Read the hydrometer' }).count(), {
        timeout: 15_000,
      })
      .toBe(1);
    // Back inside the app (no reload): the cellar page shows the correction, not what it had before.
    await page.goBack();
    await page.waitForURL(`**/cellar/batches/${batch.id}`);
    await expect.poll(() => page.getByLabel('Readings and cellar work').textContent()).toMatch(/1\.019 .*corrected/);
    expect(await page.getByLabel('Readings and cellar work').textContent()).not.toContain('1.021');
    expect(await points.count()).toBe(3);
    await page.getByRole('link', { name: 'Vessel board' }).click();
    await expect.poll(() => tile.getByTestId('board-gravity').textContent()).toBe('1.019');

    // A tank's label opens the batch in it; the label sheet has one label per vessel.
    await page.goto(`/cellar?vessel=${batch.vesselId}`);
    await page.waitForURL(`**/cellar/batches/${batch.id}`);
    await page.goto('/cellar/vessels');
    await page.getByRole('link', { name: 'Print labels' }).click();
    const labels = page.getByRole('region', { name: 'Labels' }).getByRole('figure');
    await expect
      .poll(() => labels.count())
      .toBe(await page.evaluate(async () => ((await (await fetch('/api/vessels')).json()) as unknown[]).length));
    await expect.poll(() => labels.filter({ hasText: batch.vessel }).getByRole('img').count()).toBe(1);
    await screenshot(page, 'cellar-vessel-labels-1024.png', { fullPage: false });
    await page.goto('/cellar');

    // The demo batch a week into fermentation: a curve with its prediction.
    await page.getByRole('article', { name: 'FV-1', exact: true }).click();
    await page.getByRole('heading', { name: 'Fermentation curve' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'cellar-curve-1024.png', { fullPage: false });
  });

  it('a dry hop with a note, then a cold crash: the crash entry shows no note and no hops', async () => {
    const headPage = await head.newPage();
    await signIn(headPage, DEMO_PEOPLE[0]!.email);
    const batch = await fermentingBatch(headPage);
    const page = await assistant.newPage();
    await signIn(page, DEMO_PEOPLE[1]!.email);
    await page.goto(`/cellar/batches/${batch.id}`);
    const reading = page.getByRole('form', { name: 'Log a reading' });
    await reading.getByRole('button', { name: 'Hydrometer' }).tap();
    await reading.getByLabel('Gravity (SG)').fill('1.020');
    await reading.getByRole('button', { name: 'Save reading' }).tap();
    const rows = page.getByTestId('cellar-row');
    await expect.poll(() => rows.count(), { timeout: 15_000 }).toBe(1);

    const work = page.getByRole('form', { name: 'Log cellar work' });
    await work.getByLabel('What was done').selectOption('dry_hop');
    await work.getByLabel('Hops and weight').fill('Citra 9 lb');
    await work.getByLabel('Note (optional)').fill('Second charge, purged with CO2');
    await work.getByRole('button', { name: 'Log: Dry hop' }).tap();
    await expect.poll(() => rows.filter({ hasText: 'Dry hop' }).count(), { timeout: 15_000 }).toBe(1);
    expect(await work.getByLabel('Note (optional)').inputValue()).toBe('');
    expect(await work.getByLabel('What was done').inputValue()).toBe('');

    await work.getByLabel('What was done').selectOption('cold_crash');
    await work.getByRole('button', { name: /^Plan: / }).tap();
    await screenshot(page, 'cellar-cold-crash-after-dry-hop-1024.png', { fullPage: false });
    await work.getByRole('button', { name: 'Log: Cold crash' }).tap();
    const crash = rows.filter({ hasText: 'Cold crash' });
    await expect.poll(() => crash.count(), { timeout: 15_000 }).toBe(1);
    expect(await rows.filter({ hasText: 'Dry hop' }).textContent()).toMatch(/Citra 9 lb · “Second charge, purged/);
    const crashText = await crash.textContent();
    expect(crashText).toMatch(/^Cold crash · \d+(\.\d)? °F/);
    expect(crashText).not.toContain('Second charge');
    expect(crashText).not.toContain('Citra');
  });

  it('the head brewer adds a bright tank with its rated pressure', async () => {
    const page = await head.newPage();
    await page.goto('/cellar/vessels');
    await page.getByRole('button', { name: 'Add a vessel' }).click();
    const dialog = page.getByRole('dialog', { name: 'Add a vessel' });
    const name = `BT-${Date.now() % 100000}`;
    await dialog.getByLabel('Name').fill(name);
    await dialog.getByLabel('Type').selectOption('bright_tank');
    await dialog.getByLabel('Unit').selectOption('bbl');
    await dialog.getByLabel('Capacity').fill('7');
    await dialog.getByLabel('Rated working pressure (gauge)').fill('30');
    await screenshot(page, 'cellar-vessel-form-1024.png', { fullPage: false });
    await dialog.getByRole('button', { name: 'Add vessel' }).click();
    const row = page.getByRole('row', { name: new RegExp(name) });
    await expect.poll(() => row.textContent()).toMatch(/Bright tank.*7\.0 bbl.*30 psi.*Clean/);
  });

  it('a double tap on Save reading writes one reading; the batch page at 768×1024 portrait', async () => {
    const headPage = await head.newPage();
    await signIn(headPage, DEMO_PEOPLE[0]!.email);
    const batch = await fermentingBatch(headPage);
    const portrait = await openBrowser({ width: 768, height: 1024 });
    try {
      const page = await portrait.newPage();
      await signIn(page, DEMO_PEOPLE[1]!.email);
      await page.goto(`/cellar/batches/${batch.id}`);
      const form = page.getByRole('form', { name: 'Log a reading' });
      await form.getByRole('button', { name: 'Hydrometer' }).click();
      await form.getByLabel('Gravity (SG)').fill('1,050');
      await form.getByLabel('Temperature (°F)').fill('66');
      await form.getByRole('button', { name: 'Save reading' }).dblclick();
      const points = page.locator('[data-testid="gravity-point"]');
      await expect.poll(() => points.count(), { timeout: 15_000 }).toBe(1);
      // Give a second write every chance to land before counting.
      await expect.poll(() => page.locator('[aria-label="Waiting to send"]').count(), { timeout: 15_000 }).toBe(0);
      await page.waitForTimeout(1000);
      const view = (await (await page.request.get(`/api/cellar/batches/${batch.id}`)).json()) as {
        readings: { sg: number }[];
      };
      expect(view.readings.map((r) => r.sg)).toEqual([1.05]);

      // The assistant reads the cellar plan as text.
      await expect
        .poll(() => page.getByTestId('plan-read-only').textContent())
        .toMatch(/^Read only: a head brewer changes the plan/);
      await page.goto('/cellar');
      await page.getByRole('article', { name: 'FV-1', exact: true }).click();
      await page.getByRole('heading', { name: 'Fermentation curve' }).scrollIntoViewIfNeeded();
      await screenshot(page, 'cellar-batch-portrait-768.png', { fullPage: false });
      await screenshot(page, 'cellar-batch-full-portrait-768.png');
      await page.goto('/cellar/vessels');
      await screenshot(page, 'cellar-vessels-portrait-768.png', { fullPage: false });
    } finally {
      await portrait.close();
    }
  });
});
