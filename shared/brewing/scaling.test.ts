import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { EXAMPLE_IPA, PILOT_SYSTEM, TEN_BBL_BREWHOUSE } from './example-recipes';
import { scaleRecipe } from './scaling';
import type { EquipmentProfile, RecipeInput, SaltAddition } from './types';

describe('scaleRecipe pilot → 10 bbl', () => {
  const scaled = scaleRecipe(EXAMPLE_IPA, PILOT_SYSTEM, TEN_BBL_BREWHOUSE);
  const { before, after } = scaled;

  it('keeps OG, FG, ABV and IBU per addition', () => {
    expect(after.og).toBeCloseTo(before.og, 10);
    expect(after.fg).toBeCloseTo(before.fg, 10);
    expect(after.abvPct).toBeCloseTo(before.abvPct, 8);
    before.hops.forEach((h, i) => expect(after.hops[i]!.ibu).toBeCloseTo(h.ibu, 8));
    expect(after.ibu).toBeCloseTo(before.ibu, 8);
  });

  it('keeps the bill proportions and the water ppm', () => {
    before.fermentables.forEach((f, i) => expect(after.fermentables[i]!.percent).toBeCloseTo(f.percent, 8));
    expect(after.water!.mash.sulfatePpm).toBeCloseTo(before.water!.mash.sulfatePpm, 8);
    expect(after.water!.sparge.chloridePpm).toBeCloseTo(before.water!.sparge.chloridePpm, 8);
  });

  it('scales adjuncts by their dose rules and dry hops by volume', () => {
    before.adjuncts.forEach((a, i) =>
      expect(after.adjuncts[i]!.amount.value / a.amount.value).toBeCloseTo(scaled.volumeRatio, 8),
    );
    const dry = scaled.changes.find((c) => c.item.includes('dry hop'))!;
    expect(dry.nonLinear).toBe(false);
  });

  it('reports what changed non-linearly', () => {
    const items = scaled.nonLinearChanges.map((c) => c.item);
    expect(items).toContain('hop: Bittering boil 60 min');
    expect(items).toContain('mash salt: gypsum');
    expect(items).toContain('strike temperature');
    expect(items).toContain('fermentable: Pale malt');
    expect(items).not.toContain('adjunct: Apricot purée');
  });

  it('warns when the target brewhouse is too small', () => {
    const small = scaleRecipe(EXAMPLE_IPA, PILOT_SYSTEM, {
      ...TEN_BBL_BREWHOUSE,
      maxMashTunVolumeL: 900,
      maxKettleVolumeL: 1200,
    });
    expect(small.warnings.map((w) => w.code)).toEqual(
      expect.arrayContaining(['mashTunOverfilled', 'kettleOverfilled']),
    );
  });
});

const equipment: fc.Arbitrary<EquipmentProfile> = fc
  .record({
    batchVolumeL: fc.double({ min: 10, max: 5000, noNaN: true }),
    brewhouseEfficiency: fc.double({ min: 0.55, max: 0.95, noNaN: true }),
    boilOffShare: fc.double({ min: 0.02, max: 0.12, noNaN: true }),
    boilMinutes: fc.integer({ min: 60, max: 120 }),
    lossShare: fc.double({ min: 0, max: 0.08, noNaN: true }),
    grainAbsorptionLPerKg: fc.double({ min: 0.5, max: 1.2, noNaN: true }),
    mashThicknessLPerKg: fc.double({ min: 2.2, max: 4, noNaN: true }),
  })
  .map((r) => ({
    name: 'generated',
    batchVolumeL: r.batchVolumeL,
    brewhouseEfficiency: r.brewhouseEfficiency,
    boilOffLPerHour: r.batchVolumeL * r.boilOffShare,
    boilMinutes: r.boilMinutes,
    mashTunDeadSpaceL: r.batchVolumeL * r.lossShare,
    kettleDeadSpaceL: r.batchVolumeL * r.lossShare * 0.5,
    trubChillerLossL: r.batchVolumeL * r.lossShare,
    fermenterLossL: r.batchVolumeL * r.lossShare,
    grainAbsorptionLPerKg: r.grainAbsorptionLPerKg,
    maxMashTunVolumeL: r.batchVolumeL * 3,
    maxKettleVolumeL: r.batchVolumeL * 3,
    mashThicknessLPerKg: r.mashThicknessLPerKg,
  }));

function expectSameRecipe(a: RecipeInput, b: RecipeInput): void {
  a.grainBill.items.forEach((item, i) => {
    const other = b.grainBill.items[i]!;
    if ('weightKg' in item && 'weightKg' in other) expect(other.weightKg).toBeCloseTo(item.weightKg, 8);
  });
  a.hops.forEach((h, i) => expect(b.hops[i]!.weightG).toBeCloseTo(h.weightG, 6));
  if (a.water?.mode === 'additions' && b.water?.mode === 'additions') {
    const grams = (list: readonly SaltAddition[]) => list.filter((s) => s.grams > 0);
    for (const [from, to] of [
      [a.water.mashSalts, b.water.mashSalts],
      [a.water.spargeSalts, b.water.spargeSalts],
    ] as const) {
      const [x, y] = [grams(from), grams(to)];
      expect(y.map((s) => s.salt)).toEqual(x.map((s) => s.salt));
      x.forEach((s, i) => expect(y[i]!.grams).toBeCloseTo(s.grams, 6));
    }
  }
  expect(b.adjuncts).toEqual(a.adjuncts);
}

describe('scaling round trip', () => {
  // Where the target has no sparge water (all water goes in as strike), the
  // sparge salt concentration has nowhere to live and cannot come back; that
  // case is covered separately below.
  it('A → B → A returns A within rounding', () => {
    fc.assert(
      fc.property(equipment, (target) => {
        const there = scaleRecipe(EXAMPLE_IPA, PILOT_SYSTEM, target);
        fc.pre(there.after.volumes.spargeL > 0);
        const back = scaleRecipe(there.recipe, target, PILOT_SYSTEM);
        expectSameRecipe(EXAMPLE_IPA, back.recipe);
        expect(back.after.og).toBeCloseTo(there.before.og, 10);
        expect(back.after.ibu).toBeCloseTo(there.before.ibu, 6);
      }),
      { numRuns: 60 },
    );
  });

  it('a target without sparge water drops sparge salts and says why', () => {
    const noSparge = { ...TEN_BBL_BREWHOUSE, mashThicknessLPerKg: 8 };
    const there = scaleRecipe(EXAMPLE_IPA, PILOT_SYSTEM, noSparge);
    expect(there.after.volumes.spargeL).toBe(0);
    expect(there.warnings.map((w) => w.code)).toContain('strikeExceedsTotalWater');
    expect(there.recipe.water?.mode === 'additions' && there.recipe.water.spargeSalts).toEqual([]);
  });
});
