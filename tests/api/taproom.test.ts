// Release to the taproom and the taproom manager's reach: ABV from the logged OG and FG, confirmation
// of the numbers, the batch moving to released, and what the taproom role can and cannot read.
import { randomUUID } from 'node:crypto';
import sharp from 'sharp';
import { beforeAll, describe, expect, it } from 'vitest';
import { routeTable } from '../../server/routes/define';
import { can } from '../../shared/policy';
import { abv, abvBalling, abvSimple } from '../../shared/brewing';
import { createTestBrewery, type TestBrewery } from './helpers';
import { brewedBatch, SHEET, TASTING_CONTENT } from './taproom-fixtures';
import { plannedBatch } from './batch-fixtures';
import { Release, type Batch } from '../../server/models';

let t: TestBrewery;
let other: TestBrewery;
/** Packaged: OG 1.062 on the brew-day log; readings 1.030, 1.014, 1.012 in the cellar. */
let batch: Batch;
/** Still conditioning, with an announced ("coming soon") sheet. */
let conditioning: Batch;
/** Fermenting, with a draft sheet only. */
let unreleased: Batch;
let releaseId: number;
let draftId: number;
let photoId: number;
let labSheetId: number;

beforeAll(async () => {
  t = await createTestBrewery();
  other = await createTestBrewery();
  batch = await brewedBatch(t, { og: 1.062, readings: [1.03, 1.014, 1.012], packaged: true });
  conditioning = await brewedBatch(t, { og: 1.048, readings: [1.01] });
  await t.as.assistant_brewer.post(`/api/batches/${conditioning.id}/status`).send({ status: 'conditioning' });
  unreleased = await brewedBatch(t, { og: 1.07, readings: [1.04] });

  const jpeg = await sharp({ create: { width: 800, height: 600, channels: 3, background: '#c98a2b' } })
    .jpeg()
    .toBuffer();
  photoId = (await t.as.head_brewer.post(`/api/batches/${batch.id}/attachments`).attach('file', jpeg, 'pour.jpg')).body
    .id;
  labSheetId = (
    await t.as.head_brewer
      .post(`/api/batches/${batch.id}/attachments`)
      .attach('file', Buffer.from('%PDF-1.4\n%%EOF\n'), 'lab.pdf')
  ).body.id;
  await t.as.head_brewer
    .put(`/api/batches/${unreleased.id}/release`)
    .send({ ...SHEET, beerName: 'Secret Porter', style: 'Porter' });
  await t.as.head_brewer
    .put(`/api/batches/${conditioning.id}/release`)
    .send({ ...SHEET, beerName: 'Foghorn Lager', style: 'Helles', comingSoon: true });
  await t.as.head_brewer
    .post(`/api/batches/${conditioning.id}/tasting-notes`)
    .send({ idempotencyKey: randomUUID(), content: { ...TASTING_CONTENT, aroma: 'Bread crust', score: 4.5 } });
});

describe('releasing a batch', () => {
  it('computes ABV from the OG on the brew-day log and the latest gravity reading', async () => {
    const res = await t.as.head_brewer.get(`/api/batches/${batch.id}/release`);
    expect(res.status).toBe(200);
    expect(res.body.state).toBeNull();
    expect(res.body.numbers).toMatchObject({ og: 1.062, fg: 1.012, abvMethod: 'balling' });
    // Balling's route as given by M. L. Hall, "Brew by the Numbers", Zymurgy 1995 (checked against that
    // source in shared/brewing/gravity.test.ts); about 6.6 % here, above the 6.56 % of the 131.25 rule of thumb.
    expect(res.body.numbers.abvPct).toBeCloseTo(abvBalling(1.062, 1.012), 10);
    expect(res.body.numbers.abvPct).toBeGreaterThan(abvSimple(1.062, 1.012));
    expect(res.body.numbers.abvPct).not.toBeCloseTo(res.body.numbers.plannedAbvPct, 2);
    expect(res.body.packageSizes).toEqual([
      { label: '⅙ bbl keg', count: 2 },
      { label: '16 fl oz can', count: 12 },
    ]);
  });

  it('refuses to release before the sheet is written, and refuses numbers that differ from the log', async () => {
    const early = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/release/publish`)
      .send({ confirmedOg: 1.062, confirmedFg: 1.012 });
    expect(early.status).toBe(409);
    expect(early.body.error.message).toMatch(/release sheet/);

    const saved = await t.as.head_brewer
      .put(`/api/batches/${batch.id}/release`)
      .send({ ...SHEET, photoAttachmentId: photoId });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    expect(saved.body.state).toBe('draft');

    // Confirming the second-to-last reading: the log has moved on since.
    const stale = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/release/publish`)
      .send({ confirmedOg: 1.062, confirmedFg: 1.014 });
    expect(stale.status).toBe(409);
    expect(stale.body.error.message).toContain('FG 1.012');
  });

  it('refuses a lab sheet as the beer’s photo, and a batch that is not packaged yet', async () => {
    const pdf = await t.as.head_brewer
      .put(`/api/batches/${batch.id}/release`)
      .send({ ...SHEET, photoAttachmentId: labSheetId });
    expect(pdf.status).toBe(422);
    const notPackaged = await t.as.head_brewer
      .post(`/api/batches/${conditioning.id}/release/publish`)
      .send({ confirmedOg: 1.048, confirmedFg: 1.01 });
    expect(notPackaged.status).toBe(409);
    expect(notPackaged.body.error.message).toMatch(/packaged/);
  });

  it('releases: freezes the numbers, puts the beer on tap and moves the batch to released', async () => {
    const res = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/release/publish`)
      .send({ confirmedOg: 1.062, confirmedFg: 1.012 });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({ state: 'on_tap', releasedBy: t.users.head_brewer.displayName });
    expect(res.body.numbers.abvPct).toBeCloseTo(abv(1.062, 1.012), 10);
    expect((await t.as.head_brewer.get(`/api/batches/${batch.id}`)).body.status).toBe('released');
    const again = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/release/publish`)
      .send({ confirmedOg: 1.062, confirmedFg: 1.012 });
    expect(again.status).toBe(409);
  });

  it('lets only the head brewer write or release (the assistant gets 403)', async () => {
    expect((await t.as.assistant_brewer.put(`/api/batches/${batch.id}/release`).send(SHEET)).status).toBe(403);
    expect(
      (
        await t.as.assistant_brewer
          .post(`/api/batches/${batch.id}/release/publish`)
          .send({ confirmedOg: 1.062, confirmedFg: 1.012 })
      ).status,
    ).toBe(403);
  });
});

describe("the taproom manager's home", () => {
  it('lists the released beer with its public facts, then the one coming soon; never the draft', async () => {
    const res = await t.as.taproom_manager.get('/api/taproom/beers');
    expect(res.status).toBe(200);
    const names = res.body.beers.map((b: { beerName: string }) => b.beerName);
    expect(names).toEqual(['Breakwater Pale', 'Foghorn Lager']);
    const [onTap, soon] = res.body.beers;
    expect(onTap).toMatchObject({
      state: 'on_tap',
      batchNumber: batch.number,
      abvIsPlanned: false,
      glass: 'nonic_pint',
      servingTempC: 5,
      allergens: ['gluten'],
      packageSizes: [
        { label: '⅙ bbl keg', count: 2 },
        { label: '16 fl oz can', count: 12 },
      ],
      photo: { id: photoId },
    });
    expect(onTap.abvPct).toBeCloseTo(abv(1.062, 1.012), 10);
    expect(soon).toMatchObject({
      state: 'coming_soon',
      abvIsPlanned: true,
      tasting: { tasters: 1, averageScore: 4.5, aroma: 'Bread crust' },
    });
    // Public facts only: nothing from the brewing records rides along.
    expect(Object.keys(onTap)).not.toEqual(expect.arrayContaining(['plan']));
    expect(JSON.stringify(res.body)).not.toContain('Secret Porter');
    expect(res.body.styles).toEqual(['American pale ale', 'Helles']);
  });

  it('searches by words and filters by style and strength', async () => {
    const q = async (query: string) =>
      (await t.as.taproom_manager.get(`/api/taproom/beers?${query}`)).body.beers.map(
        (b: { beerName: string }) => b.beerName,
      );
    expect(await q('q=foghorn')).toEqual(['Foghorn Lager']);
    expect(await q('q=piney')).toEqual(['Breakwater Pale', 'Foghorn Lager']); // both sheets share the test description
    expect(await q('style=Helles')).toEqual(['Foghorn Lager']);
    expect(await q('strength=strong')).toEqual(['Breakwater Pale']);
    expect(await q('q=%25')).toEqual([]); // a literal percent sign, not a wildcard
    expect((await t.as.taproom_manager.get('/api/taproom/beers?strength=huge')).status).toBe(400);
  });

  it('files a beer under the strength band of the ABV it shows (one decimal), not the unrounded figure', async () => {
    // In the other brewery, so its tap list holds only these: each ABV sits just beside a band's edge.
    const onTapAt = async (beerName: string, abvPct: number) => {
      const b = await plannedBatch({ id: other.users.head_brewer.id, breweryId: other.brewery.id });
      const { comingSoon: _, ...sheet } = SHEET;
      await Release.create({
        ...sheet,
        beerName,
        breweryId: other.brewery.id,
        batchId: b.id,
        state: 'on_tap',
        og: 1.05,
        fg: 1.01,
        abvPct,
        abvMethod: 'balling',
        ibu: 30,
        srm: 5,
        releasedAt: new Date(),
        releasedById: other.users.head_brewer.id,
      });
    };
    await onTapAt('Shown 4.5', 4.4999); // shown as 4.5 %
    await onTapAt('Shown 4.4', 4.4449);
    await onTapAt('Shown 6.5', 6.4951);
    await onTapAt('Shown 6.4', 6.449);
    const q = async (strength: string) =>
      (
        (await other.as.taproom_manager.get(`/api/taproom/beers?strength=${strength}`)).body.beers as {
          beerName: string;
        }[]
      )
        .map((b) => b.beerName)
        .sort();
    expect(await q('session')).toEqual(['Shown 4.4']);
    expect(await q('standard')).toEqual(['Shown 4.5', 'Shown 6.4']);
    expect(await q('strong')).toEqual(['Shown 6.5']);
  });

  it('opens one beer for the briefing sheet; a draft or another brewery’s beer answers 404', async () => {
    const list = (await t.as.head_brewer.get('/api/taproom/beers')).body.beers as { id: number; beerName: string }[];
    releaseId = list.find((b) => b.beerName === 'Breakwater Pale')!.id;
    expect((await t.as.taproom_manager.get(`/api/taproom/beers/${releaseId}`)).body.beerName).toBe('Breakwater Pale');
    const { Release } = await import('../../server/models');
    draftId = (await Release.findOne({ where: { batchId: unreleased.id } }))!.id;
    expect((await t.as.taproom_manager.get(`/api/taproom/beers/${draftId}`)).status).toBe(404);
    expect((await other.as.taproom_manager.get(`/api/taproom/beers/${releaseId}`)).status).toBe(404);
  });

  it("fetches the released beer's photo, but no other file of the batch", async () => {
    const photo = await t.as.taproom_manager.get(`/api/attachments/${photoId}/thumbnail`);
    expect(photo.status).toBe(200);
    expect(photo.headers['content-type']).toBe('image/webp');
    expect((await t.as.taproom_manager.get(`/api/attachments/${labSheetId}/file`)).status).toBe(404);
  });
});

describe("the taproom role's access matrix", () => {
  it('cannot read recipes, batches, batch logs, tasting notes, files or release sheets (403)', async () => {
    const tm = t.as.taproom_manager;
    const refused = [
      '/api/recipes',
      '/api/recipes/1',
      '/api/batches',
      `/api/batches/${batch.id}`, // even the released one: the taproom reads its public sheet instead
      `/api/batches/${batch.id}/log`,
      `/api/batches/${batch.id}/log/verify`,
      `/api/batches/${unreleased.id}`,
      `/api/batches/${unreleased.id}/log`,
      `/api/batches/${batch.id}/tasting-notes`,
      `/api/batches/${batch.id}/attachments`,
      `/api/batches/${batch.id}/release`,
      `/api/cellar/batches/${batch.id}`,
      '/api/taproom/releases',
    ];
    for (const path of refused) expect([path, (await tm.get(path)).status]).toEqual([path, 403]);
  });

  it('cannot read an unreleased batch through the taproom either (404)', async () => {
    expect((await t.as.taproom_manager.get(`/api/taproom/beers/${draftId}`)).status).toBe(404);
  });

  it('is refused by every recipe, batch, cellar and vessel route, as declared', () => {
    const brewingSide = routeTable.filter((r) => /^\/api\/(recipes|batches|cellar|vessels)(\/|$)/.test(r.path));
    expect(brewingSide.length).toBeGreaterThan(20);
    const open = brewingSide.filter((r) => can('taproom_manager', r.access));
    expect(open.map((r) => `${r.method} ${r.path}`)).toEqual([]);
  });
});

describe('taking a beer off tap', () => {
  const onTapNames = async () =>
    ((await t.as.taproom_manager.get('/api/taproom/beers')).body.beers as { beerName: string; state: string }[])
      .filter((b) => b.state === 'on_tap')
      .map((b) => b.beerName);

  it('is the head brewer’s to do: the taproom manager and the assistant get 403, and the beer stays on tap', async () => {
    for (const role of ['taproom_manager', 'assistant_brewer'] as const) {
      expect((await t.as[role].post(`/api/batches/${batch.id}/release/off-tap`)).status).toBe(403);
      expect((await t.as[role].post(`/api/batches/${batch.id}/release/back-on-tap`)).status).toBe(403);
    }
    expect(await onTapNames()).toEqual(['Breakwater Pale']);
  });

  it('takes it off the tap list and the bar screen; its sheet, numbers and tasting notes stay', async () => {
    await t.as.head_brewer
      .post(`/api/batches/${batch.id}/tasting-notes`)
      .send({ idempotencyKey: randomUUID(), content: TASTING_CONTENT });
    const res = await t.as.head_brewer.post(`/api/batches/${batch.id}/release/off-tap`);
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body).toMatchObject({
      state: 'off_tap',
      offTapBy: t.users.head_brewer.displayName,
      releasedBy: t.users.head_brewer.displayName,
      sheet: { beerName: 'Breakwater Pale' },
    });
    expect(Date.now() - Date.parse(res.body.offTapAt)).toBeLessThan(60_000);
    expect(res.body.numbers.abvPct).toBeCloseTo(abv(1.062, 1.012), 10);

    expect(await onTapNames()).toEqual([]);
    const list = (await t.as.taproom_manager.get('/api/taproom/beers')).body;
    expect(list.beers.map((b: { beerName: string }) => b.beerName)).toEqual(['Foghorn Lager']);
    expect(list.styles).toEqual(['Helles']);
    expect((await t.as.taproom_manager.get('/api/taproom/beers?strength=strong')).body.beers).toEqual([]);

    // Kept for the record: the briefing sheet still opens, saying so; the batch stays released with its notes.
    const sheet = await t.as.taproom_manager.get(`/api/taproom/beers/${releaseId}`);
    expect(sheet.status).toBe(200);
    expect(sheet.body).toMatchObject({
      state: 'off_tap',
      beerName: 'Breakwater Pale',
      abvIsPlanned: false,
      offTapAt: res.body.offTapAt,
    });
    expect((await t.as.head_brewer.get(`/api/batches/${batch.id}`)).body.status).toBe('released');
    expect((await t.as.head_brewer.get(`/api/batches/${batch.id}/tasting-notes`)).body).not.toHaveLength(0);
    const candidates = (await t.as.head_brewer.get('/api/taproom/releases')).body as {
      batchId: number;
      state: string;
    }[];
    expect(candidates.find((c) => c.batchId === batch.id)?.state).toBe('off_tap');
  });

  it('keeps it off tap when its sheet is saved again, and refuses to release it or take it off twice (409)', async () => {
    const saved = await t.as.head_brewer
      .put(`/api/batches/${batch.id}/release`)
      .send({ ...SHEET, comingSoon: true, servingNotes: 'Last keg gone.' });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    expect(saved.body.state).toBe('off_tap');
    expect((await t.as.head_brewer.post(`/api/batches/${batch.id}/release/off-tap`)).status).toBe(409);
    const publish = await t.as.head_brewer
      .post(`/api/batches/${batch.id}/release/publish`)
      .send({ confirmedOg: 1.062, confirmedFg: 1.012 });
    expect(publish.status).toBe(409);
    expect(publish.body.error.message).toMatch(/off tap/);
  });

  it('puts it back on tap; a beer not on tap cannot be taken off (409)', async () => {
    const back = await t.as.head_brewer.post(`/api/batches/${batch.id}/release/back-on-tap`);
    expect(back.status, JSON.stringify(back.body)).toBe(200);
    expect(back.body).toMatchObject({ state: 'on_tap', offTapAt: null, offTapBy: null });
    expect(await onTapNames()).toEqual(['Breakwater Pale']);
    expect((await t.as.head_brewer.post(`/api/batches/${batch.id}/release/back-on-tap`)).status).toBe(409);
    expect((await t.as.head_brewer.post(`/api/batches/${conditioning.id}/release/off-tap`)).status).toBe(409);
    expect((await t.as.head_brewer.post(`/api/batches/${unreleased.id}/release/off-tap`)).status).toBe(409);
    expect((await other.as.head_brewer.post(`/api/batches/${batch.id}/release/off-tap`)).status).toBe(404);
  });
});
