import { mkdtempSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import { expect } from 'vitest';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { DEMO_PASSWORD } from '../../server/seed/demo';

export const BASE_URL = `http://127.0.0.1:${process.env.KW_E2E_PORT ?? 3100}`;
export const SCREENSHOT_DIR = path.resolve('test-results/screenshots');

/** Debian's Chromium, headless, quiet on a closed network; a fresh profile each time. */
export async function openBrowser(viewport = { width: 1024, height: 768 }): Promise<BrowserContext> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  return chromium.launchPersistentContext(mkdtempSync(path.join(tmpdir(), 'kw-chromium-')), {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport,
    hasTouch: true,
    baseURL: BASE_URL,
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}

/** Saves a screenshot into test-results/screenshots for a person to look at (the whole page unless told otherwise). */
export function screenshot(
  page: Page,
  name: string,
  options: { fullPage: boolean } = { fullPage: true },
): Promise<Buffer> {
  return page.screenshot({ path: path.join(SCREENSHOT_DIR, name), ...options });
}

/** A signed write straight to the API from a signed-in page, with the headers the outbox sends. */
export async function signedPost(
  page: Page,
  url: string,
  data: unknown,
  deviceId = 'e2e-office-desk',
): Promise<{ id?: number; entryId?: number }> {
  const res = await page.request.post(url, {
    data,
    headers: {
      'x-kettlewright': '1',
      'Idempotency-Key': randomUUID(),
      'X-Captured-At': new Date().toISOString(),
      'X-Device-Id': deviceId,
    },
  });
  expect(res.status(), `${url}: ${await res.text()}`).toBeLessThan(300);
  return (await res.json()) as { id?: number };
}
