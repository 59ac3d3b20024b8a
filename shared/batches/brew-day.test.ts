import { describe, expect, it } from 'vitest';
import { computeRecipe } from '../brewing';
import { EXAMPLE_IPA, PILOT_SYSTEM } from '../brewing/example-recipes';
import { batchActuals, boilAdditions, brewDaySteps, farFromExpected, type EntryLike } from './brew-day';
import type { FrozenPlan } from '../schemas/batches';
import type { RecipeVersionContent } from '../schemas/recipes';
import type { RecipeInput } from '../brewing';

const plan: FrozenPlan = {
  recipeName: EXAMPLE_IPA.name,
  equipmentName: PILOT_SYSTEM.name,
  equipment: PILOT_SYSTEM,
  recipe: EXAMPLE_IPA,
  computed: computeRecipe(EXAMPLE_IPA, PILOT_SYSTEM),
};

describe('brew-day steps', () => {
  it('walk the plan in brewhouse order with every boil addition at its minute', () => {
    const keys = brewDaySteps(plan).map((s) => s.key);
    expect(keys.slice(0, 3)).toEqual(['strike-water', 'mash-in', 'mash-rest-2']);
    expect(keys.indexOf('boil-start')).toBeLessThan(keys.indexOf('boil-60'));
    expect(keys.slice(-4)).toEqual(['knockout-start', 'knockout-end', 'oxygenate', 'pitch-yeast']);
    // The example's boil hops go in at 60, 30, 15, 5 and 0 minutes remaining, latest first.
    expect(boilAdditions(plan).map((a) => a.minute)).toEqual([60, 30, 15, 5, 0]);
    const strike = brewDaySteps(plan)[0]!;
    expect(strike.expected).toEqual({ tempC: plan.computed.strikeTempC, volumeL: plan.computed.volumes.strikeL });
  });
});

describe('what each step asks for, from the frozen plan', () => {
  // The parts of a version's content the steps read (the rest does not matter here).
  const content = {
    yeast: { pitchTempC: 18 },
    fermentation: { primaryTempC: 19 },
    adjuncts: [],
    spices: [{ howAdded: 'in a mesh bag' }, { howAdded: '' }, { howAdded: 'loose, lifted out at knockout' }],
  } as unknown as RecipeVersionContent;
  const withContent: FrozenPlan = { ...plan, content };
  const byKey = (p: FrozenPlan) => new Map(brewDaySteps(p).map((s) => [s.key, s]));

  it('lists the water salts with strike water and sparge, and the sparge water’s volume and temperature', () => {
    const s = byKey(plan);
    // The example recipe's mash and sparge salts, written for the pilot system it is computed on (example-recipes.ts).
    expect(s.get('strike-water')!.additions).toEqual([
      { what: 'Gypsum (mash salts)', amount: { value: 6, unit: 'g' } },
      { what: 'Calcium chloride (dihydrate) (mash salts)', amount: { value: 2, unit: 'g' } },
    ]);
    const sparge = s.get('sparge-start')!;
    expect(sparge.asks).toEqual(['tempC', 'volumeL']);
    // Sparge water about 170 °F (77 °C): common practice, no source.
    expect(sparge.expected).toEqual({ tempC: 77, volumeL: plan.computed.volumes.spargeL });
    expect(sparge.additions.map((a) => a.what)).toEqual([
      'Gypsum (sparge salts)',
      'Calcium chloride (dihydrate) (sparge salts)',
    ]);
    expect(sparge.hot).toBe(true);
  });

  it('gives each rest its time and infusion water, and a mash out when the recipe has none', () => {
    const s = byKey(plan);
    // The example recipe's mash: saccharification 60 min, mash out 10 min with 95 °C infusion water (example-recipes.ts).
    expect(s.get('mash-in')!.holdMinutes).toBe(60);
    const out = s.get('mash-rest-2')!;
    expect(out.label).toBe('Mash out');
    expect(out.holdMinutes).toBe(10);
    expect(out.infusion?.tempC).toBe(95);
    expect(out.infusion?.volumeL).toBeGreaterThan(0);
    expect(s.has('mash-out')).toBe(false);

    const singleRest: RecipeInput = {
      ...EXAMPLE_IPA,
      mash: { ...EXAMPLE_IPA.mash, steps: [EXAMPLE_IPA.mash.steps[0]!] },
    };
    const keys = brewDaySteps({ ...plan, recipe: singleRest, computed: computeRecipe(singleRest, PILOT_SYSTEM) }).map(
      (x) => x.key,
    );
    expect(keys.slice(0, 4)).toEqual(['strike-water', 'mash-in', 'mash-out', 'recirculate']);
    // Mash out at about 168 °F (76 °C): DOMAIN.md, common practice.
    expect(
      brewDaySteps({ ...plan, recipe: singleRest, computed: computeRecipe(singleRest, PILOT_SYSTEM) })[2]!.expected,
    ).toEqual({ tempC: 76 });
  });

  it('lists mash adjuncts at mash in, with how they go in', () => {
    const recipe: RecipeInput = {
      ...EXAMPLE_IPA,
      adjuncts: EXAMPLE_IPA.adjuncts.map((a, i) =>
        i === 0 ? { ...a, name: 'Roasted squash', category: 'vegetable' as const, stage: 'mash' as const } : a,
      ),
    };
    const mashIn = brewDaySteps({ ...withContent, recipe, computed: computeRecipe(recipe, PILOT_SYSTEM) })[1]!;
    expect(mashIn.additions.at(-1)?.what).toBe('Roasted squash (in a mesh bag)');
  });

  it('gives the whirlpool its stand, knockout and pitch their temperature and cell count, and oxygen its caution', () => {
    const s = byKey(withContent);
    // The example's whirlpool hops stand 20 min at 80 °C (example-recipes.ts).
    expect(s.get('whirlpool-start')!).toMatchObject({ expected: { tempC: 80 }, holdMinutes: 20 });
    expect(s.get('whirlpool-start')!.additions.map((a) => a.what)).toContain(
      'Sweet orange peel (loose, lifted out at knockout)',
    );
    expect(s.get('knockout-start')!.expected).toEqual({ tempC: 18 });
    expect(s.get('knockout-end')!.expected.tempC).toBe(18);
    expect(s.get('pitch-yeast')!.expected).toEqual({ tempC: 18 });
    expect(s.get('pitch-yeast')!.pitchCellsBillion).toBe(plan.computed.yeastCellsBillion);
    expect(s.get('oxygenate')!.oxygen).toBe(true);
    // A plan frozen without a version's content has no pitch temperature to offer.
    expect(byKey(plan).get('knockout-start')!.expected).toEqual({});
  });
});

describe('planned vs actual', () => {
  const entry = (
    id: number,
    stepKey: string | null,
    measurements: object,
    extra: Partial<EntryLike> = {},
  ): EntryLike => ({
    id,
    kind: 'step',
    stepKey,
    data: { measurements },
    correctsEntryId: null,
    ...extra,
  });

  it('reads measurements at their steps, applies corrections, and works out efficiency from OG and knockout volume', () => {
    const c = plan.computed;
    const actuals = batchActuals(plan, [
      entry(1, 'mash-in', { tempC: 68 }),
      entry(2, null, { tempC: 66.4 }, { kind: 'correction', correctsEntryId: 1 }),
      entry(3, 'knockout-end', { gravitySg: c.og, volumeL: c.volumes.knockoutL }),
    ]);
    expect(actuals.mashTempC).toEqual({ planned: c.mashSteps[0]!.tempC, actual: 66.4 });
    expect(actuals.og.actual).toBe(c.og);
    // Hitting the planned OG and volume exactly gives the planned efficiency (Palmer, How to Brew, ch. 12).
    expect(actuals.brewhouseEfficiency.actual).toBeCloseTo(PILOT_SYSTEM.brewhouseEfficiency, 12);
    expect(batchActuals(plan, []).brewhouseEfficiency.actual).toBeNull();
  });
});

describe('far from expected', () => {
  it('flags a slipped digit but not a normal brew-day difference (tolerances: common practice, no source)', () => {
    expect(farFromExpected('tempC', 66.5, 67)).toBe(false);
    expect(farFromExpected('tempC', 912, 74)).toBe(true);
    expect(farFromExpected('volumeL', 380, 400)).toBe(false);
    expect(farFromExpected('volumeL', 40, 400)).toBe(true);
    expect(farFromExpected('gravitySg', 1.048, 1.052)).toBe(false);
    expect(farFromExpected('gravitySg', 1.52, 1.052)).toBe(true);
    expect(farFromExpected('ph', 5.4, 5.3)).toBe(false);
    expect(farFromExpected('ph', 4.5, 5.3)).toBe(true);
  });
});
