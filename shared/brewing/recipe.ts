/**
 * computeRecipe: every live number for a recipe on one equipment profile, for
 * the recipe editor, the API and the brew sheet.
 */
import {
  adjunctSugar,
  doseAmount,
  doseRange,
  doseRangeLabel,
  doseUnitLabel,
  isWithinRange,
  roundForMeasuring,
} from './adjuncts';
import { buGu, ibuForAddition, hopUtilisation, hopWeightForIbu } from './bitterness';
import { srmFromFermentables, srmToEbc, srmToHex } from './colour';
import { BrewingInputError, MAX_SG, requireFinite, requireInRange, requireNonNegative } from './errors';
import { percentagesFromWeights, weightsForTargetOg } from './grain-bill';
import {
  abv,
  abvBalling,
  abvSimple,
  apparentAttenuation,
  fgFromAttenuation,
  ogFromFermentables,
  sgToPlato,
  pointLitres,
  realAttenuation,
} from './gravity';
import {
  DEFAULT_HLT_COIL_EFFECTIVENESS,
  hltTemperatureForRecirculationC,
  infusionVolumeL,
  planVolumes,
  strikeTemperatureC,
  validateEquipment,
} from './mash-water';
import {
  DEFAULT_INFUSION_WATER_C,
  type BrewingWarning,
  type ComputedAdjunct,
  type ComputedMashStep,
  type ComputedRecipe,
  type ComputedWater,
  type EquipmentProfile,
  type GrainBill,
  type HopAddition,
  type RecipeInput,
  type VolumePlan,
  type WeighedFermentable,
} from './types';
import { ION_KEYS, chlorideSulfateRatio, residualAlkalinity, solveSaltAdditions, waterAfterAdditions } from './water';

/**
 * Weighed fermentables for a bill: weights as written, or solved from percentages and target OG.
 * `otherPoints` (gravity points from adjunct sugar) come off the target, so the beer reaches it.
 */
export function resolveGrainBill(
  bill: GrainBill,
  brewhouseEfficiency: number,
  volumeL: number,
  otherPoints = 0,
): WeighedFermentable[] {
  if (bill.items.length === 0)
    throw new BrewingInputError('grainBill.items', 'A recipe needs at least one fermentable.');
  if (bill.mode === 'weight') return bill.items;
  const grainOg = bill.targetOg - otherPoints / 1000;
  if (grainOg <= 1)
    throw new BrewingInputError(
      'grainBill.targetOg',
      `The adjuncts' sugar alone reaches ${bill.targetOg.toFixed(3)}: raise the target OG.`,
    );
  const weights = weightsForTargetOg(bill.items, grainOg, brewhouseEfficiency, volumeL);
  return bill.items.map(({ percent: _percent, ...spec }, i) => ({ ...spec, weightKg: weights[i]! }));
}

/** The wort side of a recipe on an equipment profile: what hops, water and scaling need. */
export interface WortPlan {
  fermentables: WeighedFermentable[];
  /** Gravity points·L each fermentable delivers. */
  pointLitres: number[];
  /** Gravity points·L each adjunct's sugar delivers (see adjunctSugar). */
  adjunctPointLitres: number[];
  og: number;
  mashGrainKg: number;
  thicknessLPerKg: number;
  strikeTempC: number;
  mashSteps: ComputedMashStep[];
  /** Strike plus infusion water, L. */
  mashWaterL: number;
  volumes: VolumePlan;
  preBoilGravity: number;
  postBoilGravity: number;
  /** Mean of pre- and post-boil gravity, used for hop utilisation (Tinseth's advice). */
  boilGravity: number;
  warnings: BrewingWarning[];
}

function planMash(recipe: RecipeInput, equipment: EquipmentProfile, mashGrainKg: number, thicknessLPerKg: number) {
  const { steps, grainTempC } = recipe.mash;
  if (steps.length === 0) throw new BrewingInputError('mash.steps', 'The mash needs at least one rest.');
  requireFinite(grainTempC, 'mash.grainTempC', 'Grain temperature');
  steps.forEach((s, i) => {
    requireInRange(s.tempC, `mash.steps.${i}.tempC`, 0, 100, 'Rest temperature (°C)');
    requireNonNegative(s.minutes, `mash.steps.${i}.minutes`, 'Rest time');
  });
  const first = steps[0]!;
  const strikeTempC = strikeTemperatureC(grainTempC, first.tempC, thicknessLPerKg);
  const strikeL = mashGrainKg * thicknessLPerKg;
  const computed: ComputedMashStep[] = [
    {
      name: first.name,
      tempC: first.tempC,
      minutes: first.minutes,
      method: 'strike',
      waterAddedL: strikeL,
      waterTempC: strikeTempC,
    },
  ];
  let mashWaterL = strikeL;
  let currentC = first.tempC;
  for (let i = 1; i < steps.length; i++) {
    const step = steps[i]!;
    const out: ComputedMashStep = {
      name: step.name,
      tempC: step.tempC,
      minutes: step.minutes,
      method: step.method,
      waterAddedL: 0,
    };
    if (step.method === 'infusion') {
      const waterC = step.infusionWaterTempC ?? DEFAULT_INFUSION_WATER_C;
      out.waterAddedL = infusionVolumeL({
        grainKg: mashGrainKg,
        mashWaterL,
        currentC,
        targetC: step.tempC,
        infusionWaterC: waterC,
      });
      out.waterTempC = waterC;
      mashWaterL += out.waterAddedL;
    } else if (step.method === 'recirculate') {
      out.hltTempC = hltTemperatureForRecirculationC(
        currentC,
        step.tempC,
        equipment.hltCoilEffectiveness ?? DEFAULT_HLT_COIL_EFFECTIVENESS,
      );
    }
    computed.push(out);
    currentC = step.tempC;
  }
  return { strikeTempC, strikeL, mashWaterL, steps: computed };
}

/** Fermentables, OG, mash and volumes, and boil gravity for a recipe on an equipment profile. */
export function planWort(recipe: RecipeInput, equipment: EquipmentProfile): WortPlan {
  validateEquipment(equipment);
  const volumeL = equipment.batchVolumeL;
  const efficiency = equipment.brewhouseEfficiency;
  const adjunctPoints = recipe.adjuncts.map(
    (a, i) => adjunctSugar(a, doseAmount(a.rule, a.level, volumeL, `adjuncts.${i}.level`), `adjuncts.${i}`).pointLitres,
  );
  const adjunctTotal = adjunctPoints.reduce((s, p) => s + p, 0);
  const fermentables = resolveGrainBill(recipe.grainBill, efficiency, volumeL, adjunctTotal / volumeL);
  const points = pointLitres(fermentables, efficiency, 'grainBill.items');
  const og = ogFromFermentables(fermentables, efficiency, volumeL) + adjunctTotal / volumeL / 1000;
  if (og > MAX_SG)
    throw new BrewingInputError(
      'adjuncts',
      `With the adjuncts' sugar the OG would be ${og.toFixed(3)}, above the 1.200 the formulas cover.`,
    );
  let mashGrainKg = 0;
  let kettlePoints = 0;
  fermentables.forEach((f, i) => {
    if (f.stage === 'mash') mashGrainKg += f.weightKg;
    if (f.stage !== 'fermenter') kettlePoints += points[i]!;
  });
  // Sugar in the mash or boil is in the boiling wort; whirlpool and fermenter additions come after it.
  recipe.adjuncts.forEach((a, i) => {
    if (a.stage === 'mash' || a.stage === 'boil') kettlePoints += adjunctPoints[i]!;
  });
  const thicknessLPerKg = recipe.mash.thicknessLPerKg ?? equipment.mashThicknessLPerKg;
  const mash = planMash(recipe, equipment, mashGrainKg, thicknessLPerKg);
  const { volumes, warnings } = planVolumes(equipment, mashGrainKg, thicknessLPerKg, mash.mashWaterL - mash.strikeL);
  // The wort leaving the kettle has the OG's concentration (losses are wort too);
  // extract is conserved through the boil, so pre-boil points scale by volume.
  const postBoilPoints = kettlePoints / volumeL / 1000;
  const preBoilPoints = (postBoilPoints * volumes.postBoilL) / volumes.preBoilL;
  const postBoilGravity = 1 + postBoilPoints;
  const preBoilGravity = 1 + preBoilPoints;
  return {
    fermentables,
    pointLitres: points,
    adjunctPointLitres: adjunctPoints,
    og,
    mashGrainKg,
    thicknessLPerKg,
    strikeTempC: mash.strikeTempC,
    mashSteps: mash.steps,
    mashWaterL: mash.mashWaterL,
    volumes,
    preBoilGravity,
    postBoilGravity,
    boilGravity: (preBoilGravity + postBoilGravity) / 2,
    warnings,
  };
}

/** How far (mg/L, or share of the target) an ion may miss before we warn. */
const WATER_MISS_PPM = 5;
const WATER_MISS_SHARE = 0.1;

function computeWater(recipe: RecipeInput, wort: WortPlan, warnings: BrewingWarning[]): ComputedWater | undefined {
  const plan = recipe.water;
  if (!plan) return undefined;
  const spargeL = wort.volumes.spargeL;
  let mashSalts = plan.mode === 'additions' ? plan.mashSalts : [];
  let spargeSalts = plan.mode === 'additions' ? plan.spargeSalts : [];
  let residualPpm: ComputedWater['residualPpm'];
  if (plan.mode === 'target') {
    const solved = solveSaltAdditions({
      source: plan.source,
      target: plan.target,
      mashVolumeL: wort.mashWaterL,
      spargeVolumeL: spargeL,
      allowedSalts: plan.allowedSalts,
      ...(plan.ionWeights ? { ionWeights: plan.ionWeights } : {}),
    });
    mashSalts = solved.mashSalts;
    spargeSalts = solved.spargeSalts;
    residualPpm = solved.residualPpm;
    const missed = ION_KEYS.filter(
      (ion) => Math.abs(solved.residualPpm[ion]) > Math.max(WATER_MISS_PPM, WATER_MISS_SHARE * plan.target[ion]),
    );
    if (missed.length > 0) {
      warnings.push({
        code: 'waterTargetNotReached',
        field: 'water.target',
        message: `The allowed salts cannot reach the target for: ${missed.map((m) => m.replace('Ppm', '')).join(', ')}.`,
      });
    }
  }
  const mash = waterAfterAdditions(plan.source, mashSalts, wort.mashWaterL, 'water.mashSalts');
  const sparge = waterAfterAdditions(plan.source, spargeSalts, spargeL, 'water.spargeSalts');
  return {
    source: plan.source,
    mashSalts,
    spargeSalts,
    mash,
    sparge,
    chlorideSulfateRatio: chlorideSulfateRatio(mash),
    residualAlkalinity: residualAlkalinity(mash),
    ...(residualPpm ? { residualPpm } : {}),
  };
}

function computeAdjuncts(recipe: RecipeInput, volumeL: number, warnings: BrewingWarning[]): ComputedAdjunct[] {
  return recipe.adjuncts.map((adjunct, i) => {
    const amount = doseAmount(adjunct.rule, adjunct.level, volumeL, `adjuncts.${i}.level`);
    if (!isWithinRange(adjunct)) {
      warnings.push({
        code: 'adjunctOutsideRange',
        field: `adjuncts.${i}.level`,
        message: `${adjunct.name}: the dose of ${adjunct.level} ${doseUnitLabel(adjunct.rule)} is outside its ${doseRangeLabel(adjunct.rule)} range.`,
      });
    }
    const sugar = adjunctSugar(adjunct, amount, `adjuncts.${i}`);
    return {
      name: adjunct.name,
      category: adjunct.category,
      stage: adjunct.stage,
      amount,
      ...doseRange(adjunct.rule, volumeL),
      measuredMetric: roundForMeasuring(amount, 'metric'),
      measuredUs: roundForMeasuring(amount, 'us'),
      sugarPct: sugar.sugarPct,
      gravityPoints: sugar.pointLitres / volumeL,
      ...(sugar.notCounted ? { sugarNotCounted: sugar.notCounted } : {}),
    };
  });
}

/**
 * Every live number for a recipe on an equipment profile: OG, FG, ABV, IBU per
 * hop and total, SRM, EBC, swatch colour, BU:GU, water for mash and sparge,
 * Cl:SO4, RA, strike temperature, volumes, adjunct amounts, warnings.
 * Throws {@link BrewingInputError} on impossible input.
 */
export function computeRecipe(recipe: RecipeInput, equipment: EquipmentProfile): ComputedRecipe {
  const wort = planWort(recipe, equipment);
  const volumeL = equipment.batchVolumeL;
  const warnings = [...wort.warnings];
  const { og } = wort;
  const fg = fgFromAttenuation(og, recipe.yeast.attenuationPct);
  const percents = percentagesFromWeights(wort.fermentables.map((f) => f.weightKg));

  const hops = recipe.hops.map((hop, i) => {
    const field = `hops.${i}`;
    if (hop.use === 'boil' && hop.minutes > equipment.boilMinutes) {
      warnings.push({
        code: 'hopMinutesExceedBoil',
        field: `${field}.minutes`,
        message: `${hop.name}: ${hop.minutes} min is longer than the ${equipment.boilMinutes} min boil.`,
      });
    }
    const ibu = ibuForAddition(hop, wort.boilGravity, volumeL, field);
    return {
      name: hop.name,
      weightG: hop.weightG,
      use: hop.use,
      minutes: hop.minutes,
      utilisation: hopUtilisation(hop, wort.boilGravity, field),
      ibu,
      approximate: hop.use === 'whirlpool',
    };
  });
  const ibu = hops.reduce((s, h) => s + h.ibu, 0);
  const srm = srmFromFermentables(wort.fermentables, volumeL);
  const water = computeWater(recipe, wort, warnings);
  const adjuncts = computeAdjuncts(recipe, volumeL, warnings);
  const ogPlato = sgToPlato(og);
  const rate = recipe.yeast.pitchRateMillionCellsPerMlPerPlato;
  const yeastCellsBillion =
    rate === undefined
      ? undefined
      : (requireNonNegative(rate, 'yeast.pitchRateMillionCellsPerMlPerPlato', 'Pitch rate') *
          volumeL *
          1000 *
          ogPlato) /
        1000;

  return {
    og,
    fg,
    ogPlato,
    fgPlato: sgToPlato(fg),
    abvPct: abv(og, fg),
    abvSimplePct: abvSimple(og, fg),
    abvBallingPct: abvBalling(og, fg),
    apparentAttenuation: apparentAttenuation(og, fg),
    realAttenuation: realAttenuation(og, fg),
    preBoilGravity: wort.preBoilGravity,
    postBoilGravity: wort.postBoilGravity,
    fermentables: wort.fermentables.map((f, i) => ({
      name: f.name,
      weightKg: f.weightKg,
      percent: percents[i]!,
      stage: f.stage,
      gravityPoints: wort.pointLitres[i]! / volumeL,
    })),
    mashGrainKg: wort.mashGrainKg,
    hops,
    ibu,
    buGu: buGu(ibu, og),
    srm,
    ebc: srmToEbc(srm),
    colourHex: srmToHex(srm),
    ...(water ? { water } : {}),
    strikeTempC: wort.strikeTempC,
    thicknessLPerKg: wort.thicknessLPerKg,
    mashSteps: wort.mashSteps,
    volumes: wort.volumes,
    adjuncts,
    ...(yeastCellsBillion === undefined ? {} : { yeastCellsBillion }),
    warnings,
  };
}

/**
 * Hop weights for additions written as a share of the target IBU: addition i with
 * `sharesPct[i]` gets that share of `targetIbu` at the recipe's boil gravity on this
 * equipment (Tinseth, inverted by {@link hopWeightForIbu}); additions without a share keep
 * their weight. Boil gravity does not depend on the hops, so one wort plan serves all.
 */
export function hopWeightsForIbuShares(
  recipe: RecipeInput,
  equipment: EquipmentProfile,
  targetIbu: number,
  sharesPct: readonly (number | undefined)[],
): HopAddition[] {
  if (sharesPct.every((s) => s === undefined)) return recipe.hops;
  const wort = planWort(recipe, equipment);
  return recipe.hops.map((hop, i) => {
    const share = sharesPct[i];
    if (share === undefined) return hop;
    requireInRange(share, `hops.${i}.ibuSharePct`, 0, 100, 'Share of the target IBU (%)');
    return {
      ...hop,
      weightG: hopWeightForIbu((targetIbu * share) / 100, hop, wort.boilGravity, equipment.batchVolumeL, `hops.${i}`),
    };
  });
}
