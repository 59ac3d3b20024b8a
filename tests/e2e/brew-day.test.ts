// The brew day on a tablet with a dropped network: five steps logged offline survive a reload and
// reach the server exactly once with their original captured times; then the head brewer signs off.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openBrowser, screenshot, signIn } from './browser';
import { DEMO_PASSWORD, DEMO_PEOPLE } from '../../server/seed/demo';

/** Waits for a condition the page reaches on its own time (loading, the outbox sending). */
const eventually = <T>(fn: () => T | Promise<T>) => expect.poll(fn, { timeout: 30_000 });

const [maren, ilya] = DEMO_PEOPLE as [(typeof DEMO_PEOPLE)[0], (typeof DEMO_PEOPLE)[0]];

/** Captured times of the items waiting in the tablet's outbox (read from IndexedDB). */
function outboxCapturedTimes(page: Page): Promise<string[]> {
  return page.evaluate(
    () =>
      new Promise<string[]>((resolve, reject) => {
        const open = indexedDB.open('keyval-store');
        open.onerror = () => reject(open.error ?? new Error('IndexedDB did not open'));
        open.onsuccess = () => {
          const get = open.result.transaction('keyval', 'readonly').objectStore('keyval').get('kettlewright-outbox');
          get.onsuccess = () => resolve(((get.result ?? []) as { capturedAt: string }[]).map((i) => i.capturedAt));
          get.onerror = () => reject(get.error ?? new Error('IndexedDB did not answer'));
        };
      }),
  );
}

/** Picks a step in the list, types its measurements, and taps Done. */
async function logStep(page: Page, step: string, values: Record<string, string>) {
  await page.getByRole('button', { name: new RegExp(`^\\d+\\.\\s*${step}`) }).click();
  await eventually(() => page.getByTestId('current-step').textContent()).toBe(step);
  for (const [label, value] of Object.entries(values))
    await page.getByLabel(new RegExp(`^${label}( \\(|$)`)).fill(value);
  await page.getByRole('button', { name: 'Done', exact: true }).click();
}

describe('brew day offline (Chromium, 1024×768)', () => {
  let head: BrowserContext;
  let tablet: BrowserContext;
  let batchId: number;

  beforeAll(async () => {
    head = await openBrowser();
    tablet = await openBrowser();
  });
  afterAll(async () => {
    await head?.close();
    await tablet?.close();
  });

  it('the head brewer plans a batch from a recipe version; the plan is frozen into it', async () => {
    const page = await head.newPage();
    await signIn(page, maren.email);
    const recipes = (await (await page.request.get('/api/recipes')).json()) as {
      name: string;
      latestVersionId: number;
    }[];
    const flagship = recipes[0]!;
    await page.goto(`/batches/new?recipeVersionId=${flagship.latestVersionId}`);
    // Says what is being planned, and lists each empty fermenter with its size.
    await eventually(() =>
      page.getByText(new RegExp(`^${flagship.name} v\\d+ on .+, \\d+\\.\\d (bbl|gal)$`)).count(),
    ).toBe(1);
    expect(await page.locator('option', { hasText: 'FV-4' }).textContent()).toMatch(/^FV-4 · 3\.5 bbl/);
    await screenshot(page, 'plan-batch-1024.png');
    await page.getByRole('button', { name: 'Plan the batch' }).click();
    await page.waitForURL(/\/batches\/\d+$/);
    batchId = Number(new URL(page.url()).pathname.split('/').pop());
    await eventually(() => page.getByRole('heading', { level: 1 }).textContent()).toContain(flagship.name);
  });

  it('the assistant logs five steps offline, reloads, sees them waiting, and the server gets exactly those five', async () => {
    const page = await tablet.newPage();
    await signIn(page, ilya.email);
    // The service worker must control the page before the network goes, so the shell is kept.
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => undefined));
    await page.goto(`/batches/${batchId}`);
    await eventually(() => page.evaluate(() => Boolean(navigator.serviceWorker.controller))).toBe(true);
    await eventually(() => page.getByTestId('current-step').textContent()).toBe('Heat strike water');

    const done = await page.getByRole('button', { name: 'Done', exact: true }).boundingBox();
    expect(done!.height).toBeGreaterThanOrEqual(56);

    await tablet.setOffline(true);
    await eventually(() => page.getByRole('status').filter({ hasText: 'Offline' }).count()).toBe(1);
    await logStep(page, 'Heat strike water', { Temperature: '165.5', Volume: '96' });
    await logStep(page, 'Mash in: Single infusion', { Temperature: '151.2', pH: '5.36' });
    await logStep(page, 'Start sparge', { Temperature: '168.0' });
    await logStep(page, 'End sparge', { Volume: '352', Gravity: '1.047' });
    await logStep(page, 'Start the boil', { Volume: '350', Gravity: '1.048' });
    await eventually(() => page.getByTestId('waiting-count').textContent()).toBe('5 waiting to send');
    await page.evaluate(() => window.scrollTo(0, 0));
    await screenshot(page, 'brew-day-offline-1024.png', { fullPage: false });

    const captured = await outboxCapturedTimes(page);
    expect(captured).toHaveLength(5);

    // Reload with no network: the service worker serves the shell and the last answers.
    const shell = page.waitForResponse((r) => r.request().resourceType() === 'document');
    await page.reload();
    expect((await shell).fromServiceWorker()).toBe(true);
    await eventually(() => page.getByTestId('waiting-count').textContent()).toBe('5 waiting to send');
    expect(await page.getByTestId('waiting-item').count()).toBe(5);
    // The boil timer counts from the logged (still waiting) boil start, across the reload.
    await eventually(() => page.getByTestId(/^boil-(countdown|add-now)$/).count()).toBe(1);
    expect(await outboxCapturedTimes(page)).toEqual(captured);

    await tablet.setOffline(false);
    await eventually(() => page.getByTestId('waiting-count').count()).toBe(0);

    const log = (await (await page.request.get(`/api/batches/${batchId}/log`)).json()) as {
      stepKey: string;
      capturedAt: string;
      authorName: string;
    }[];
    expect(log).toHaveLength(5);
    expect(log.map((e) => e.stepKey)).toEqual(['strike-water', 'mash-in', 'sparge-start', 'sparge-end', 'boil-start']);
    expect(log.map((e) => e.capturedAt)).toEqual(captured);
    expect(new Set(log.map((e) => e.authorName))).toEqual(new Set([ilya.displayName]));
    await eventually(() => page.getByTestId('log-entry').count()).toBe(5);
    await screenshot(page, 'brew-day-online-1024.png');
  });

  it('a fat-finger temperature is refused on the tablet in °F with the value kept, and a double tap logs one entry', async () => {
    const page = tablet.pages().at(-1)!;
    const logged = async () =>
      ((await (await page.request.get(`/api/batches/${batchId}/log`)).json()) as { stepKey: string }[]).map(
        (e) => e.stepKey,
      );
    const before = await logged();
    await page.getByRole('button', { name: /^\d+\.\s*Heat strike water/ }).click();
    await eventually(() => page.getByTestId('current-step').textContent()).toBe('Heat strike water');
    const temperature = page.getByLabel(/^Temperature \(/);
    await temperature.fill('1674');
    // Far from the plan: a warning beside the field, before Done.
    await eventually(() => page.getByText(/^Far from the expected/).count()).toBe(1);
    await page.getByRole('button', { name: 'Log again', exact: true }).click();
    // The shared schema's 110 °C limit, said in the °F the field shows.
    await eventually(() =>
      page.getByRole('alert').filter({ hasText: 'Temperature must be at most 230 °F' }).count(),
    ).toBe(1);
    expect(await page.getByTestId('current-step').textContent()).toBe('Heat strike water');
    expect(await temperature.inputValue()).toBe('1674');
    expect(await temperature.getAttribute('aria-invalid')).toBe('true');
    await screenshot(page, 'brew-day-limit-1024.png', { fullPage: false });
    await page.setViewportSize({ width: 768, height: 1024 });
    await screenshot(page, 'brew-day-limit-768.png', { fullPage: false });
    await page.setViewportSize({ width: 1024, height: 768 });

    await page.getByRole('button', { name: /^\d+\.\s*Start knockout/ }).click();
    await eventually(() => page.getByTestId('current-step').textContent()).toBe('Start knockout');
    // What was typed for the strike water stays with that step: knockout starts empty, without its refusal.
    expect(await temperature.inputValue()).toBe('');
    expect(await page.getByRole('alert').filter({ hasText: 'Temperature must be at most' }).count()).toBe(0);
    await temperature.fill('66');
    await page.getByRole('button', { name: 'Done', exact: true }).dblclick();
    await eventually(async () => (await logged()).length).toBe(before.length + 1);
    await page.waitForTimeout(1500);
    expect(await logged()).toEqual([...before, 'knockout-start']);
  });

  it('each step shows what the frozen plan has: salts, sparge water, rest times, pitch temperature, and the oxygen caution', async () => {
    const page = tablet.pages().at(-1)!;
    const open = async (step: string) => {
      await page.getByRole('button', { name: new RegExp(`^\\d+\\.\\s*${step}`) }).click();
      await eventually(() => page.getByTestId('current-step').textContent()).toMatch(new RegExp(`^${step}`));
    };
    await open('Start sparge');
    await eventually(() => page.getByLabel(/^Volume \(/).count()).toBe(1);
    expect(await page.getByLabel('Current step').textContent()).toMatch(/Expected \d+(\.\d)?.*Expected \d+/);
    await open('Mash in');
    expect(await page.getByTestId('step-plan').textContent()).toMatch(/^Hold \d+ min at \d+\.\d °F$/);
    await open('Pitch yeast');
    expect(await page.getByLabel('Current step').textContent()).toContain('Expected');
    await open('Oxygenate the wort');
    expect(await page.getByRole('note').filter({ hasText: 'Compressed oxygen' }).count()).toBe(1);
    await page.evaluate(() => window.scrollTo(0, 0));
    await screenshot(page, 'brew-day-oxygen-1024.png', { fullPage: false });
    await open('Heat strike water');
    await page.setViewportSize({ width: 768, height: 1024 });
    await screenshot(page, 'brew-day-strike-768.png', { fullPage: false });
    await page.setViewportSize({ width: 1024, height: 768 });
  });

  it('the head brewer signs the brew day off with their password', async () => {
    const page = await head.newPage();
    await page.goto(`/batches/${batchId}`);
    await page.getByLabel('Your password').fill('not-the-password');
    await page.getByRole('button', { name: 'Sign as reviewed' }).click();
    await eventually(() => page.getByText('This is not your password').count()).toBe(1);
    await page.getByLabel('Your password').fill(DEMO_PASSWORD);
    await page.getByRole('button', { name: 'Sign as reviewed' }).click();
    await eventually(() => page.getByTestId('signature').textContent()).toContain(`Reviewed by ${maren.displayName}`);
    expect(await page.getByTestId('signature').textContent()).toContain('Signature valid');
    await page.evaluate(() => window.scrollTo(0, 0));
    await screenshot(page, 'brew-day-signed-1024.png');

    // The printable record carries the signature and a QR code that opens this batch on a tablet.
    await page.getByRole('link', { name: 'Record and QR labels' }).click();
    await eventually(() => page.getByRole('img', { name: /^QR code: Batch / }).count()).toBe(1);
    expect(await page.getByTestId('signature').textContent()).toContain(`Reviewed by ${maren.displayName}`);
    await page.emulateMedia({ media: 'print' });
    await screenshot(page, 'batch-record-print.png');
  });
});
