// The head brewer scales the pilot seasonal to the 10 bbl brewhouse, saves it, and prints the brew sheet (Chromium).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { extractText, getDocumentProxy } from 'unpdf';
import { roundForMeasuring, scaleRecipe, usBblToL, usGalToL } from '../../shared/brewing';
import { equipmentAtVolume, toRecipeInput } from '../../shared/schemas/recipes';
import { DEMO_EQUIPMENT, SEASONAL_CONTENT, SEASONAL_NAME } from '../../server/seed/recipe-data';
import { DEMO_PEOPLE } from '../../server/seed/demo';
import { showGrain, showMeasured, showSmallWeight } from '../../src/lib/units';
import { openBrowser, screenshot, signIn } from './browser';

// What the 10 bbl version must say, from shared/brewing for the same input.
const expected = scaleRecipe(
  toRecipeInput(SEASONAL_NAME, SEASONAL_CONTENT),
  equipmentAtVolume(DEMO_EQUIPMENT.pilot, usGalToL(10)),
  equipmentAtVolume(DEMO_EQUIPMENT.big, usBblToL(10)),
);

describe('scaling the seasonal and printing its brew sheet (Chromium)', () => {
  let context: BrowserContext;
  let page: Page;
  beforeAll(async () => {
    context = await openBrowser();
    page = await context.newPage();
  });
  afterAll(async () => {
    await context?.close();
  });

  it('opens the seasonal in the editor with live numbers', async () => {
    await signIn(page, DEMO_PEOPLE[0]!.email);
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Recipes' }).click();
    await page.getByRole('link', { name: SEASONAL_NAME }).click();
    await page.getByRole('link', { name: /Edit version 1/ }).click();
    await expect
      .poll(() => page.getByRole('group', { name: 'IBU' }).textContent())
      .toContain(expected.before.ibu.toFixed(1));
    await screenshot(page, 'recipe-editor-1024.png');
  });

  it('scales it from the pilot to the 10 bbl profile: adjunct and spice per volume, IBU on target', async () => {
    await page.getByRole('link', { name: 'Scale' }).first().click();
    await page.getByLabel('Scale to').selectOption({ label: 'Main brewhouse 10 bbl (10.0 bbl)' });
    await expect
      .poll(() =>
        page.getByRole('table', { name: 'Original and scaled' }).getByRole('columnheader').nth(2).textContent(),
      )
      .toBe('Main brewhouse 10 bbl');
    expect(await page.getByRole('group', { name: 'Scaled IBU' }).textContent()).toContain(
      expected.after.ibu.toFixed(1),
    );
    // Same IBU as the pilot (scaleRecipe re-solves each hop for its IBU; the seeded target is 24).
    expect(expected.after.ibu).toBeCloseTo(expected.before.ibu, 6);
    expect(await page.getByRole('group', { name: 'Original IBU' }).textContent()).toContain(
      expected.before.ibu.toFixed(1),
    );

    const table = page.getByRole('table', { name: 'Original and scaled' });
    // 0.6 lb per US gal: 6 lb in 10 gal, 186 lb in 310 gal (10 bbl × 31 gal, DOMAIN.md).
    const quince = table.getByRole('row', { name: /Roasted quince/ });
    expect(await quince.textContent()).toContain('6 lb');
    expect(await quince.textContent()).toContain('186 lb');
    // 1 tsp per 5 US gal: 2 tsp in 10 gal, 62 tsp in 310 gal.
    const spice = table.getByRole('row', { name: /Harbour spice blend/ });
    expect(await spice.textContent()).toContain('2 tsp');
    expect(await spice.textContent()).toContain('62 tsp');
    // The hops do not scale in proportion: the page says so.
    expect(await table.getByRole('row', { name: /Earthy English-type hop/ }).textContent()).toContain(
      'Not in proportion',
    );
    await screenshot(page, 'recipe-scale-1024.png');
  });

  it('saves the scaled recipe as version 2 and prints its brew sheet with the scaled weights', async () => {
    await page.getByRole('button', { name: 'Save as new version' }).click();
    await page.getByLabel('What changed').fill('Scaled to the 10 bbl for the winter run');
    await page.getByRole('button', { name: 'Save version' }).click();
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toContain('version 2');

    await page.getByRole('link', { name: 'Brew sheet' }).click();
    await expect.poll(() => page.getByRole('heading', { level: 1 }).textContent()).toBe(SEASONAL_NAME);
    await page.emulateMedia({ media: 'print' });
    await screenshot(page, 'brew-sheet-print-1024.png');
    const pdf = await page.pdf({ format: 'Letter', printBackground: true });
    const { text } = await extractText(await getDocumentProxy(new Uint8Array(pdf)), { mergePages: true });
    const flat = text.replace(/\s+/g, ' ');

    const after = expected.after;
    expect(flat).toContain(`Roasted quince and golden beet: ${showMeasured(after.adjuncts[0]!.measuredUs)}`);
    expect(flat).toContain(showMeasured(after.adjuncts[1]!.measuredUs));
    expect(showMeasured(after.adjuncts[1]!.measuredUs)).toBe('62 tsp');
    for (const f of after.fermentables) expect(flat).toContain(showGrain('us', f.weightKg));
    for (const h of after.hops) expect(flat).toContain(showSmallWeight('us', h.weightG));
    expect(flat).toContain('Pale ale malt');
    expect(showGrain('us', after.fermentables[0]!.weightKg)).toMatch(/sack/);
    expect(flat).toContain(
      showMeasured(roundForMeasuring({ value: after.mashGrainKg, unit: 'kg' }, 'us')).split(' ')[1]!,
    );
    expect(flat).toMatch(/Hot liquids/);
    expect(flat).toMatch(/Sign-off/);
    expect(flat).toMatch(/Diacetyl rest: when gravity reaches/);
  });

  it('compares the pilot and 10 bbl versions side by side with the changes highlighted', async () => {
    await page.emulateMedia({ media: 'screen' });
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Recipes' }).click();
    await page.getByRole('link', { name: SEASONAL_NAME }).click();
    await page.getByLabel('Compare version 1').check();
    await page.getByLabel('Compare version 2').check();
    await page.getByRole('button', { name: 'Compare the two ticked' }).click();
    const changes = page.getByRole('table', { name: 'What changed' });
    await expect.poll(() => changes.textContent()).toContain('Scaled to the 10 bbl for the winter run');
    await screenshot(page, 'recipe-compare-1024.png');
    const text = await changes.textContent();
    expect(text).toContain('Pilot kit 10 gal');
    expect(text).toContain('Main brewhouse 10 bbl');
    expect(text).toContain('Grain bill #1 weight (Pale ale malt)17.75 lb478.5 lb (8 sacks + 38.5 lb)');
    expect(text).not.toContain('Computed IBU');
  });

  it('keeps an equipment profile recipes were written for, and removes a library entry', async () => {
    await page.goto('/library');
    await page
      .getByRole('row', { name: /Pilot kit 10 gal/ })
      .getByRole('button', { name: 'Edit' })
      .click();
    const dialog = page.getByRole('dialog', { name: 'Edit equipment' });
    await expect.poll(() => dialog.getByLabel('Mash thickness (qt/lb)').inputValue()).toMatch(/^\d\.\d+$/);
    await dialog.getByRole('button', { name: 'Remove…' }).click();
    await dialog.getByRole('button', { name: 'Remove Pilot kit 10 gal' }).click();
    await expect.poll(() => dialog.getByRole('alert').textContent()).toMatch(/written for, so it stays/);
    await screenshot(page, 'library-equipment-in-use-1024.png', { fullPage: false });
    await dialog.getByRole('button', { name: 'Cancel' }).click();

    const row = page.getByRole('row', { name: /Chocolate malt/ });
    await row.getByRole('button', { name: 'Edit' }).click();
    const ingredient = page.getByRole('dialog', { name: 'Edit ingredient' });
    await ingredient.getByRole('button', { name: 'Remove…' }).click();
    await ingredient.getByRole('button', { name: 'Remove Chocolate malt' }).click();
    await expect.poll(() => row.count()).toBe(0);
  });

  it('gives the taproom manager no recipe menu item', async () => {
    const taproom = await context.newPage();
    await context.clearCookies();
    await signIn(taproom, DEMO_PEOPLE[2]!.email);
    await expect.poll(() => taproom.getByRole('navigation', { name: 'Main' }).textContent()).not.toContain('Recipes');
    await taproom.close();
  });
});

describe('the recipe screens on a tablet (Chromium)', () => {
  let context: BrowserContext;
  let page: Page;
  beforeAll(async () => {
    context = await openBrowser({ width: 768, height: 1024 });
    page = await context.newPage();
    await signIn(page, DEMO_PEOPLE[0]!.email);
  });
  afterAll(async () => {
    await context?.close();
  });

  /** How far each select's chosen text, or each input's value, overflows its box (px); 0 when it fits. */
  const overflowing = (p: Page) =>
    p.evaluate(() => {
      const ctx = document.createElement('canvas').getContext('2d')!;
      const out: string[] = [];
      for (const el of Array.from(
        document.querySelectorAll<HTMLSelectElement | HTMLInputElement>(
          'form select, form input[type="text"], form input:not([type])',
        ),
      )) {
        if (el.offsetParent === null) continue;
        const style = getComputedStyle(el);
        const text = el instanceof HTMLSelectElement ? (el.selectedOptions[0]?.text ?? '') : el.value;
        // The `font` shorthand can read empty for form controls; build it from its parts.
        ctx.font = `${style.fontWeight} ${style.fontSize} ${style.fontFamily}`;
        const room = el.clientWidth - parseFloat(style.paddingLeft) - parseFloat(style.paddingRight);
        if (ctx.measureText(text).width > room + 1) out.push(text);
      }
      return out;
    });

  it('fits every recipe column on a portrait tablet (768 px)', async () => {
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Recipes' }).click();
    const table = page.getByRole('table');
    await expect.poll(() => table.getByRole('columnheader', { name: /Last brewed/ }).count()).toBe(1);
    const [scroll, client] = await table.evaluate((t) => [t.parentElement!.scrollWidth, t.parentElement!.clientWidth]);
    expect(scroll).toBeLessThanOrEqual(client);
    await screenshot(page, 'recipes-list-768.png');
  });

  it('keeps OG, IBU and the other figures on screen while editing on a portrait tablet', async () => {
    await page.getByRole('link', { name: 'Breakwater Pale' }).click();
    await page
      .getByRole('link', { name: /Edit version/ })
      .first()
      .click();
    const bar = page.getByRole('region', { name: 'Numbers while editing' });
    await expect.poll(() => bar.textContent()).toMatch(/OG1\.0\d\d/);
    await page.getByRole('heading', { name: 'Water', exact: true }).scrollIntoViewIfNeeded();
    const box = (await bar.boundingBox())!;
    expect(box.y).toBeGreaterThan(0);
    expect(box.y + box.height).toBeLessThanOrEqual(1024);
    expect(await bar.textContent()).toMatch(/IBU\d+/);
    await screenshot(page, 'recipe-editor-768-fold.png', { fullPage: false });
  });

  it('shows whole names in selects and hop varieties at 768 and 1024 px', async () => {
    expect(await overflowing(page)).toEqual([]);
    await page.setViewportSize({ width: 1024, height: 768 });
    expect(await overflowing(page)).toEqual([]);
    await page.getByRole('heading', { name: 'Hops', exact: true }).scrollIntoViewIfNeeded();
    await screenshot(page, 'recipe-editor-1024-hops.png', { fullPage: false });
    await page.setViewportSize({ width: 1440, height: 900 });
    expect(await overflowing(page)).toEqual([]);
    await screenshot(page, 'recipe-editor-1440-fold.png', { fullPage: false });
  });
});
