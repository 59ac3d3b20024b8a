// The batch record on a 1024×768 tablet for a US brewery (the demo brewery works in US units): every cellar
// action and packaging run shown in full, in °F, gal/bbl and psi, never in litres, °C or kPa.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openBrowser, screenshot, signedPost, signIn } from './browser';
import { DEMO_PEOPLE } from '../../server/seed/demo';
import { fToC, KPA_PER_PSI, L_PER_US_BBL } from '../../shared/quantities';

const post = (page: Page, url: string, data: unknown): Promise<unknown> =>
  signedPost(page, url, data, 'e2e-cellar-tablet');

type Vessel = { id: number; name: string; type: string; status: string; currentBatchId: number | null };

describe('the batch record as a US brewery reads it (Chromium, 1024×768)', () => {
  let context: BrowserContext;
  beforeAll(async () => {
    context = await openBrowser();
  });
  afterAll(async () => {
    await context?.close();
  });

  it('shows the D-rest and crash temperatures, the transfer, the carbonation and each packaging run', async () => {
    const page = await context.newPage();
    await signIn(page, DEMO_PEOPLE[0]!.email);
    const recipes = (await (await page.request.get('/api/recipes')).json()) as { latestVersionId: number }[];
    const stamp = Date.now() % 100000;
    const tank = (kind: 'fermenter' | 'bright_tank', name: string) =>
      post(page, '/api/vessels', {
        name,
        type: kind,
        // The API takes SI: 40 bbl and 15 psi (1 bbl = 31 US gal, 27 CFR 25.11; 1 psi = 6.894 757 kPa, NIST SP 811).
        capacityL: 40 * L_PER_US_BBL,
        ratedPressureKpa: 15 * KPA_PER_PSI,
      }) as Promise<Vessel>;
    const fermenter = await tank('fermenter', `FV-R${stamp}`);
    const bright = await tank('bright_tank', `BT-R${stamp}`);
    const batch = (await post(page, '/api/batches', {
      recipeVersionId: recipes[0]!.latestVersionId,
      brewDate: new Date().toISOString().slice(0, 10),
      fermenterId: fermenter.id,
    })) as { id: number };
    await post(page, `/api/batches/${batch.id}/status`, { status: 'brewing' });
    const cellar = `/api/cellar/batches/${batch.id}`;
    await post(page, `${cellar}/readings`, {
      kind: 'reading',
      method: 'hydrometer',
      sg: 1.016,
    });
    await post(page, `${cellar}/actions`, { kind: 'action', action: 'd_rest', tempC: fToC(72) });
    await post(page, `${cellar}/actions`, { kind: 'action', action: 'cold_crash', tempC: fToC(33) });
    await post(page, `${cellar}/actions`, { kind: 'action', action: 'fining', detail: 'Gelatin 3 oz' });
    await post(page, `${cellar}/actions`, {
      kind: 'action',
      action: 'transfer',
      volumeL: 7 * L_PER_US_BBL,
      toVesselId: bright.id,
    });
    await post(page, `${cellar}/actions`, {
      kind: 'action',
      action: 'carbonation',
      co2Volumes: 2.5,
      tempC: fToC(34),
    });
    await post(page, `${cellar}/packaging`, {
      kind: 'packaging',
      lines: [{ kind: 'keg', size: 'half_bbl', count: 6 }],
      final: false,
    });
    await post(page, `${cellar}/packaging`, {
      kind: 'packaging',
      lines: [{ kind: 'can', sizeMl: 473, count: 120 }],
      final: true,
    });

    await page.goto(`/batches/${batch.id}/record`);
    const entries = page.getByTestId('log-entry');
    const row = (text: string) => entries.filter({ hasText: text }).first().textContent();
    await expect.poll(() => entries.count(), { timeout: 20_000 }).toBeGreaterThanOrEqual(8);
    expect(await row('D-rest started')).toContain('72.0 °F');
    expect(await row('Cold crash')).toContain('33.0 °F');
    expect(await row('Fining')).toContain('Gelatin 3 oz');
    await expect.poll(() => row('Transfer to bright tank'), { timeout: 10_000 }).toContain(`into ${bright.name}`);
    expect(await row('Transfer to bright tank')).toContain('7.0 bbl');
    expect(await row('Carbonation set')).toMatch(/2\.50 volumes CO₂ · head pressure \d+\.\d psi/);
    // 6 × ½ bbl = 3 bbl; 120 × 16 fl oz (473 mL) = 15.0 gal (1 US gal = 128 fl oz, NIST HB 44)
    expect(await row('6 × ½ bbl keg')).toContain('3.0 bbl packaged');
    expect(await row('120 × 16 fl oz can')).toContain('15.0 gal');
    const text = (await page.getByRole('list', { name: 'Log' }).textContent()) ?? '';
    expect(text).not.toMatch(/°C|\d L\b|kPa|\d mL\b/);
    await screenshot(page, 'batch-record-cellar-us-1024.png');

    // The packaging losses, against the 7 bbl that went into the bright tank, on the cellar page.
    await page.goto(`/cellar/batches/${batch.id}`);
    const summary = page.getByLabel('Packaged volume');
    await expect.poll(() => summary.textContent(), { timeout: 20_000 }).toContain('Into the bright tank7.00 bbl');
    expect(await summary.textContent()).toMatch(/Losses\d+\.\d\d bbl \(\d+\.\d %\)/);
  });
});
