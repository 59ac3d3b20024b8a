/**
 * The brew day as steps, built from a batch's frozen plan, and planned-versus-actual figures built from
 * its log. Pure: the tablet screen and the API use the same functions.
 */
import { achievedEfficiency, SALTS, type ComputedRecipe } from '../brewing';
import type { Measurements } from '../schemas/batch-log';
import type { BatchActuals, FrozenPlan } from '../schemas/batches';

export type MeasureKey = keyof Measurements;

export interface Addition {
  what: string;
  /** Weight in grams, or an amount with its unit for adjuncts. */
  amount: { value: number; unit: 'g' | 'kg' | 'mL' | 'each' };
}

export interface BrewDayStep {
  key: string;
  label: string;
  /** What to measure when marking the step done, with the expected value beside each. */
  asks: MeasureKey[];
  expected: Partial<Record<MeasureKey, number>>;
  additions: Addition[];
  /** Boil additions: minutes remaining in the boil when it goes in. */
  boilMinute?: number;
  /** How long to hold: a mash rest, or the whirlpool stand. */
  holdMinutes?: number;
  /** Hot water to add for an infusion mash step, L at °C. */
  infusion?: { volumeL: number; tempC: number };
  /** Yeast to pitch, billions of cells, when the recipe gives a pitch rate. */
  pitchCellsBillion?: number;
  /** Hot liquid or other hazard the screen shows a caution for. */
  hot?: boolean;
  /** Compressed gas handled in this step (oxygen cylinder). */
  oxygen?: boolean;
}

/**
 * Sparge water temperature when the plan gives none: about 168–170 °F (76–77 °C), hot enough to keep the
 * grain bed fluid without extracting tannins. Common practice, no source.
 */
const SPARGE_WATER_C = 77;
/** Mash out: raise the mash to about 168 °F (76 °C) to stop the enzymes (DOMAIN.md; common practice, no source). */
const MASH_OUT_C = 76;
/** A mash step at or above this is the mash out. Common practice, no source. */
const MASH_OUT_FROM_C = 75;

/**
 * How far a measurement may sit from the step's expected value before the screen asks the brewer to check it
 * (a warning, never a refusal): 3 °C (about 5 °F), 10 % of a volume, 8 gravity points, 0.3 pH.
 * Common practice, no source: wide enough for a normal brew day, narrow enough to catch a slipped digit.
 */
const EXPECTED_TOLERANCE: Record<MeasureKey, { absolute?: number; relative?: number }> = {
  tempC: { absolute: 3 },
  volumeL: { relative: 0.1 },
  gravitySg: { absolute: 0.008 },
  ph: { absolute: 0.3 },
};

/** True when a measured value is further from the expected one than {@link EXPECTED_TOLERANCE} allows. */
export function farFromExpected(key: MeasureKey, actual: number, expected: number): boolean {
  const { absolute, relative } = EXPECTED_TOLERANCE[key];
  const allowed = absolute ?? (relative ?? 0) * Math.abs(expected);
  return Math.abs(actual - expected) > allowed + 1e-9;
}

const grams = (g: number): Addition['amount'] => ({ value: g, unit: 'g' });

/** How an adjunct or spice goes in, as the version says ("in mesh bags"): `computed.adjuncts` lists the version's adjuncts, then its spices. */
function howAdded(plan: FrozenPlan, index: number): string | undefined {
  const written = plan.content ? [...plan.content.adjuncts, ...plan.content.spices] : [];
  return written[index]?.howAdded?.trim() || undefined;
}

/** The adjuncts and spices that go in at one stage, with how they go in. */
function adjunctsAt(plan: FrozenPlan, stage: string): { index: number; addition: Addition }[] {
  return plan.computed.adjuncts.flatMap((a, index) => {
    if (a.stage !== stage) return [];
    const how = howAdded(plan, index);
    return [
      {
        index,
        addition: { what: how ? `${a.name} (${how})` : a.name, amount: { value: a.amount.value, unit: a.amount.unit } },
      },
    ];
  });
}

/** Additions timed in the boil (hops, kettle sugars, adjuncts and spices), by minutes remaining, latest first. */
export function boilAdditions(plan: FrozenPlan): { minute: number; additions: Addition[] }[] {
  const { computed, equipment, recipe } = plan;
  const byMinute = new Map<number, Addition[]>();
  const add = (minute: number, a: Addition) => byMinute.set(minute, [...(byMinute.get(minute) ?? []), a]);
  for (const hop of computed.hops)
    if (hop.use === 'boil') add(hop.minutes, { what: hop.name, amount: grams(hop.weightG) });
  // Kettle sugars go in at the start of the boil so they dissolve fully (common practice, no source).
  for (const f of computed.fermentables)
    if (f.stage === 'kettle') add(equipment.boilMinutes, { what: f.name, amount: { value: f.weightKg, unit: 'kg' } });
  for (const { index, addition } of adjunctsAt(plan, 'boil')) add(recipe.adjuncts[index]?.boilMinutes ?? 0, addition);
  return [...byMinute.entries()].sort((a, b) => b[0] - a[0]).map(([minute, additions]) => ({ minute, additions }));
}

/** Water salts for the mash or the sparge water, in grams. */
function salts(plan: FrozenPlan, which: 'mashSalts' | 'spargeSalts'): Addition[] {
  return (plan.computed.water?.[which] ?? [])
    .filter((s) => s.grams > 0)
    .map((s) => ({ what: SALTS[s.salt]?.name ?? s.salt, amount: grams(s.grams) }));
}

/**
 * The brew day in order, from the frozen plan: strike water with the mash salts, mash in with the grist and
 * any mash adjuncts, each rest with its time (and infusion water), mash out, recirculation, sparge with its
 * water, volume and salts, the boil with every addition at its minute, whirlpool with its stand, knockout
 * to pitching temperature, oxygen, and the pitch with its cell count.
 */
export function brewDaySteps(plan: FrozenPlan): BrewDayStep[] {
  const c: ComputedRecipe = plan.computed;
  const v = c.volumes;
  const steps: BrewDayStep[] = [];
  const step = (s: Omit<BrewDayStep, 'asks' | 'expected' | 'additions'> & Partial<BrewDayStep>) =>
    steps.push({ asks: [], expected: {}, additions: [], ...s });
  const pitchTempC = plan.content?.yeast.pitchTempC ?? plan.content?.fermentation.primaryTempC;

  step({
    key: 'strike-water',
    label: 'Heat strike water',
    asks: ['tempC', 'volumeL'],
    expected: { tempC: c.strikeTempC, volumeL: v.strikeL },
    additions: salts(plan, 'mashSalts').map((a) => ({ ...a, what: `${a.what} (mash salts)` })),
    hot: true,
  });
  const [first, ...rest] = c.mashSteps;
  step({
    key: 'mash-in',
    label: `Mash in${first ? `: ${first.name}` : ''}`,
    asks: ['tempC', 'ph'],
    expected: { tempC: first?.tempC },
    additions: [
      ...c.fermentables
        .filter((f) => f.stage === 'mash')
        .map((f) => ({ what: f.name, amount: { value: f.weightKg, unit: 'kg' as const } })),
      ...adjunctsAt(plan, 'mash').map((a) => a.addition),
    ],
    ...(first ? { holdMinutes: first.minutes } : {}),
    hot: true,
  });
  rest.forEach((m, i) =>
    step({
      key: `mash-rest-${i + 2}`,
      label:
        m.tempC < MASH_OUT_FROM_C
          ? `Mash rest: ${m.name}`
          : /mash.?out/i.test(m.name)
            ? 'Mash out'
            : `Mash out: ${m.name}`,
      asks: ['tempC'],
      expected: { tempC: m.tempC },
      holdMinutes: m.minutes,
      ...(m.method === 'infusion' && m.waterAddedL > 0 && m.waterTempC !== undefined
        ? { infusion: { volumeL: m.waterAddedL, tempC: m.waterTempC } }
        : {}),
      hot: true,
    }),
  );
  if (!c.mashSteps.some((m) => m.tempC >= MASH_OUT_FROM_C)) {
    step({ key: 'mash-out', label: 'Mash out', asks: ['tempC'], expected: { tempC: MASH_OUT_C }, hot: true });
  }
  step({ key: 'recirculate', label: 'Recirculate until the wort runs clear', hot: true });
  step({
    key: 'sparge-start',
    label: 'Start sparge',
    asks: ['tempC', 'volumeL'],
    expected: { tempC: SPARGE_WATER_C, volumeL: v.spargeL },
    additions: salts(plan, 'spargeSalts').map((a) => ({ ...a, what: `${a.what} (sparge salts)` })),
    hot: true,
  });
  step({
    key: 'sparge-end',
    label: 'End sparge',
    asks: ['volumeL', 'gravitySg'],
    expected: { volumeL: v.preBoilL, gravitySg: c.preBoilGravity },
    hot: true,
  });
  step({
    key: 'boil-start',
    label: 'Start the boil',
    asks: ['volumeL', 'gravitySg'],
    expected: { volumeL: v.preBoilL, gravitySg: c.preBoilGravity },
    hot: true,
  });
  for (const { minute, additions } of boilAdditions(plan)) {
    step({ key: `boil-${minute}`, label: `Boil addition at ${minute} min`, additions, boilMinute: minute, hot: true });
  }
  step({ key: 'flame-out', label: 'Flame out', asks: ['volumeL'], expected: { volumeL: v.postBoilL }, hot: true });
  const whirlpoolHops = plan.recipe.hops.filter((h) => h.use === 'whirlpool');
  const standTempC = whirlpoolHops.find((h) => h.whirlpoolTempC !== undefined)?.whirlpoolTempC;
  const standMinutes = whirlpoolHops.length ? Math.max(...whirlpoolHops.map((h) => h.minutes)) : undefined;
  step({
    key: 'whirlpool-start',
    label: 'Start whirlpool',
    asks: ['tempC'],
    expected: standTempC === undefined ? {} : { tempC: standTempC },
    additions: [
      ...c.hops.filter((h) => h.use === 'whirlpool').map((h) => ({ what: h.name, amount: grams(h.weightG) })),
      ...adjunctsAt(plan, 'whirlpool').map((a) => a.addition),
    ],
    ...(standMinutes ? { holdMinutes: standMinutes } : {}),
    hot: true,
  });
  step({ key: 'whirlpool-end', label: 'End whirlpool and rest', hot: true });
  const pitchTemp = pitchTempC === undefined ? {} : { tempC: pitchTempC };
  step({ key: 'knockout-start', label: 'Start knockout', asks: ['tempC'], expected: pitchTemp, hot: true });
  step({
    key: 'knockout-end',
    label: 'End knockout',
    asks: ['volumeL', 'gravitySg', 'tempC'],
    expected: { volumeL: v.knockoutL, gravitySg: c.og, ...pitchTemp },
  });
  step({ key: 'oxygenate', label: 'Oxygenate the wort', oxygen: true });
  step({
    key: 'pitch-yeast',
    label: `Pitch yeast: ${plan.recipe.yeast.name}`,
    asks: ['tempC'],
    expected: pitchTemp,
    ...(c.yeastCellsBillion === undefined ? {} : { pitchCellsBillion: c.yeastCellsBillion }),
  });
  return steps;
}

/** A log entry as these functions read it (server rows and API answers both fit). */
export interface EntryLike {
  id: number;
  kind: string;
  stepKey: string | null;
  data: Record<string, unknown>;
  correctsEntryId: number | null;
}

/** Each entry's measurements after corrections: a correction's measurements replace those of the entry it corrects. */
export function effectiveMeasurements(
  entries: readonly EntryLike[],
): Map<number, { stepKey: string | null; measurements: Measurements }> {
  const out = new Map<number, { stepKey: string | null; measurements: Measurements }>();
  for (const e of entries) {
    const m = e.data.measurements as Measurements | undefined;
    if (e.kind === 'correction' && e.correctsEntryId !== null) {
      const target = out.get(e.correctsEntryId);
      if (target && m) out.set(e.correctsEntryId, { ...target, measurements: { ...target.measurements, ...m } });
    } else if (m) {
      out.set(e.id, { stepKey: e.stepKey, measurements: m });
    }
  }
  return out;
}

/** Planned beside actual: mash temperature, pre-boil gravity and volume, OG, knockout volume, efficiency achieved. */
export function batchActuals(plan: FrozenPlan, entries: readonly EntryLike[]): BatchActuals {
  const latest = new Map<string, Measurements>();
  for (const { stepKey, measurements } of effectiveMeasurements(entries).values()) {
    if (stepKey) latest.set(stepKey, { ...latest.get(stepKey), ...measurements });
  }
  const c = plan.computed;
  const og = latest.get('knockout-end')?.gravitySg ?? null;
  const knockoutL = latest.get('knockout-end')?.volumeL ?? null;
  return {
    mashTempC: { planned: c.mashSteps[0]?.tempC ?? 0, actual: latest.get('mash-in')?.tempC ?? null },
    preBoilGravity: {
      planned: c.preBoilGravity,
      actual: latest.get('boil-start')?.gravitySg ?? latest.get('sparge-end')?.gravitySg ?? null,
    },
    preBoilVolumeL: {
      planned: c.volumes.preBoilL,
      actual: latest.get('boil-start')?.volumeL ?? latest.get('sparge-end')?.volumeL ?? null,
    },
    og: { planned: c.og, actual: og },
    knockoutVolumeL: { planned: c.volumes.knockoutL, actual: knockoutL },
    brewhouseEfficiency: {
      planned: plan.equipment.brewhouseEfficiency,
      actual:
        og !== null && knockoutL !== null
          ? achievedEfficiency({
              plannedEfficiency: plan.equipment.brewhouseEfficiency,
              plannedOg: c.og,
              plannedVolumeL: c.volumes.knockoutL,
              actualOg: og,
              actualVolumeL: knockoutL,
            })
          : null,
    },
  };
}
