/**
 * Adjuncts and spices: dose rules per volume, amounts for a batch, scaling,
 * practical unit equivalents, and rounding to what a brewer can weigh or
 * measure. Per-volume doses refer to the batch volume into the fermenter.
 */
import { BrewingInputError, requireNonNegative, requirePositive } from './errors';
import { potentialPointLitresPerKg } from './gravity';
import type {
  AdjunctAddition,
  AdjunctCategory,
  Amount,
  AmountUnit,
  DoseBasis,
  DoseRule,
  MeasuredAmount,
  MeasuringSystem,
} from './types';
import { G_PER_OZ, KG_PER_LB, L_PER_HL, L_PER_US_GAL, ML_PER_US_TSP, mlToTsp } from '../quantities/convert';

interface BasisInfo {
  unit: AmountUnit;
  /** Absolute amount per unit of dose per litre of beer. */
  perLitre: number;
  label: string;
}

/** Each per-volume basis as (amount unit, amount per dose unit per litre). */
const BASES: Readonly<Record<Exclude<DoseBasis, 'fixedPerBatch'>, BasisInfo>> = {
  lbPerUsGal: { unit: 'kg', perLitre: KG_PER_LB / L_PER_US_GAL, label: 'lb per US gal' },
  ozPerUsGal: { unit: 'kg', perLitre: G_PER_OZ / 1000 / L_PER_US_GAL, label: 'oz per US gal' },
  kgPerHl: { unit: 'kg', perLitre: 1 / L_PER_HL, label: 'kg per hL' },
  gPerHl: { unit: 'kg', perLitre: 1 / 1000 / L_PER_HL, label: 'g per hL' },
  gPerL: { unit: 'kg', perLitre: 1 / 1000, label: 'g per L' },
  tspPer5UsGal: { unit: 'mL', perLitre: ML_PER_US_TSP / (5 * L_PER_US_GAL), label: 'tsp per 5 US gal' },
  mlPerHl: { unit: 'mL', perLitre: 1 / L_PER_HL, label: 'mL per hL' },
};

/** Human label of a dose basis, for forms. */
export function doseBasisLabel(basis: DoseBasis): string {
  return basis === 'fixedPerBatch' ? 'per batch' : BASES[basis].label;
}

/** Unit of a rule's low, high and level, for labels: "g per hL", "kg per batch". */
export function doseUnitLabel(rule: Pick<DoseRule, 'basis' | 'fixedUnit'>): string {
  return rule.basis === 'fixedPerBatch' ? `${rule.fixedUnit ?? 'each'} per batch` : BASES[rule.basis].label;
}

/** A rule's range with its unit, e.g. "0.5–2 g per hL". */
export function doseRangeLabel(rule: DoseRule): string {
  return `${rule.low}–${rule.high} ${doseUnitLabel(rule)}`;
}

/**
 * The same rule and level restated in another basis, for a batch volume (needed only to or from
 * `fixedPerBatch`), or undefined when the two measure different things (a weight and a volume,
 * or a count) and no conversion exists.
 */
export function convertDoseRule(
  rule: DoseRule,
  level: number,
  to: DoseBasis,
  volumeL: number,
  fixedUnit?: AmountUnit,
): { rule: DoseRule; level: number } | undefined {
  validateDoseRule(rule);
  requirePositive(volumeL, 'volumeL', 'Batch volume');
  const fromUnit = rule.basis === 'fixedPerBatch' ? (rule.fixedUnit ?? 'each') : BASES[rule.basis].unit;
  const toUnit = to === 'fixedPerBatch' ? (fixedUnit ?? fromUnit) : BASES[to].unit;
  if (fromUnit !== toUnit) return undefined;
  // Absolute amount per rule unit in this batch, before and after.
  const perUnit = (basis: DoseBasis) => (basis === 'fixedPerBatch' ? 1 : BASES[basis].perLitre * volumeL);
  const factor = perUnit(rule.basis) / perUnit(to);
  const next: DoseRule = {
    basis: to,
    low: rule.low * factor,
    high: rule.high * factor,
    ...(to === 'fixedPerBatch' ? { fixedUnit: toUnit } : {}),
  };
  return { rule: next, level: level * factor };
}

/** Throws unless the rule is usable: known basis, 0 ≤ low ≤ high. */
export function validateDoseRule(rule: DoseRule, field = 'rule'): void {
  if (rule.basis !== 'fixedPerBatch' && !(rule.basis in BASES)) {
    throw new BrewingInputError(`${field}.basis`, `Unknown dose basis "${String(rule.basis)}".`);
  }
  requireNonNegative(rule.low, `${field}.low`, 'Low dose');
  requireNonNegative(rule.high, `${field}.high`, 'High dose');
  if (rule.high < rule.low)
    throw new BrewingInputError(`${field}.high`, 'The high dose must not be below the low dose.');
}

/**
 * Absolute amount for a dose level in a batch: level × (amount per litre) ×
 * litres; `fixedPerBatch` is the level itself whatever the volume.
 * @param level dose in the rule's basis
 * @param volumeL batch volume into the fermenter, L
 */
export function doseAmount(rule: DoseRule, level: number, volumeL: number, field = 'level'): Amount {
  validateDoseRule(rule);
  requireNonNegative(level, field, 'Dose');
  requirePositive(volumeL, 'volumeL', 'Batch volume');
  if (rule.basis === 'fixedPerBatch') return { value: level, unit: rule.fixedUnit ?? 'each' };
  const basis = BASES[rule.basis];
  return { value: level * basis.perLitre * volumeL, unit: basis.unit };
}

/** The rule's low and high doses as absolute amounts for a batch volume. */
export function doseRange(rule: DoseRule, volumeL: number): { low: Amount; high: Amount } {
  return {
    low: doseAmount(rule, rule.low, volumeL, 'rule.low'),
    high: doseAmount(rule, rule.high, volumeL, 'rule.high'),
  };
}

/** Inverse of {@link doseAmount}: the dose level that an absolute amount represents in a batch volume. */
export function doseLevelFromAmount(rule: DoseRule, amount: Amount, volumeL: number): number {
  validateDoseRule(rule);
  requireNonNegative(amount.value, 'amount.value', 'Amount');
  requirePositive(volumeL, 'volumeL', 'Batch volume');
  const unit = rule.basis === 'fixedPerBatch' ? (rule.fixedUnit ?? 'each') : BASES[rule.basis].unit;
  if (amount.unit !== unit)
    throw new BrewingInputError('amount.unit', `This dose is measured in ${unit}, not ${amount.unit}.`);
  return rule.basis === 'fixedPerBatch' ? amount.value : amount.value / (BASES[rule.basis].perLitre * volumeL);
}

/** Amount of an adjunct for one volume and for another: proportional to volume, except `fixedPerBatch`. */
export function scaleDose(
  rule: DoseRule,
  level: number,
  fromVolumeL: number,
  toVolumeL: number,
): { from: Amount; to: Amount } {
  return { from: doseAmount(rule, level, fromVolumeL), to: doseAmount(rule, level, toVolumeL) };
}

/** True when the chosen level lies within the rule's low–high range. */
export function isWithinRange(adjunct: AdjunctAddition): boolean {
  return adjunct.level >= adjunct.rule.low && adjunct.level <= adjunct.rule.high;
}

/** Typical fermentable sugar of an adjunct, % of its weight, used when the recipe gives none. */
export const TYPICAL_SUGAR_PCT: Readonly<Record<AdjunctCategory, { pct: number; source: string }>> = {
  fruit: {
    pct: 10,
    source:
      'food-composition tables (USDA FoodData Central): fresh fruit about 4–14 g sugars per 100 g (raspberry ≈ 4, apricot ≈ 9, cherry ≈ 13); 10 taken as typical for a purée, from memory',
  },
  honey: { pct: 82, source: 'USDA FoodData Central, honey: about 82 g sugars per 100 g, from memory' },
  sugar: { pct: 100, source: 'refined sugar is sucrose, the 100 % reference of extract' },
  lactose: { pct: 0, source: 'brewing yeast does not ferment lactose; not counted' },
  vegetable: { pct: 0, source: 'mostly starch and water; counted only when the recipe gives a sugar %' },
  spice: { pct: 0, source: 'no fermentable sugar to speak of' },
  herb: { pct: 0, source: 'no fermentable sugar to speak of' },
  other: { pct: 0, source: 'unknown; counted only when the recipe gives a sugar %' },
};

/** What an adjunct's sugar adds to the beer. */
export interface AdjunctSugar {
  /** Sugar % of weight used (the recipe's, or the category's typical one). */
  sugarPct: number;
  sugarKg: number;
  /** Gravity points · L this sugar delivers (at 100 %: it dissolves fully, like a kettle sugar). */
  pointLitres: number;
  /** Why a sugary adjunct's sugar is not counted, when it is not. */
  notCounted?: string;
}

/**
 * Fermentable sugar of an adjunct and the gravity it adds: sugar kg × the potential of sucrose
 * (extract 100 %, ≈ 46.2 ppg). Weighed adjuncts in the mash, boil, whirlpool or fermenter count;
 * a packaging addition is priming, and a dose by volume or by count has no weight to go on.
 */
export function adjunctSugar(adjunct: AdjunctAddition, amount: Amount, field = 'adjunct'): AdjunctSugar {
  const sugarPct = adjunct.sugarPct ?? TYPICAL_SUGAR_PCT[adjunct.category].pct;
  if (adjunct.sugarPct !== undefined && (adjunct.sugarPct < 0 || adjunct.sugarPct > 100)) {
    throw new BrewingInputError(`${field}.sugarPct`, 'Sugar must be between 0 and 100 % of the weight.');
  }
  const none = (notCounted?: string): AdjunctSugar => ({
    sugarPct,
    sugarKg: 0,
    pointLitres: 0,
    ...(notCounted && sugarPct > 0 ? { notCounted } : {}),
  });
  if (sugarPct === 0) return none();
  if (adjunct.stage === 'packaging') return none('added at packaging, so its sugar is not counted toward OG');
  if (amount.unit !== 'kg')
    return none(
      amount.unit === 'mL'
        ? 'dosed by volume, so its sugar is not counted: dose it by weight to count it'
        : 'dosed by count, so its sugar is not counted: dose it by weight to count it',
    );
  const sugarKg = (amount.value * sugarPct) / 100;
  return { sugarPct, sugarKg, pointLitres: sugarKg * potentialPointLitresPerKg({ extractPct: 100 }) };
}

/** A practical equivalence between two household or trade measures. */
export interface PracticalEquivalent {
  from: string;
  to: string;
  /** Amount of `to` per one `from`. */
  factor: number;
  source: string;
}

/** Practical equivalents. The spice gram weights are approximate and vary with grind and packing. */
export const PRACTICAL_EQUIVALENTS: readonly PracticalEquivalent[] = [
  { from: 'tbsp', to: 'tsp', factor: 3, source: 'NIST Handbook 44 Appendix C (1 tbsp = 3 tsp)' },
  {
    from: 'cinnamon stick',
    to: 'tsp ground cinnamon',
    factor: 0.5,
    source: 'common practice, no source (a 3 in / 7.5 cm stick)',
  },
  { from: 'vanilla bean', to: 'tsp vanilla extract', factor: 3, source: 'common practice, no source' },
  { from: 'whole nutmeg', to: 'tsp ground nutmeg', factor: 2, source: 'common practice, no source' },
  { from: 'tsp ground cinnamon', to: 'g', factor: 2.6, source: 'household food-composition measures, from memory' },
  { from: 'tsp ground nutmeg', to: 'g', factor: 2.2, source: 'household food-composition measures, from memory' },
  { from: 'tsp ground ginger', to: 'g', factor: 1.8, source: 'household food-composition measures, from memory' },
  { from: 'tsp ground cloves', to: 'g', factor: 2.1, source: 'household food-composition measures, from memory' },
  { from: 'tsp ground coriander', to: 'g', factor: 1.8, source: 'household food-composition measures, from memory' },
];

/** Converts between two measures listed in {@link PRACTICAL_EQUIVALENTS} (either direction). */
export function convertPractical(value: number, from: string, to: string): number {
  requireNonNegative(value, 'value', 'Amount');
  for (const eq of PRACTICAL_EQUIVALENTS) {
    if (eq.from === from && eq.to === to) return value * eq.factor;
    if (eq.from === to && eq.to === from) return value / eq.factor;
  }
  throw new BrewingInputError('to', `No practical equivalent between "${from}" and "${to}".`);
}

/**
 * Largest relative change rounding for measuring may make to an amount (our choice: 5 %, about
 * what brewers accept between a weighed and a written dose; a coarser step that would miss by more
 * gives way to a finer unit or step).
 */
export const MEASURING_TOLERANCE = 0.05;

type Step = readonly [unit: MeasuredAmount['unit'], perSi: number, step: number];

/**
 * The first (coarsest) step whose rounding stays within {@link MEASURING_TOLERANCE} of the
 * amount; below the finest step the amount is kept to three significant figures, so a
 * non-zero amount never rounds to nothing.
 */
function roundOnLadder(si: number, ladder: readonly Step[]): MeasuredAmount {
  const finest = ladder[ladder.length - 1]!;
  if (si === 0) return { value: 0, unit: ladder[0]![0] };
  for (const [unit, perSi, step] of ladder) {
    const shown = si * perSi;
    const rounded = Number((Math.round(shown / step) * step).toFixed(6));
    if (rounded > 0 && Math.abs(rounded - shown) <= MEASURING_TOLERANCE * shown) return { value: rounded, unit };
  }
  return { value: Number((si * finest[1]).toPrecision(3)), unit: finest[0] };
}

const G_PER_KG = 1000;
const OZ_PER_KG = G_PER_KG / G_PER_OZ;
const LB_PER_KG = 1 / KG_PER_LB;
const TSP_PER_ML = mlToTsp(1);

/**
 * Rounds an amount to something a brewer can weigh or measure, in display units, never by more
 * than {@link MEASURING_TOLERANCE}. Steps, coarsest first (our choice, matching common floor,
 * kitchen and gram scales and measuring spoons):
 * metric mass: ≥ 25 kg → 0.5 kg; ≥ 1 kg → 0.05 kg; ≥ 50 g → 5 g; then 1 g, 0.1 g, 0.01 g;
 * US mass: ≥ 1 lb → 0.25 lb, 0.1 lb; below → 0.25 oz, then grams (1 g, 0.1 g, 0.01 g: a US
 * brewer weighing 1.9 g of spice uses a gram scale);
 * volume: US → 0.25 tsp, ⅛ tsp, then mL (0.1, 0.01); metric → 5 mL from 20 mL, 1.25 mL (a
 * quarter 5 mL spoon), then 0.1 mL, 0.01 mL;
 * counts (sticks, beans): 0.5, 0.25, 0.1.
 */
export function roundForMeasuring(amount: Amount, system: MeasuringSystem): MeasuredAmount {
  const value = requireNonNegative(amount.value, 'amount.value', 'Amount');
  const fineGrams: Step[] = [
    ['g', G_PER_KG, 1],
    ['g', G_PER_KG, 0.1],
    ['g', G_PER_KG, 0.01],
  ];
  const fineMl: Step[] = [
    ['mL', 1, 0.1],
    ['mL', 1, 0.01],
  ];
  if (amount.unit === 'each')
    return roundOnLadder(value, [
      ['each', 1, 0.5],
      ['each', 1, 0.25],
      ['each', 1, 0.1],
    ]);
  if (amount.unit === 'mL') {
    if (system === 'us')
      return roundOnLadder(value, [['tsp', TSP_PER_ML, 0.25], ['tsp', TSP_PER_ML, 0.125], ...fineMl]);
    return roundOnLadder(value, [...(value >= 20 ? [['mL', 1, 5] as const] : []), ['mL', 1, 1.25], ...fineMl]);
  }
  if (system === 'us') {
    if (value * LB_PER_KG >= 1)
      return roundOnLadder(value, [
        ['lb', LB_PER_KG, 0.25],
        ['lb', LB_PER_KG, 0.1],
      ]);
    return roundOnLadder(value, [['oz', OZ_PER_KG, 0.25], ...fineGrams]);
  }
  if (value >= 25)
    return roundOnLadder(value, [
      ['kg', 1, 0.5],
      ['kg', 1, 0.05],
    ]);
  if (value >= 1) return roundOnLadder(value, [['kg', 1, 0.05]]);
  if (value * G_PER_KG >= 50) return roundOnLadder(value, [['g', G_PER_KG, 5], ...fineGrams]);
  return roundOnLadder(value, fineGrams);
}
