import { describe, expect, it } from 'vitest';
import { computeRecipe } from '../brewing';
import { EXAMPLE_IPA, PILOT_SYSTEM } from '../brewing/example-recipes';
import { batchActuals, boilAdditions, brewDaySteps, farFromExpected, type EntryLike } from './brew-day';
import type { FrozenPlan } from '../schemas/batches';

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

describe('planned vs actual', () => {
  const entry = (id: number, stepKey: string | null, measurements: object, extra: Partial<EntryLike> = {}): EntryLike => ({
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
