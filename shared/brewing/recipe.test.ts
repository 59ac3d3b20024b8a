import { describe, expect, it } from 'vitest';
import { ABV_METHOD_SHOWN, abv } from './gravity';
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
    expect(result.ibu).toBeCloseTo(result.hops.reduce((s, h) => s + h.ibu, 0), 10);
    expect(result.fermentables.reduce((s, f) => s + f.percent, 0)).toBeCloseTo(100, 10);
    expect(result.fermentables.reduce((s, f) => s + f.gravityPoints, 0)).toBeCloseTo((result.og - 1) * 1000, 8);
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
        items: EXAMPLE_IPA.grainBill.items.map(({ ...item }, i) => ({ ...item, percent: [70, 10, 6, 4, 4, 1, 3, 2][i]! })),
      },
    };
    expect(computeRecipe(percent, PILOT_SYSTEM).og).toBeCloseTo(1.06, 10);
  });

  it('solves salts for a target water profile', () => {
    const target = { ...SOFT_WATER, calciumPpm: 100, sulfatePpm: 200, chloridePpm: 60 };
    const r = computeRecipe({ ...EXAMPLE_IPA, water: { mode: 'target', source: SOFT_WATER, target, allowedSalts: ['gypsum', 'calciumChlorideDihydrate', 'epsomSalt'] } }, PILOT_SYSTEM);
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
    expect(codes).toEqual(expect.arrayContaining(['mashTunOverfilled', 'kettleOverfilled', 'adjunctOutsideRange', 'hopMinutesExceedBoil']));
  });

  it('throws typed errors for impossible input', () => {
    expectInputError(() => computeRecipe(EXAMPLE_IPA, { ...PILOT_SYSTEM, batchVolumeL: 0 }), 'equipment.batchVolumeL');
    expectInputError(() => computeRecipe(EXAMPLE_IPA, { ...PILOT_SYSTEM, brewhouseEfficiency: 0 }), 'equipment.brewhouseEfficiency');
    const badHop = { ...EXAMPLE_IPA, hops: [{ ...EXAMPLE_IPA.hops[0]!, alphaAcidPct: 45 }] };
    expectInputError(() => computeRecipe(badHop, PILOT_SYSTEM), 'hops.0.alphaAcidPct');
    const items = EXAMPLE_IPA.grainBill.items.map((item, i) => (i === 0 ? { ...item, weightKg: -1 } : item));
    expectInputError(() => computeRecipe({ ...EXAMPLE_IPA, grainBill: { mode: 'weight', items } as RecipeInput['grainBill'] }, PILOT_SYSTEM), 'grainBill.items.0.weightKg');
    const percent: RecipeInput = { ...EXAMPLE_IPA, grainBill: { mode: 'percent', targetOg: 1.05, items: [{ ...EXAMPLE_IPA.grainBill.items[0]!, percent: 90 }] } };
    expectInputError(() => computeRecipe(percent, PILOT_SYSTEM), 'grainBill.items');
    expectInputError(() => computeRecipe({ ...EXAMPLE_IPA, mash: { ...EXAMPLE_IPA.mash, steps: [] } }, PILOT_SYSTEM), 'mash.steps');
  });
});
