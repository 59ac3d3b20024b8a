// Planning a batch: a recipe version on an equipment profile or at a typed volume, the plan frozen into the batch.
import { beforeAll, describe, expect, it } from 'vitest';
import { sequelize } from '../../server/config/database';
import { EquipmentProfile, RecipeVersion, Vessel } from '../../server/models';
import { seedRecipes } from '../../server/seed/recipes';
import { computeRecipe, usBblToL } from '../../shared/brewing';
import type { BatchList } from '../../shared/schemas/batches';
import { plannedBatch, writeHeaders } from './batch-fixtures';
import { createTestBrewery, type TestBrewery } from './helpers';

let t: TestBrewery;
let other: TestBrewery;
let version: RecipeVersion;
let bigProfile: EquipmentProfile;

beforeAll(async () => {
  t = await createTestBrewery();
  other = await createTestBrewery();
  // The demo recipes and brewhouses, written into this test brewery.
  await sequelize.transaction((transaction) => seedRecipes({ brewery: t.brewery, users: t.users, transaction }));
  version = (await RecipeVersion.findOne({ where: { breweryId: t.brewery.id }, order: [['id', 'ASC']] }))!;
  bigProfile = (
    await EquipmentProfile.findAll({ where: { breweryId: t.brewery.id }, order: [['batchVolumeL', 'DESC']] })
  )[0]!;
});

describe('planning a batch', () => {
  it('freezes the scaled plan into the batch and the recipe version, numbered per brewery and year', async () => {
    const res = await t.as.head_brewer
      .post('/api/batches')
      .send({ recipeVersionId: version.id, equipmentProfileId: bigProfile.id, brewDate: '2026-12-03' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      number: '2026-001',
      status: 'planned',
      recipeVersionId: version.id,
      entries: [],
      signatures: [],
    });
    // The frozen plan's numbers are shared/brewing's for its own recipe and equipment.
    const { plan } = res.body;
    expect(plan.equipment.batchVolumeL).toBeCloseTo(bigProfile.batchVolumeL, 6);
    expect(plan.computed.og).toBeCloseTo(computeRecipe(plan.recipe, plan.equipment).og, 12);
    expect(res.body.plannedOg).toBeCloseTo(plan.computed.og, 12);
    expect((await RecipeVersion.findByPk(version.id))!.frozenAt).not.toBeNull();

    const second = await t.as.head_brewer
      .post('/api/batches')
      .send({ recipeVersionId: version.id, batchVolumeL: 500, brewDate: '2026-12-09' });
    expect(second.body.number).toBe('2026-002');
    expect(second.body.plan.equipment.batchVolumeL).toBe(500);
    const nextYear = await t.as.head_brewer
      .post('/api/batches')
      .send({ recipeVersionId: version.id, batchVolumeL: 500, brewDate: '2027-01-04' });
    expect(nextYear.body.number).toBe('2027-001');
  });

  it('puts the batch into the chosen fermenter; a fermenter holding a batch answers 409', async () => {
    const fv = await Vessel.create({
      breweryId: t.brewery.id,
      name: 'FV-test',
      type: 'fermenter',
      capacityL: 1400,
      ratedPressureKpa: 103,
      status: 'clean',
      currentBatchId: null,
    });
    const first = await t.as.head_brewer
      .post('/api/batches')
      .send({ recipeVersionId: version.id, brewDate: '2026-12-11', fermenterId: fv.id });
    expect(first.body.vessel).toEqual({ id: fv.id, name: 'FV-test' });
    const second = await t.as.head_brewer
      .post('/api/batches')
      .send({ recipeVersionId: version.id, brewDate: '2026-12-12', fermenterId: fv.id });
    expect(second.status).toBe(409);
    expect(second.body.error.message).toMatch(/FV-test already holds batch/);
  });

  it('refuses a fermenter smaller than the batch, when planning and when assigning (422), and accepts one still to be cleaned', async () => {
    // 1 US bbl = 117.348 L (27 CFR 25.11). The test brewery is a US brewery, as the demo is.
    const small = await Vessel.create({
      breweryId: t.brewery.id,
      name: 'FV-small',
      type: 'fermenter',
      capacityL: usBblToL(3.5),
      ratedPressureKpa: 103,
      status: 'clean',
      currentBatchId: null,
    });
    const dirty = await Vessel.create({
      breweryId: t.brewery.id,
      name: 'FV-dirty',
      type: 'fermenter',
      capacityL: usBblToL(20),
      ratedPressureKpa: 103,
      status: 'needs_cleaning',
      currentBatchId: null,
    });
    const tenBbl = { recipeVersionId: version.id, batchVolumeL: usBblToL(10), brewDate: '2026-12-14' };
    const refused = await t.as.head_brewer.post('/api/batches').send({ ...tenBbl, fermenterId: small.id });
    expect(refused.status).toBe(422);
    expect(refused.body.error.message).toMatch(
      /^FV-small holds (3\.5 bbl|350 L), but this batch runs (10\.0 bbl|11\.7 hL) into the fermenter at knockout\. Choose a larger fermenter\.$/,
    );
    expect((await Vessel.findByPk(small.id))!.currentBatchId).toBeNull();

    const planned = await t.as.head_brewer.post('/api/batches').send(tenBbl);
    expect(planned.status).toBe(201);
    const assign = await t.as.assistant_brewer
      .put(`/api/batches/${planned.body.id}/vessel`)
      .send({ vesselId: small.id });
    expect(assign.status).toBe(422);
    expect(assign.body.error.message).toMatch(/^FV-small holds/);
    const intoDirty = await t.as.assistant_brewer
      .put(`/api/batches/${planned.body.id}/vessel`)
      .send({ vesselId: dirty.id });
    expect(intoDirty.status).toBe(200);
  });

  it('previews what planning would freeze: recipe, version, brewhouse, volume and what the fermenter must hold', async () => {
    const res = await t.as.head_brewer.get(`/api/batches/plan-preview?recipeVersionId=${version.id}&batchVolumeL=500`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ versionNumber: version.number, batchVolumeL: 500, fermenterFillL: 500 });
    expect(res.body.recipeName).toEqual(expect.any(String));
    expect(res.body.equipmentName).toEqual(expect.any(String));
    expect((await t.as.assistant_brewer.get(`/api/batches/plan-preview?recipeVersionId=${version.id}`)).status).toBe(
      403,
    );
    expect((await other.as.head_brewer.get(`/api/batches/plan-preview?recipeVersionId=${version.id}`)).status).toBe(
      404,
    );
  });

  it('lets only the head brewer dump a batch (403 for the assistant); other moves stay open to both', async () => {
    const planned = await t.as.head_brewer
      .post('/api/batches')
      .send({ recipeVersionId: version.id, brewDate: '2026-12-15' });
    const id = planned.body.id as number;
    const refused = await t.as.assistant_brewer
      .post(`/api/batches/${id}/status`)
      .send({ status: 'dumped', reason: 'Infected' });
    expect(refused.status).toBe(403);
    expect(refused.body.error.message).toMatch(/^Only the head brewer can dump a batch/);
    expect((await t.as.assistant_brewer.post(`/api/batches/${id}/status`).send({ status: 'brewing' })).status).toBe(
      200,
    );
    const dumped = await t.as.head_brewer
      .post(`/api/batches/${id}/status`)
      .send({ status: 'dumped', reason: 'Infected' });
    expect(dumped.status).toBe(200);
    expect(dumped.body.status).toBe('dumped');
    // Another brewery's batch stays a 404, whoever asks.
    expect(
      (await other.as.assistant_brewer.post(`/api/batches/${id}/status`).send({ status: 'dumped', reason: 'Infected' }))
        .status,
    ).toBe(404);
  });

  it('later changes to the recipe never change a planned batch', async () => {
    const planned = await t.as.head_brewer
      .post('/api/batches')
      .send({ recipeVersionId: version.id, brewDate: '2026-12-10' });
    const before = planned.body.plan;
    const content = structuredClone(version.content);
    content.targets.batchVolumeL *= 2;
    await RecipeVersion.update({ content }, { where: { id: version.id } });
    const after = await t.as.head_brewer.get(`/api/batches/${planned.body.id}`);
    expect(after.body.plan).toEqual(before);
  });

  it('refuses another brewery’s recipe version (404) and bad input (400 with field messages)', async () => {
    expect(
      (await other.as.head_brewer.post('/api/batches').send({ recipeVersionId: version.id, brewDate: '2026-12-03' }))
        .status,
    ).toBe(404);
    const bad = await t.as.head_brewer
      .post('/api/batches')
      .send({ recipeVersionId: version.id, batchVolumeL: -3, brewDate: 'someday' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toMatchObject({
      // 1 L = 0.264 gal (NIST Handbook 44), stated as the 0.3 gal the field accepts, to a US brewery.
      batchVolumeL: 'Batch volume must be at least 0.3 gal',
      brewDate: expect.any(String),
    });
  });
});

describe('the batch list', () => {
  it('pages newest first with the total, and shows the OG measured at knockout as corrected', async () => {
    const u = await createTestBrewery();
    const actor = { id: u.users.head_brewer.id, breweryId: u.brewery.id };
    const older = await plannedBatch(actor, '2026-10-01');
    const newer = await plannedBatch(actor, '2026-10-02');
    const log = (batchId: number, body: object) =>
      u.as.assistant_brewer.post(`/api/batches/${batchId}/log`).set(writeHeaders()).send(body);
    const listed = async (query = '') => {
      const res = await u.as.assistant_brewer.get(`/api/batches${query}`);
      expect(res.status).toBe(200);
      return res.body as BatchList;
    };
    const ogOf = async (id: number) => (await listed()).items.find((i) => i.id === id)!.actualOg;

    const first = await listed();
    expect(first).toMatchObject({ total: 2, page: 1, pageSize: 50 });
    expect(first.items.map((i) => [i.id, i.brewDate, i.actualOg, i.vessel])).toEqual([
      [newer.id, '2026-10-02', null, null],
      [older.id, '2026-10-01', null, null],
    ]);
    expect(first.items[0]!.plannedOg).toBe(newer.plannedOg);

    const mashIn = await log(older.id, {
      kind: 'step',
      stepKey: 'mash-in',
      label: 'Mash in',
      measurements: { tempC: 66 },
    });
    const knockout = await log(older.id, {
      kind: 'step',
      stepKey: 'knockout-end',
      label: 'Knockout end',
      measurements: { gravitySg: 1.061, volumeL: 38 },
    });
    expect(knockout.status).toBe(201);
    expect(await ogOf(older.id)).toBe(1.061);
    expect(await ogOf(newer.id)).toBeNull();

    const correct = (id: number, measurements: object) =>
      log(older.id, { kind: 'correction', correctsEntryId: id, reason: 'Refractometer re-read', measurements });
    expect((await correct(knockout.body.id, { gravitySg: 1.058 })).status).toBe(201);
    expect(await ogOf(older.id)).toBe(1.058);
    // A correction of the volume alone, or of another entry, leaves the OG as corrected.
    await correct(knockout.body.id, { volumeL: 37 });
    await correct(mashIn.body.id, { tempC: 65, gravitySg: 1.09 });
    expect(await ogOf(older.id)).toBe(1.058);
    // The batch's own page says the same.
    expect((await u.as.head_brewer.get(`/api/batches/${older.id}`)).body.actuals.og.actual).toBe(1.058);
    // A later knockout reading is the one shown.
    await log(older.id, {
      kind: 'measurement',
      stepKey: 'knockout-end',
      label: 'Knockout end, re-measured',
      measurements: { gravitySg: 1.06 },
    });
    expect(await ogOf(older.id)).toBe(1.06);

    expect((await listed('?status=brewing')).items.map((i) => i.id)).toEqual([older.id]);
    expect(await listed('?page=2')).toMatchObject({ items: [], total: 2, page: 2 });
    // Another brewery sees none of them.
    expect((await other.as.head_brewer.get('/api/batches')).body.items.map((i: { id: number }) => i.id)).not.toContain(
      older.id,
    );
  });
});
