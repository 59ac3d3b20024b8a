// Reports: the monthly production figures (brewed at knockout, packaged by package, dumped, in tanks at month end)
// and a recipe's batch history, read from the signed log through the real API.
import { beforeAll, describe, expect, it } from 'vitest';
import { apparentAttenuation, achievedEfficiency, lineVolumeL, lToHl, lToUsBbl } from '../../shared/brewing';
import { DEMO_EQUIPMENT, SEASONAL_CONTENT } from '../../server/seed/recipe-data';
import { monthStartUtc } from '../../server/services/reports';
import type { BatchHistory, ProductionReport } from '../../shared/schemas/reports';
import { createTestBrewery, type TestBrewery } from './helpers';
import { writeHeaders } from './batch-fixtures';
import { sequelize } from '../../server/config/database';

let t: TestBrewery;
let other: TestBrewery;
let recipeId: number;
let versionId: number;
const month = new Date().toISOString().slice(0, 7); // the test brewery's time zone is UTC

const ok = (res: { status: number; body: unknown }, status = 200) =>
  expect(res.status, JSON.stringify(res.body)).toBe(status);

/** A batch of the test recipe, knocked out with the given OG and volume, then fermenting. */
async function knockedOut(og: number, volumeL: number): Promise<number> {
  const planned = await t.as.head_brewer
    .post('/api/batches')
    .send({ recipeVersionId: versionId, brewDate: new Date().toISOString().slice(0, 10) });
  ok(planned, 201);
  const id = planned.body.id as number;
  ok(
    await t.as.assistant_brewer
      .post(`/api/batches/${id}/log`)
      .set(writeHeaders())
      .send({ kind: 'step', stepKey: 'knockout-end', label: 'Knockout end', measurements: { gravitySg: og, volumeL } }),
    201,
  );
  ok(await t.as.assistant_brewer.post(`/api/batches/${id}/status`).send({ status: 'fermenting' }));
  return id;
}

const CANS = { kind: 'can' as const, sizeMl: 473, count: 24 };
const KEG = { kind: 'keg' as const, size: 'keg_20l' as const, count: 1 };
let packagedId: number;
let inTankId: number;
let dumpedId: number;

beforeAll(async () => {
  t = await createTestBrewery();
  other = await createTestBrewery();
  const pilot = await t.as.head_brewer.post('/api/equipment').send(DEMO_EQUIPMENT.pilot);
  ok(pilot, 201);
  const recipe = await t.as.head_brewer.post('/api/recipes').send({
    name: 'Report Amber',
    style: 'Spiced amber',
    description: '',
    status: 'active',
    changeNote: 'First',
    equipmentProfileId: pilot.body.id,
    content: SEASONAL_CONTENT,
  });
  ok(recipe, 201);
  recipeId = recipe.body.id;
  versionId = recipe.body.versionId;

  // Packaged: 40 L knocked out, a reading at 1.012, then cans and a 20 L keg in one final run.
  packagedId = await knockedOut(1.056, 40);
  ok(
    await t.as.assistant_brewer
      .post(`/api/cellar/batches/${packagedId}/readings`)
      .set(writeHeaders())
      .send({ kind: 'reading', method: 'hydrometer', sg: 1.012, tempC: 18 }),
    201,
  );
  ok(await t.as.assistant_brewer.post(`/api/batches/${packagedId}/status`).send({ status: 'conditioning' }));
  ok(
    await t.as.assistant_brewer
      .post(`/api/cellar/batches/${packagedId}/packaging`)
      .set(writeHeaders())
      .send({ kind: 'packaging', lines: [CANS, KEG], final: true }),
    201,
  );
  // Still in a tank: 38 L.
  inTankId = await knockedOut(1.05, 38);
  // Dumped: 35 L, nothing packaged.
  dumpedId = await knockedOut(1.052, 35);
  ok(
    await t.as.head_brewer
      .post(`/api/batches/${dumpedId}/status`)
      .send({ status: 'dumped', reason: 'Infected: sour at day 5' }),
  );
});

describe('monthly production', () => {
  it('adds up brewed, packaged by package, dumped and in tanks per beer and in total', async () => {
    const res = await t.as.head_brewer.get(`/api/reports/production?month=${month}`);
    ok(res);
    const report = res.body as ProductionReport;
    const packagedL = lineVolumeL(CANS) + lineVolumeL(KEG); // 24 × 0.473 L + 20 L = 31.352 L
    expect(packagedL).toBeCloseTo(31.352, 9);
    expect(report.beers).toHaveLength(1);
    const beer = report.beers[0]!;
    expect(beer.beerName).toBe('Report Amber');
    expect(beer.brewedL).toBeCloseTo(40 + 38 + 35, 9);
    expect(beer.packagedL).toBeCloseTo(packagedL, 9);
    expect(beer.dumpedL).toBeCloseTo(35, 9);
    expect(beer.inTankL).toBeCloseTo(38, 9);
    expect(report.totals).toEqual({
      brewedL: beer.brewedL,
      packagedL: beer.packagedL,
      dumpedL: beer.dumpedL,
      inTankL: beer.inTankL,
    });
    expect(report.packages).toEqual([
      { beerName: 'Report Amber', kind: 'can', size: '473', count: 24, volumeL: expect.closeTo(24 * 0.473, 9) },
      { beerName: 'Report Amber', kind: 'keg', size: 'keg_20l', count: 1, volumeL: 20 },
    ]);
  });

  it('files a dump in the month it happened, whatever later changes the batch row', async () => {
    await sequelize.query('UPDATE batches SET updated_at = DATE_ADD(UTC_TIMESTAMP(), INTERVAL 62 DAY) WHERE id = ?', {
      replacements: [dumpedId],
    });
    const res = await t.as.head_brewer.get(`/api/reports/production?month=${month}`);
    ok(res);
    expect((res.body as ProductionReport).beers[0]!.dumpedL).toBeCloseTo(35, 9);
    const detail = await t.as.head_brewer.get(`/api/batches/${dumpedId}`);
    expect(detail.body.dumpedAt.slice(0, 7)).toBe(month);
  });

  it('counts nothing in a month before anything was brewed', async () => {
    const res = await t.as.head_brewer.get('/api/reports/production?month=2019-01');
    ok(res);
    expect(res.body.beers).toEqual([]);
    expect(res.body.totals).toEqual({ brewedL: 0, packagedL: 0, dumpedL: 0, inTankL: 0 });
  });

  it('exports CSV in litres, US barrels and hectolitres, saying official forms differ by country', async () => {
    const res = await t.as.head_brewer.get(`/api/reports/production/csv?month=${month}`);
    ok(res);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.headers['content-disposition']).toContain(`production-${month}.csv`);
    const text = res.text;
    expect(text).toContain('Official forms differ by country');
    const total = text
      .split('\r\n')
      .find((l) => l.startsWith('"Total"'))!
      .split(',');
    // 27 CFR 25.11: 1 US beer barrel = 31 US gal; NIST HB 44: 1 gal = 3.785411784 L → 113 L = 0.962951 bbl; 1 hL = 100 L.
    expect(Number(total[1])).toBe(113);
    expect(Number(total[2])).toBeCloseTo(113 / (31 * 3.785411784), 2);
    expect(Number(total[2])).toBe(Math.round(lToUsBbl(113) * 100) / 100);
    expect(Number(total[3])).toBe(Math.round(lToHl(113) * 100) / 100);
    // Packages by the names a person uses, not their stored ids.
    expect(text).toContain('"Report Amber","16 fl oz can",24,');
    expect(text).toContain('"Report Amber","20 L keg",1,20,');
  });

  it('places a month in the brewery’s own time zone', () => {
    // Halifax keeps Atlantic Daylight Time (UTC−3) in June and Atlantic Standard Time (UTC−4) in January (from memory).
    expect(monthStartUtc(2025, 6, 'America/Halifax').toISOString()).toBe('2025-06-01T03:00:00.000Z');
    // Month 13 is January of the next year.
    expect(monthStartUtc(2025, 13, 'America/Halifax').toISOString()).toBe('2026-01-01T04:00:00.000Z');
    expect(monthStartUtc(2025, 6, 'UTC').toISOString()).toBe('2025-06-01T00:00:00.000Z');
  });

  it('refuses a malformed month with a message', async () => {
    const res = await t.as.head_brewer.get('/api/reports/production?month=2025-13');
    expect(res.status).toBe(400);
    expect(res.body.error.fields.month).toMatch(/YYYY-MM/);
  });
});

describe('a batch knocked out last month and packaged this month', () => {
  it('counts in last month’s tanks at the month’s end, and in this month’s packaging', async () => {
    const now = new Date();
    const lastMonthMid = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth() - 1, 15, 12));
    const previous = lastMonthMid.toISOString().slice(0, 7);
    const before = (await t.as.head_brewer.get(`/api/reports/production?month=${previous}`)).body as ProductionReport;
    const planned = await t.as.head_brewer
      .post('/api/batches')
      .send({ recipeVersionId: versionId, brewDate: lastMonthMid.toISOString().slice(0, 10) });
    ok(planned, 201);
    const id = planned.body.id as number;
    ok(
      await t.as.assistant_brewer
        .post(`/api/batches/${id}/log`)
        .set(writeHeaders({ capturedAt: lastMonthMid }))
        .send({
          kind: 'step',
          stepKey: 'knockout-end',
          label: 'Knockout end',
          measurements: { gravitySg: 1.054, volumeL: 30 },
        }),
      201,
    );
    ok(await t.as.assistant_brewer.post(`/api/batches/${id}/status`).send({ status: 'fermenting' }));
    ok(
      await t.as.assistant_brewer
        .post(`/api/cellar/batches/${id}/packaging`)
        .set(writeHeaders())
        .send({ kind: 'packaging', lines: [KEG], final: true }),
      201,
    );

    const last = (await t.as.head_brewer.get(`/api/reports/production?month=${previous}`)).body as ProductionReport;
    expect(last.totals.brewedL - before.totals.brewedL).toBeCloseTo(30, 9);
    expect(last.totals.inTankL - before.totals.inTankL).toBeCloseTo(30, 9);
    expect(last.totals.packagedL - before.totals.packagedL).toBeCloseTo(0, 9);
    const current = (await t.as.head_brewer.get(`/api/reports/production?month=${month}`)).body as ProductionReport;
    expect(current.totals.packagedL).toBeCloseTo(lineVolumeL(CANS) + 2 * lineVolumeL(KEG), 9);
  });
});

describe('batch history', () => {
  it('lists each batch of the recipe, newest first, planned against actual', async () => {
    const res = await t.as.assistant_brewer.get(`/api/reports/history?recipeId=${recipeId}`);
    ok(res);
    const history = res.body as BatchHistory;
    expect(history.recipeName).toBe('Report Amber');
    expect(history.rows.map((r) => r.batchId).filter((id) => [dumpedId, inTankId, packagedId].includes(id))).toEqual([
      dumpedId,
      inTankId,
      packagedId,
    ]);
    const row = history.rows.find((r) => r.batchId === packagedId)!;
    expect(row.actualOg).toBe(1.056);
    // Apparent attenuation (OG − FG)/(OG − 1): (1.056 − 1.012)/0.056 = 0.7857 (Palmer, How to Brew, 4th ed.).
    expect(row.apparentAttenuation).toBeCloseTo(0.7857, 4);
    expect(row.apparentAttenuation).toBeCloseTo(apparentAttenuation(1.056, 1.012), 12);
    expect(row.daysBrewToPackage).toBe(0);
    const detail = await t.as.head_brewer.get(`/api/batches/${packagedId}`);
    const plan = detail.body.plan ?? detail.body;
    expect(row.plannedOg).toBeCloseTo(plan.computed?.og ?? row.plannedOg, 12);
    expect(row.actualEfficiency).toBeCloseTo(
      achievedEfficiency({
        plannedEfficiency: row.plannedEfficiency,
        plannedOg: row.plannedOg,
        plannedVolumeL: plan.computed?.volumes?.knockoutL ?? 0,
        actualOg: 1.056,
        actualVolumeL: 40,
      }),
      9,
    );
    expect(history.rows.find((r) => r.batchId === inTankId)!.daysBrewToPackage).toBeNull();
  });

  it('takes a corrected reading as the final gravity', async () => {
    const posted = await t.as.assistant_brewer
      .post(`/api/cellar/batches/${inTankId}/readings`)
      .set(writeHeaders())
      .send({ kind: 'reading', method: 'hydrometer', sg: 1.1, tempC: 18 });
    ok(posted, 201);
    ok(
      await t.as.assistant_brewer
        .post(`/api/batches/${inTankId}/log`)
        .set(writeHeaders())
        .send({
          kind: 'correction',
          correctsEntryId: posted.body.logEntryId,
          reason: 'Typed 1.100 for 1.010',
          measurements: { gravitySg: 1.01 },
        }),
      201,
    );
    const res = await t.as.head_brewer.get(`/api/reports/history?recipeId=${recipeId}`);
    ok(res);
    // (1.050 − 1.010)/(1.050 − 1) = 0.8, by the same formula as above.
    expect((res.body as BatchHistory).rows.find((r) => r.batchId === inTankId)!.apparentAttenuation).toBeCloseTo(
      0.8,
      9,
    );
  });

  it('answers 404 for another brewery’s recipe', async () => {
    const res = await other.as.head_brewer.get(`/api/reports/history?recipeId=${recipeId}`);
    expect(res.status).toBe(404);
  });
});

describe('who may read reports', () => {
  it('lets only the head brewer file production figures; the assistant reads history; the taproom neither', async () => {
    expect((await t.as.assistant_brewer.get(`/api/reports/production?month=${month}`)).status).toBe(403);
    expect((await t.as.assistant_brewer.get(`/api/reports/production/csv?month=${month}`)).status).toBe(403);
    expect((await t.as.taproom_manager.get(`/api/reports/production?month=${month}`)).status).toBe(403);
    expect((await t.as.taproom_manager.get(`/api/reports/history?recipeId=${recipeId}`)).status).toBe(403);
  });
});

describe('a corrected knockout', () => {
  it('counts the corrected litres and OG, the latest correction of each winning', async () => {
    const c = await createTestBrewery();
    const pilot = await c.as.head_brewer.post('/api/equipment').send(DEMO_EQUIPMENT.pilot);
    ok(pilot, 201);
    const recipe = await c.as.head_brewer.post('/api/recipes').send({
      name: 'Corrected Amber',
      style: 'Spiced amber',
      description: '',
      status: 'active',
      changeNote: 'First',
      equipmentProfileId: pilot.body.id,
      content: SEASONAL_CONTENT,
    });
    ok(recipe, 201);
    const planned = await c.as.head_brewer
      .post('/api/batches')
      .send({ recipeVersionId: recipe.body.versionId, brewDate: new Date().toISOString().slice(0, 10) });
    ok(planned, 201);
    const id = planned.body.id as number;
    const log = (body: object) => c.as.assistant_brewer.post(`/api/batches/${id}/log`).set(writeHeaders()).send(body);
    const knockout = await log({
      kind: 'step',
      stepKey: 'knockout-end',
      label: 'Knockout end',
      measurements: { gravitySg: 1.05, volumeL: 40 },
    });
    ok(knockout, 201);
    const correct = (measurements: object) =>
      log({
        kind: 'correction',
        correctsEntryId: knockout.body.id,
        reason: 'Read the sight glass again',
        measurements,
      });
    ok(await correct({ volumeL: 41 }), 201);
    ok(await correct({ gravitySg: 1.052 }), 201);
    ok(await correct({ volumeL: 42 }), 201);

    const report = (await c.as.head_brewer.get(`/api/reports/production?month=${month}`)).body as ProductionReport;
    expect(report.totals.brewedL).toBe(42);
    expect(report.totals.inTankL).toBe(42);
    const history = (await c.as.head_brewer.get(`/api/reports/history?recipeId=${recipe.body.id}`))
      .body as BatchHistory;
    const row = history.rows.find((r) => r.batchId === id)!;
    expect(row.actualOg).toBe(1.052);
    const detail = await c.as.head_brewer.get(`/api/batches/${id}`);
    const plan = detail.body.plan ?? detail.body;
    expect(row.actualEfficiency).toBeCloseTo(
      achievedEfficiency({
        plannedEfficiency: row.plannedEfficiency,
        plannedOg: row.plannedOg,
        plannedVolumeL: plan.computed?.volumes?.knockoutL ?? 0,
        actualOg: 1.052,
        actualVolumeL: 42,
      }),
      9,
    );
  });
});
