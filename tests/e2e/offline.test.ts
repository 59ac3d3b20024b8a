// Opening screens with no network: the service worker keeps every screen's code once the app has been
// opened online, so a screen never opened before still opens when the brewhouse Wi-Fi drops.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, screenshot, signIn } from './browser';
import { DEMO_PEOPLE } from '../../server/seed/demo';

const eventually = <T>(fn: () => T | Promise<T>) => expect.poll(fn, { timeout: 30_000 });

describe('screens offline (Chromium, 768×1024)', () => {
  let tablet: BrowserContext;
  beforeAll(async () => {
    tablet = await openBrowser({ width: 768, height: 1024 });
  });
  afterAll(async () => {
    await tablet?.setOffline(false);
    await tablet?.close();
  });

  it('opens the history screen, never opened online, with the network gone', async () => {
    const page = await tablet.newPage();
    await signIn(page, DEMO_PEOPLE[1]!.email);
    await page.evaluate(() => navigator.serviceWorker.ready.then(() => undefined));
    await eventually(() => page.evaluate(() => Boolean(navigator.serviceWorker.controller))).toBe(true);

    await tablet.setOffline(true);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'History' }).click();
    await eventually(() => page.getByRole('heading', { level: 1 }).textContent()).toBe('Batch history');
    expect(await page.getByText('This screen could not open').count()).toBe(0);
    await screenshot(page, 'offline-history-768.png', { fullPage: false });
  });
});
