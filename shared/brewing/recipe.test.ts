import { describe, expect, it } from 'vitest';
import { ABV_METHOD_SHOWN, SUCROSE_PPG, abv } from './gravity';
import { EXAMPLE_IPA, PILOT_SYSTEM, SOFT_WATER } from './example-recipes';
import { computeRecipe } from './recipe';
import { expectInputError } from './test-helpers';
import type { ComputedRecipe, RecipeInput } from './types';

function allFinite(value: unknown, path = 'result'): void {
  if (typeof value === 'number') {
    expect(Number.isFinite(value), path).toBe(true);
  } else if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) allFinite(v, `${path}.${k}`);
  }
}

describe('computeRecipe', () => {
  const result: ComputedRecipe = computeRecipe(EXAMPLE_IPA, PILOT_SYSTEM);

  it('returns only finite numbers and no warnings for a sound recipe', () => {
    allFinite(result);
    expect(result.warnings).toEqual([]);
  });

  it('is internally consistent', () => {
    expect(result.ibu).toBeCloseTo(
      result.hops.reduce((s, h) => s + h.ibu, 0),
      10,
    );
    expect(result.fermentables.reduce((s, f) => s + f.percent, 0)).toBeCloseTo(100, 10);
    const adjunctPoints = result.adjuncts.reduce((s, a) => s + a.gravityPoints, 0);
    expect(result.fermentables.reduce((s, f) => s + f.gravityPoints, 0) + adjunctPoints).toBeCloseTo(
      (result.og - 1) * 1000,
      8,
    );
    expect(result.abvPct).toBe(abv(result.og, result.fg, ABV_METHOD_SHOWN));
    expect(result.fg).toBeCloseTo(1 + (result.og - 1) * 0.22, 10);
    expect(result.preBoilGravity).toBeLessThan(result.postBoilGravity);
    expect(result.ebc).toBeCloseTo(result.srm * 1.97, 10);
    expect(result.hops.find((h) => h.use === 'dryHop')!.ibu).toBe(0);
    expect(result.hops.filter((h) => h.approximate).every((h) => h.use === 'whirlpool')).toBe(true);
    expect(result.mashSteps[0]!.waterTempC).toBe(result.strikeTempC);
    expect(result.mashSteps[1]!.waterAddedL).toBeCloseTo(result.volumes.infusionL, 10);
    expect(result.buGu).toBeCloseTo(result.ibu / ((result.og - 1) * 1000), 10);
  });

  it('solves a percent bill to its target OG', () => {
    const percent: RecipeInput = {
      ...EXAMPLE_IPA,
      grainBill: {
        mode: 'percent',
        targetOg: 1.06,
        items: EXAMPLE_IPA.grainBill.items.map(({ ...item }, i) => ({
          ...item,
          percent: [70, 10, 6, 4, 4, 1, 3, 2][i]!,
        })),
      },
    };
    expect(computeRecipe(percent, PILOT_SYSTEM).og).toBeCloseTo(1.06, 10);
  });

  it('solves salts for a target water profile', () => {
    const target = { ...SOFT_WATER, calciumPpm: 100, sulfatePpm: 200, chloridePpm: 60 };
    const r = computeRecipe(
      {
        ...EXAMPLE_IPA,
        water: {
          mode: 'target',
          source: SOFT_WATER,
          target,
          allowedSalts: ['gypsum', 'calciumChlorideDihydrate', 'epsomSalt'],
        },
      },
      PILOT_SYSTEM,
    );
    expect(r.water!.residualPpm).toBeDefined();
    expect(Math.abs(r.water!.mash.sulfatePpm - 200)).toBeLessThan(15);
    expect(r.water!.mash.calciumPpm).toBeCloseTo(r.water!.sparge.calciumPpm, 6);
  });

  it('warns about an overfilled mash tun and kettle, adjuncts outside their range, and hops longer than the boil', () => {
    const r = computeRecipe(
      {
        ...EXAMPLE_IPA,
        hops: [{ ...EXAMPLE_IPA.hops[0]!, minutes: 90 }],
        adjuncts: [{ ...EXAMPLE_IPA.adjuncts[0]!, level: 3 }],
      },
      { ...PILOT_SYSTEM, maxMashTunVolumeL: 30, maxKettleVolumeL: 40 },
    );
    const codes = r.warnings.map((w) => w.code);
    expect(codes).toEqual(
      expect.arrayContaining(['mashTunOverfilled', 'kettleOverfilled', 'adjunctOutsideRange', 'hopMinutesExceedBoil']),
    );
  });

  it('throws typed errors for impossible input', () => {
    expectInputError(() => computeRecipe(EXAMPLE_IPA, { ...PILOT_SYSTEM, batchVolumeL: 0 }), 'equipment.batchVolumeL');
    expectInputError(
      () => computeRecipe(EXAMPLE_IPA, { ...PILOT_SYSTEM, brewhouseEfficiency: 0 }),
      'equipment.brewhouseEfficiency',
    );
    const badHop = { ...EXAMPLE_IPA, hops: [{ ...EXAMPLE_IPA.hops[0]!, alphaAcidPct: 45 }] };
    expectInputError(() => computeRecipe(badHop, PILOT_SYSTEM), 'hops.0.alphaAcidPct');
    const items = EXAMPLE_IPA.grainBill.items.map((item, i) => (i === 0 ? { ...item, weightKg: -1 } : item));
    expectInputError(
      () =>
        computeRecipe(
          { ...EXAMPLE_IPA, grainBill: { mode: 'weight', items } as RecipeInput['grainBill'] },
          PILOT_SYSTEM,
        ),
      'grainBill.items.0.weightKg',
    );
    const percent: RecipeInput = {
      ...EXAMPLE_IPA,
      grainBill: { mode: 'percent', targetOg: 1.05, items: [{ ...EXAMPLE_IPA.grainBill.items[0]!, percent: 90 }] },
    };
    expectInputError(() => computeRecipe(percent, PILOT_SYSTEM), 'grainBill.items');
    expectInputError(
      () => computeRecipe({ ...EXAMPLE_IPA, mash: { ...EXAMPLE_IPA.mash, steps: [] } }, PILOT_SYSTEM),
      'mash.steps',
    );
  });
});

describe('sugar from adjuncts', () => {
  const noAdjuncts = computeRecipe({ ...EXAMPLE_IPA, adjuncts: [] }, PILOT_SYSTEM);
  const withFruit = computeRecipe(EXAMPLE_IPA, PILOT_SYSTEM);

  it('apricot purée at 1 lb per US gal in the fermenter adds about 4.6 points to OG and raises ABV', () => {
    // 10 % sugar (fruit purée, TYPICAL_SUGAR_PCT: USDA FoodData Central, from memory) × 1 lb/gal
    // × sucrose 46.2 ppg (ASBC °Plato definition, see SUCROSE_PPG) = 0.1 × 46.2 = 4.62 points.
    expect(withFruit.adjuncts[0]!.gravityPoints).toBeCloseTo(0.1 * SUCROSE_PPG, 6);
    expect((withFruit.og - noAdjuncts.og) * 1000).toBeCloseTo(4.62, 1);
    expect(withFruit.fg).toBeGreaterThan(noAdjuncts.fg);
    expect(withFruit.abvPct).toBeGreaterThan(noAdjuncts.abvPct + 0.4);
    // Spices carry no sugar; fermenter sugar is not in the boil.
    expect(withFruit.adjuncts[1]!.gravityPoints).toBe(0);
    expect(withFruit.preBoilGravity).toBeCloseTo(noAdjuncts.preBoilGravity, 10);
  });

  it('honey at 1 lb per US gal gives about 38 points, near the 35 ppg brewers use for honey (common practice, no source)', () => {
    const honey = {
      name: 'Wildflower honey',
      category: 'honey' as const,
      stage: 'fermenter' as const,
      rule: { basis: 'lbPerUsGal' as const, low: 0.5, high: 2 },
      level: 1,
    };
    const r = computeRecipe({ ...EXAMPLE_IPA, adjuncts: [honey] }, PILOT_SYSTEM);
    // 82 % sugar (USDA FoodData Central, honey, from memory) × 46.2 = 37.9.
    expect(r.adjuncts[0]!.gravityPoints).toBeCloseTo(0.82 * SUCROSE_PPG, 6);
    expect(Math.abs(r.adjuncts[0]!.gravityPoints - 35) / 35).toBeLessThan(0.1);
    // A recipe's own sugar % wins over the typical one; 0 turns it off.
    const off = computeRecipe({ ...EXAMPLE_IPA, adjuncts: [{ ...honey, sugarPct: 0 }] }, PILOT_SYSTEM);
    expect(off.og).toBeCloseTo(noAdjuncts.og, 10);
  });

  it('says why a sugary adjunct dosed by volume or added at packaging is not counted', () => {
    const byVolume = {
      name: 'Honey',
      category: 'honey' as const,
      stage: 'fermenter' as const,
      rule: { basis: 'mlPerHl' as const, low: 0, high: 5000 },
      level: 1000,
    };
    const r = computeRecipe(
      { ...EXAMPLE_IPA, adjuncts: [byVolume, { ...EXAMPLE_IPA.adjuncts[0]!, stage: 'packaging' }] },
      PILOT_SYSTEM,
    );
    expect(r.og).toBeCloseTo(noAdjuncts.og, 10);
    expect(r.adjuncts[0]!.sugarNotCounted).toMatch(/dosed by volume/);
    expect(r.adjuncts[1]!.sugarNotCounted).toMatch(/packaging/);
  });

  it('a bill written as shares still reaches its target OG with the fruit counted', () => {
    const percent: RecipeInput = {
      ...EXAMPLE_IPA,
      grainBill: {
        mode: 'percent',
        targetOg: 1.06,
        items: EXAMPLE_IPA.grainBill.items.map((item, i) => ({ ...item, percent: [70, 10, 6, 4, 4, 1, 3, 2][i]! })),
      },
    };
    expect(computeRecipe(percent, PILOT_SYSTEM).og).toBeCloseTo(1.06, 10);
  });
});
