// Recipes: create, edit, version, freeze, compare, validation, scaling, batch plans, roles and brewery scoping.
import { beforeAll, describe, expect, it } from 'vitest';
import { computeRecipe, scaleRecipe, usBblToL, usGalToL } from '../../shared/brewing';
import { equipmentAtVolume, toRecipeInput, type RecipeVersionContent } from '../../shared/schemas/recipes';
import { DEMO_EQUIPMENT, SEASONAL_CONTENT } from '../../server/seed/recipe-data';
import { freezeRecipeVersion, planForBatch } from '../../server/services/recipe-plans';
import { createTestBrewery, type TestBrewery } from './helpers';
import { sequelize } from '../../server/config/database';
import { Brewery, Ingredient } from '../../server/models';
import { up as addStarterLibraries } from '../../server/migrations/0953-starter-ingredients';
import { STARTER_INGREDIENTS } from '../../server/services/starter-ingredients';

let t: TestBrewery;
let other: TestBrewery;
const equipmentIds = {} as Record<keyof typeof DEMO_EQUIPMENT, number>;

async function addEquipment(who: TestBrewery) {
  const ids = {} as Record<keyof typeof DEMO_EQUIPMENT, number>;
  for (const [key, profile] of Object.entries(DEMO_EQUIPMENT) as [
    keyof typeof DEMO_EQUIPMENT,
    (typeof DEMO_EQUIPMENT)['pilot'],
  ][]) {
    const res = await who.as.head_brewer.post('/api/equipment').send(profile);
    expect(res.status).toBe(201);
    ids[key] = res.body.id;
  }
  return ids;
}

async function createSeasonal(name = 'Quince test'): Promise<{ recipeId: number; versionId: number }> {
  const res = await t.as.head_brewer.post('/api/recipes').send({
    name,
    style: 'Spiced amber',
    description: '',
    status: 'draft',
    changeNote: 'Pilot recipe',
    equipmentProfileId: equipmentIds.pilot,
    content: SEASONAL_CONTENT,
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return { recipeId: res.body.id, versionId: res.body.versionId };
}

beforeAll(async () => {
  t = await createTestBrewery();
  other = await createTestBrewery();
  Object.assign(equipmentIds, await addEquipment(t));
});

describe('recipes API', () => {
  it('creates a recipe with version 1 and stores the figures shared/brewing computes', async () => {
    const { recipeId, versionId } = await createSeasonal('Created test');
    const expected = computeRecipe(
      toRecipeInput('Created test', SEASONAL_CONTENT),
      equipmentAtVolume(DEMO_EQUIPMENT.pilot, usGalToL(10)),
    );
    const list = await t.as.assistant_brewer.get('/api/recipes');
    expect(list.status).toBe(200);
    const row = list.body.find((r: { id: number }) => r.id === recipeId);
    expect(row).toMatchObject({ latestVersion: 1, latestVersionId: versionId, status: 'draft' });
    expect(row.og).toBeCloseTo(expected.og, 10);
    expect(row.ibu).toBeCloseTo(expected.ibu, 10);
    expect(row.srm).toBeCloseTo(expected.srm, 10);
    expect(row.abvPct).toBeCloseTo(expected.abvPct, 10);
    const detail = await t.as.head_brewer.get(`/api/recipes/${recipeId}/versions/${versionId}`);
    expect(detail.status).toBe(200);
    expect(detail.body.version.content).toEqual(SEASONAL_CONTENT);
    expect(detail.body.computed.ibu).toBeCloseTo(expected.ibu, 10);
  });

  it('edits an unfrozen version in place, then refuses once a batch has used it, and saves the next version instead', async () => {
    const { recipeId, versionId } = await createSeasonal('Freeze test');
    const edited: RecipeVersionContent = {
      ...SEASONAL_CONTENT,
      hops: [{ ...SEASONAL_CONTENT.hops[0]!, weightG: 80 }, SEASONAL_CONTENT.hops[1]!],
    };
    const patch = await t.as.head_brewer
      .patch(`/api/recipes/${recipeId}/versions/${versionId}`)
      .send({ changeNote: 'More bittering', equipmentProfileId: equipmentIds.pilot, content: edited });
    expect(patch.status).toBe(200);
    expect(patch.body).toEqual({ id: versionId, number: 1 });
    const after = await t.as.head_brewer.get(`/api/recipes/${recipeId}/versions/${versionId}`);
    expect(after.body.version.content.hops[0].weightG).toBe(80);

    await freezeRecipeVersion(t.brewery.id, versionId);
    const refused = await t.as.head_brewer
      .patch(`/api/recipes/${recipeId}/versions/${versionId}`)
      .send({ changeNote: 'Even more', equipmentProfileId: equipmentIds.pilot, content: SEASONAL_CONTENT });
    expect(refused.status).toBe(409);
    expect(refused.body.error.message).toMatch(/used by a batch/);
    const kept = await t.as.head_brewer.get(`/api/recipes/${recipeId}/versions/${versionId}`);
    expect(kept.body.version.content.hops[0].weightG).toBe(80);
    expect(kept.body.version.frozenAt).not.toBeNull();

    const next = await t.as.head_brewer.post(`/api/recipes/${recipeId}/versions`).send({
      changeNote: 'Back to the pilot hop rate',
      equipmentProfileId: equipmentIds.pilot,
      content: SEASONAL_CONTENT,
    });
    expect(next.status).toBe(201);
    expect(next.body.number).toBe(2);
    const recipe = await t.as.assistant_brewer.get(`/api/recipes/${recipeId}`);
    expect(recipe.body.versions.map((v: { number: number; changeNote: string }) => [v.number, v.changeNote])).toEqual([
      [2, 'Back to the pilot hop rate'],
      [1, 'More bittering'],
    ]);
    expect(recipe.body.versions[1].frozenAt).not.toBeNull();
    expect(recipe.body.versions[0].frozenAt).toBeNull();
    const list = await t.as.head_brewer.get('/api/recipes');
    // Freezing is what planning a batch does; nothing has been brewed yet, so nothing is 'last brewed'.
    expect(list.body.find((r: { id: number }) => r.id === recipeId).lastBrewedAt).toBeNull();
  });

  it('drops the boil minute of an adjunct that goes in the fermenter, so the brew sheet never times it', async () => {
    const moved: RecipeVersionContent = {
      ...SEASONAL_CONTENT,
      adjuncts: [{ ...SEASONAL_CONTENT.adjuncts[0]!, stage: 'fermenter', boilMinutes: 15 }],
    };
    const res = await t.as.head_brewer.post('/api/recipes').send({
      name: 'Fermenter fruit',
      style: '',
      description: '',
      status: 'draft',
      changeNote: 'Fruit to the fermenter',
      equipmentProfileId: equipmentIds.pilot,
      content: moved,
    });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const detail = await t.as.head_brewer.get(`/api/recipes/${res.body.id}/versions/${res.body.versionId}`);
    expect(detail.body.version.content.adjuncts[0].stage).toBe('fermenter');
    expect(detail.body.version.content.adjuncts[0]).not.toHaveProperty('boilMinutes');
    expect(toRecipeInput('x', moved).adjuncts[0]).not.toHaveProperty('boilMinutes');
  });

  it('stores the solved weight of a hop written as a share of the target IBU', async () => {
    const { recipeId, versionId } = await createSeasonal('Share test');
    const content: RecipeVersionContent = {
      ...SEASONAL_CONTENT,
      hops: [{ ...SEASONAL_CONTENT.hops[0]!, ibuSharePct: 75, weightG: 0 }, SEASONAL_CONTENT.hops[1]!],
    };
    const res = await t.as.head_brewer
      .patch(`/api/recipes/${recipeId}/versions/${versionId}`)
      .send({ changeNote: 'Bittering by share', equipmentProfileId: equipmentIds.pilot, content });
    expect(res.status).toBe(200);
    const v = await t.as.head_brewer.get(`/api/recipes/${recipeId}/versions/${versionId}`);
    // 75 % of the 24 IBU target (Tinseth inverted; shared/brewing/hop-shares.test.ts).
    expect(v.body.computed.hops[0].ibu).toBeCloseTo(18, 9);
    expect(v.body.version.content.hops[0]).toMatchObject({ ibuSharePct: 75 });
    expect(v.body.version.content.hops[0].weightG).toBeCloseTo(v.body.computed.hops[0].weightG, 9);
    expect(v.body.version.content.hops[0].weightG).toBeGreaterThan(0);
  });

  it('answers a version’s numbers for its brewhouse as it is now, after the profile or the version changes', async () => {
    const profile = { ...DEMO_EQUIPMENT.pilot, name: 'Pilot kit (numbers test)' };
    const equipmentId = (await t.as.head_brewer.post('/api/equipment').send(profile)).body.id as number;
    const created = await t.as.head_brewer.post('/api/recipes').send({
      name: 'Numbers test',
      style: 'Spiced amber',
      description: '',
      status: 'draft',
      changeNote: 'Pilot recipe',
      equipmentProfileId: equipmentId,
      content: SEASONAL_CONTENT,
    });
    const url = `/api/recipes/${created.body.id}/versions/${created.body.versionId}`;
    const expected = (content: RecipeVersionContent, efficiency: number) =>
      computeRecipe(
        toRecipeInput('Numbers test', content),
        equipmentAtVolume({ ...profile, brewhouseEfficiency: efficiency }, usGalToL(10)),
      );

    const before = await t.as.head_brewer.get(url);
    expect(before.body.computed.og).toBeCloseTo(expected(SEASONAL_CONTENT, 0.7).og, 12);
    // Asked again: the same answer.
    expect((await t.as.head_brewer.get(url)).body.computed).toEqual(before.body.computed);

    expect(
      (await t.as.head_brewer.put(`/api/equipment/${equipmentId}`).send({ ...profile, brewhouseEfficiency: 0.8 }))
        .status,
    ).toBe(200);
    const better = await t.as.head_brewer.get(url);
    expect(better.body.computed.og).toBeCloseTo(expected(SEASONAL_CONTENT, 0.8).og, 12);
    expect(better.body.computed.og).toBeGreaterThan(before.body.computed.og);

    const edited: RecipeVersionContent = {
      ...SEASONAL_CONTENT,
      hops: [{ ...SEASONAL_CONTENT.hops[0]!, weightG: 90 }, SEASONAL_CONTENT.hops[1]!],
    };
    expect(
      (
        await t.as.head_brewer
          .patch(url)
          .send({ changeNote: 'More bittering', equipmentProfileId: equipmentId, content: edited })
      ).status,
    ).toBe(200);
    const bitterer = await t.as.head_brewer.get(url);
    expect(bitterer.body.computed.ibu).toBeCloseTo(expected(edited, 0.8).ibu, 12);
    expect(bitterer.body.computed.ibu).toBeGreaterThan(better.body.computed.ibu);

    // Back to the first profile and content: the first numbers again.
    await t.as.head_brewer.put(`/api/equipment/${equipmentId}`).send(profile);
    await t.as.head_brewer
      .patch(url)
      .send({ changeNote: 'Pilot recipe', equipmentProfileId: equipmentId, content: SEASONAL_CONTENT });
    expect((await t.as.head_brewer.get(url)).body.computed).toEqual(before.body.computed);
  });

  it('compares two versions and lists exactly what changed', async () => {
    const { recipeId, versionId: v1 } = await createSeasonal('Compare test');
    const changed: RecipeVersionContent = {
      ...SEASONAL_CONTENT,
      hops: [{ ...SEASONAL_CONTENT.hops[0]!, weightG: 70 }, SEASONAL_CONTENT.hops[1]!],
      fermentation: { ...SEASONAL_CONTENT.fermentation, crashTempC: 2 },
    };
    const v2 = (
      await t.as.head_brewer
        .post(`/api/recipes/${recipeId}/versions`)
        .send({ changeNote: 'Tweak', equipmentProfileId: equipmentIds.pilot, content: changed })
    ).body.id;
    const res = await t.as.assistant_brewer.get(`/api/recipes/${recipeId}/compare?a=${v1}&b=${v2}`);
    expect(res.status).toBe(200);
    const paths = res.body.differences.map((d: { path: string }) => d.path);
    expect(paths).toEqual(
      expect.arrayContaining([
        'changeNote',
        'content.hops.0.weightG',
        'content.fermentation.crashTempC',
        'computed.ibu',
        'computed.buGu',
      ]),
    );
    expect(paths).not.toContain('computed.og');
    expect(paths).toHaveLength(5);
    expect(res.body.differences.find((d: { path: string }) => d.path === 'content.hops.0.weightG')).toEqual({
      path: 'content.hops.0.weightG',
      a: 66,
      b: 70,
    });
  });

  it('answers 400 with a message per field for bad input, and loses nothing', async () => {
    const bad = {
      name: '',
      style: 'x',
      description: '',
      status: 'brewing',
      changeNote: 'x',
      equipmentProfileId: equipmentIds.pilot,
      content: {
        ...SEASONAL_CONTENT,
        hops: [{ ...SEASONAL_CONTENT.hops[0]!, alphaAcidPct: 45 }],
        targets: { ...SEASONAL_CONTENT.targets, og: 'high' },
      },
    };
    const res = await t.as.head_brewer.post('/api/recipes').send(bad);
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toMatchObject({
      name: 'Enter the recipe name',
      status: expect.any(String),
      'content.hops.0.alphaAcidPct': 'Alpha acid must be at most 30 %',
      'content.targets.og': 'Target OG: enter a number',
    });
    const whirlpool = await t.as.head_brewer.post('/api/recipes').send({
      ...bad,
      name: 'Whirlpool',
      status: 'draft',
      content: {
        ...SEASONAL_CONTENT,
        hops: [{ name: 'X', alphaAcidPct: 10, form: 'pellet', use: 'whirlpool', minutes: 20, weightG: 10 }],
      },
    });
    expect(whirlpool.status).toBe(400);
    expect(whirlpool.body.error.fields['content.hops.0.whirlpoolTempC']).toBe(
      'A whirlpool addition needs its stand temperature',
    );
    const list = await t.as.head_brewer.get('/api/recipes');
    expect(list.body.map((r: { name: string }) => r.name)).not.toContain('Whirlpool');
    const badScale = await t.as.head_brewer.get(`/api/recipes/1/versions/1/scale?batchVolumeL=lots`);
    expect(badScale.status).toBe(400);
    expect(badScale.body.error.fields.batchVolumeL).toBe('Batch volume: enter a number');
  });

  it("scales the pilot seasonal to 10 bbl with exactly shared/brewing's numbers, and saves it as the next version", async () => {
    const { recipeId, versionId } = await createSeasonal('Scale test');
    const res = await t.as.assistant_brewer.get(
      `/api/recipes/${recipeId}/versions/${versionId}/scale?equipmentProfileId=${equipmentIds.big}`,
    );
    expect(res.status).toBe(200);
    const expected = scaleRecipe(
      toRecipeInput('Scale test', SEASONAL_CONTENT),
      equipmentAtVolume(DEMO_EQUIPMENT.pilot, usGalToL(10)),
      equipmentAtVolume(DEMO_EQUIPMENT.big, usBblToL(10)),
    );
    expect(res.body.scaled).toEqual(JSON.parse(JSON.stringify(expected)));
    // The quince: 0.6 lb per US gal × 310 gal = 186 lb (dose rule × volume; NIST HB 44 lb and gal).
    expect(res.body.scaled.after.adjuncts[0].amount.value).toBeCloseTo(0.6 * 310 * 0.45359237, 6);
    // The spice blend: 1 tsp per 5 gal × 310 gal = 62 tsp.
    expect(res.body.scaled.after.adjuncts[1].measuredUs).toEqual({ value: 62, unit: 'tsp' });
    expect(res.body.scaled.after.ibu).toBeCloseTo(res.body.scaled.before.ibu, 6);

    const saved = await t.as.head_brewer
      .post(`/api/recipes/${recipeId}/versions/${versionId}/scaled`)
      .send({ changeNote: 'Scaled to the 10 bbl', equipmentProfileId: equipmentIds.big });
    expect(saved.status).toBe(201);
    expect(saved.body.number).toBe(2);
    const v2 = await t.as.head_brewer.get(`/api/recipes/${recipeId}/versions/${saved.body.id}`);
    expect(v2.body.version.equipmentProfileId).toBe(equipmentIds.big);
    expect(v2.body.version.content.targets.batchVolumeL).toBeCloseTo(usBblToL(10), 9);
    expect(v2.body.computed.ibu).toBeCloseTo(expected.after.ibu, 9);
    expect(v2.body.computed.og).toBeCloseTo(expected.after.og, 9);
    expect(v2.body.version.content.hops[0].weightG).toBeCloseTo(expected.recipe.hops[0]!.weightG, 9);
  });

  it('plans a batch from a version: scaled recipe, computed figures, changes and the full content', async () => {
    const { recipeId, versionId } = await createSeasonal('Plan test');
    const plan = await planForBatch(t.brewery.id, { recipeVersionId: versionId, equipmentProfileId: equipmentIds.mid });
    const expected = scaleRecipe(
      toRecipeInput('Plan test', SEASONAL_CONTENT),
      equipmentAtVolume(DEMO_EQUIPMENT.pilot, usGalToL(10)),
      DEMO_EQUIPMENT.mid,
    );
    expect(plan).toMatchObject({
      recipeId,
      recipeVersionId: versionId,
      versionNumber: 1,
      recipeName: 'Plan test',
      equipmentProfileId: equipmentIds.mid,
      equipmentName: 'Harbour 3.5 bbl',
    });
    expect(plan.computed).toEqual(expected.after);
    expect(plan.recipe).toEqual(expected.recipe);
    expect(plan.content).toEqual(SEASONAL_CONTENT);
    const atVolume = await planForBatch(t.brewery.id, { recipeVersionId: versionId, batchVolumeL: 60 });
    expect(atVolume.equipment.batchVolumeL).toBe(60);
    expect(atVolume.equipmentName).toBe('Pilot kit 10 gal');
    const asWritten = await planForBatch(t.brewery.id, { recipeVersionId: versionId });
    expect(asWritten.computed.og).toBeCloseTo(
      computeRecipe(toRecipeInput('Plan test', SEASONAL_CONTENT), equipmentAtVolume(DEMO_EQUIPMENT.pilot, usGalToL(10)))
        .og,
      12,
    );
    await expect(planForBatch(other.brewery.id, { recipeVersionId: versionId })).rejects.toMatchObject({ status: 404 });
    await expect(freezeRecipeVersion(other.brewery.id, versionId)).rejects.toMatchObject({ status: 404 });
    await expect(
      planForBatch(t.brewery.id, { recipeVersionId: versionId, equipmentProfileId: (await addEquipment(other)).big }),
    ).rejects.toMatchObject({ status: 404 });
  });

  it('shows as last brewed the brew date of the latest batch whose brew day started, not the latest planned or dumped-before-brewing one', async () => {
    const { recipeId, versionId } = await createSeasonal('Last brewed test');
    const lastBrewed = async () =>
      (await t.as.head_brewer.get('/api/recipes')).body.find((r: { id: number }) => r.id === recipeId).lastBrewedAt;
    const plan = async (brewDate: string) => {
      const res = await t.as.head_brewer.post('/api/batches').send({ recipeVersionId: versionId, brewDate });
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      return res.body.id as number;
    };
    const move = async (id: number, status: string, reason?: string) => {
      const res = await t.as.head_brewer
        .post(`/api/batches/${id}/status`)
        .send({ status, ...(reason ? { reason } : {}) });
      expect(res.status, JSON.stringify(res.body)).toBe(200);
    };
    const first = await plan('2026-10-05');
    expect(await lastBrewed()).toBeNull();
    await move(first, 'brewing');
    expect(await lastBrewed()).toBe('2026-10-05');
    await move(first, 'fermenting');
    // A later batch only planned, and one dumped before its brew day, are not brews.
    await plan('2026-12-01');
    const dumped = await plan('2026-11-20');
    await move(dumped, 'dumped', 'Fruit did not arrive');
    expect(await lastBrewed()).toBe('2026-10-05');
    const second = await plan('2026-11-02');
    await move(second, 'brewing');
    expect(await lastBrewed()).toBe('2026-11-02');
  });

  it('keeps recipes to the brewery and the brewing roles', async () => {
    const { recipeId, versionId } = await createSeasonal('Scope test');
    expect((await other.as.head_brewer.get(`/api/recipes/${recipeId}`)).status).toBe(404);
    expect((await other.as.head_brewer.get(`/api/recipes/${recipeId}/versions/${versionId}`)).status).toBe(404);
    expect((await other.as.head_brewer.patch(`/api/recipes/${recipeId}`).send({ name: 'Mine now' })).status).toBe(404);
    expect((await t.as.taproom_manager.get('/api/recipes')).status).toBe(403);
    expect((await t.as.taproom_manager.get('/api/equipment')).status).toBe(403);
    expect((await t.as.taproom_manager.get('/api/ingredients')).status).toBe(403);
    expect((await t.as.assistant_brewer.patch(`/api/recipes/${recipeId}`).send({ name: 'Nope' })).status).toBe(403);
    const rename = await t.as.head_brewer.patch(`/api/recipes/${recipeId}`).send({ status: 'active' });
    expect(rename.body.status).toBe('active');
  });

  it('gives each brewery the starter ingredient library, marked typical, and its own additions', async () => {
    const res = await t.as.assistant_brewer.get('/api/ingredients?kind=fermentable');
    expect(res.status).toBe(200);
    expect(res.body.find((i: { name: string }) => i.name === 'Chocolate malt')).toMatchObject({
      typical: true,
      colourLovibond: 350,
    });
    const mine = await t.as.head_brewer
      .post('/api/ingredients')
      .send({ kind: 'hop', name: 'Harbour wild hop', alphaAcidPct: 6.5, notes: 'From the lane behind the brewery' });
    expect(mine.status).toBe(201);
    expect(mine.body.typical).toBe(false);
    expect(
      (await other.as.head_brewer.get('/api/ingredients?kind=hop')).body.map((i: { name: string }) => i.name),
    ).not.toContain('Harbour wild hop');
    expect(
      (
        await other.as.head_brewer
          .put(`/api/ingredients/${mine.body.id}`)
          .send({ kind: 'hop', name: 'Stolen', notes: '' })
      ).status,
    ).toBe(404);
  });

  it('removes an ingredient, and equipment no recipe version was written for; a profile in use stays (409)', async () => {
    const added = await t.as.head_brewer
      .post('/api/ingredients')
      .send({ kind: 'adjunct', name: 'Sea buckthorn', notes: 'Trial, not repeated' });
    expect((await t.as.assistant_brewer.delete(`/api/ingredients/${added.body.id}`)).status).toBe(403);
    expect((await t.as.head_brewer.delete(`/api/ingredients/${added.body.id}`)).status).toBe(204);
    expect((await t.as.head_brewer.get('/api/ingredients')).body.map((i: { name: string }) => i.name)).not.toContain(
      'Sea buckthorn',
    );
    expect((await t.as.head_brewer.delete(`/api/ingredients/${added.body.id}`)).status).toBe(404);

    const spare = await t.as.head_brewer.post('/api/equipment').send({ ...DEMO_EQUIPMENT.pilot, name: 'Typo kit' });
    expect((await t.as.head_brewer.delete(`/api/equipment/${spare.body.id}`)).status).toBe(204);
    const inUse = await t.as.head_brewer.delete(`/api/equipment/${equipmentIds.pilot}`);
    expect(inUse.status).toBe(409);
    expect(inUse.body.error.message).toMatch(/recipe versions? (was|were) written for, so it stays/);
    expect((await t.as.head_brewer.get('/api/equipment')).body.map((e: { id: number }) => e.id)).toContain(
      equipmentIds.pilot,
    );
  });

  it('gives a brewery whose library was never opened the starter entries on upgrade, once', async () => {
    const before = await Brewery.create({
      name: 'Made before libraries came with breweries',
      unitSystem: 'metric',
      timeZone: 'UTC',
    });
    const upgrade = () => addStarterLibraries({ context: sequelize.getQueryInterface() } as never);
    await upgrade();
    await upgrade();
    expect(await Ingredient.count({ where: { breweryId: before.id } })).toBe(STARTER_INGREDIENTS.length);
    expect(await Ingredient.count({ where: { breweryId: t.brewery.id, typical: true } })).toBe(
      STARTER_INGREDIENTS.length,
    );
  });
});
