/**
 * Recipe scaling: the same beer on another brewhouse. Proportional scaling by
 * volume is wrong wherever efficiency, boil gravity, water volumes or mash
 * thickness differ, so each part is re-solved for the same result instead.
 */
import { weightsForTargetOg } from './grain-bill';
import { hopWeightForIbu } from './bitterness';
import { computeRecipe, planWort } from './recipe';
import {
  NON_LINEAR_TOLERANCE,
  type ComputedRecipe,
  type EquipmentProfile,
  type GrainBill,
  type HopAddition,
  type RecipeInput,
  type SaltAddition,
  type ScaleChange,
  type ScaledRecipe,
  type WaterPlan,
} from './types';

/** Temperatures that move by less than this are reported as unchanged, °C. */
const TEMPERATURE_TOLERANCE_C = 0.05;

function scaleGrainBill(recipe: RecipeInput, before: ComputedRecipe, target: EquipmentProfile): GrainBill {
  const bill = recipe.grainBill;
  if (bill.mode === 'percent') return bill;
  // Keep the bill's proportions by weight and its share of the OG (adjunct sugar is dosed per
  // volume, so it brings the same points); mash items follow the new efficiency.
  const shares = bill.items.map((item, i) => ({ ...item, percent: before.fermentables[i]!.percent }));
  const grainOg = 1 + before.fermentables.reduce((s, f) => s + f.gravityPoints, 0) / 1000;
  const weights = weightsForTargetOg(shares, grainOg, target.brewhouseEfficiency, target.batchVolumeL);
  return { mode: 'weight', items: bill.items.map((item, i) => ({ ...item, weightKg: weights[i]! })) };
}

function scaleSalts(
  salts: readonly SaltAddition[],
  fromL: number,
  toL: number,
  fallbackPerL?: readonly SaltAddition[],
  fallbackFromL?: number,
): SaltAddition[] {
  if (toL === 0) return [];
  if (fromL > 0) return salts.map((s) => ({ ...s, grams: (s.grams * toL) / fromL }));
  // No water of this kind before: treat it like the mash water so every litre has the same ppm.
  if (!fallbackPerL || !fallbackFromL) return [];
  return fallbackPerL.map((s) => ({ ...s, grams: (s.grams * toL) / fallbackFromL }));
}

function scaleWater(
  plan: WaterPlan | undefined,
  before: ComputedRecipe,
  mashWaterL: number,
  spargeL: number,
): WaterPlan | undefined {
  if (!plan || plan.mode === 'target') return plan;
  const beforeMashL = before.volumes.strikeL + before.volumes.infusionL;
  return {
    ...plan,
    mashSalts: scaleSalts(plan.mashSalts, beforeMashL, mashWaterL),
    spargeSalts: scaleSalts(plan.spargeSalts, before.volumes.spargeL, spargeL, plan.mashSalts, beforeMashL),
  };
}

function change(
  item: string,
  unit: ScaleChange['unit'],
  from: number,
  to: number,
  linear: number,
  reason: string,
): ScaleChange {
  const nonLinear =
    unit === '°C'
      ? Math.abs(to - linear) > TEMPERATURE_TOLERANCE_C
      : linear === 0
        ? to !== 0
        : Math.abs(to - linear) / Math.abs(linear) > NON_LINEAR_TOLERANCE;
  return { item, unit, from, to, linear, nonLinear, reason };
}

function hopLabel(hop: { name: string; use: string; minutes: number }): string {
  return hop.use === 'dryHop' ? `hop: ${hop.name} dry hop` : `hop: ${hop.name} ${hop.use} ${hop.minutes} min`;
}

function listChanges(
  recipe: RecipeInput,
  before: ComputedRecipe,
  after: ComputedRecipe,
  ratio: number,
  source: EquipmentProfile,
  target: EquipmentProfile,
): ScaleChange[] {
  const changes: ScaleChange[] = [];
  const effNote = `re-solved for OG ${after.og.toFixed(3)} at ${(target.brewhouseEfficiency * 100).toFixed(0)} % efficiency (was ${(source.brewhouseEfficiency * 100).toFixed(0)} %)`;
  before.fermentables.forEach((f, i) => {
    const g = after.fermentables[i]!;
    const late = f.stage !== 'mash' ? '; kettle and fermenter sugars count at 100 %' : '';
    changes.push(change(`fermentable: ${f.name}`, 'kg', f.weightKg, g.weightKg, f.weightKg * ratio, effNote + late));
  });
  before.hops.forEach((h, i) => {
    const g = after.hops[i]!;
    const reason =
      h.ibu > 0
        ? `re-solved for ${h.ibu.toFixed(1)} IBU; boil gravity ${after.preBoilGravity.toFixed(3)}–${after.postBoilGravity.toFixed(3)} (was ${before.preBoilGravity.toFixed(3)}–${before.postBoilGravity.toFixed(3)})`
        : 'no bitterness: scaled with batch volume';
    changes.push(change(hopLabel(h), 'g', h.weightG, g.weightG, h.weightG * ratio, reason));
  });
  const saltChanges = (
    where: 'mash' | 'sparge',
    from: readonly SaltAddition[],
    to: readonly SaltAddition[],
    volumeNote: string,
  ): void => {
    const ids = new Set([...from.map((s) => s.salt), ...to.map((s) => s.salt)]);
    for (const id of ids) {
      const a = from.filter((s) => s.salt === id).reduce((t, s) => t + s.grams, 0);
      const b = to.filter((s) => s.salt === id).reduce((t, s) => t + s.grams, 0);
      changes.push(change(`${where} salt: ${id}`, 'g', a, b, a * ratio, `same ppm in ${volumeNote}`));
    }
  };
  if (before.water && after.water) {
    saltChanges(
      'mash',
      before.water.mashSalts,
      after.water.mashSalts,
      `${(after.volumes.strikeL + after.volumes.infusionL).toFixed(1)} L of mash water`,
    );
    saltChanges(
      'sparge',
      before.water.spargeSalts,
      after.water.spargeSalts,
      `${after.volumes.spargeL.toFixed(1)} L of sparge water`,
    );
  }
  before.adjuncts.forEach((a, i) => {
    const b = after.adjuncts[i]!;
    const fixed = recipe.adjuncts[i]!.rule.basis === 'fixedPerBatch';
    changes.push(
      change(
        `adjunct: ${a.name}`,
        a.amount.unit,
        a.amount.value,
        b.amount.value,
        a.amount.value * ratio,
        fixed ? 'fixed per batch' : 'dose per volume of beer',
      ),
    );
  });
  changes.push(
    change(
      'strike temperature',
      '°C',
      before.strikeTempC,
      after.strikeTempC,
      before.strikeTempC,
      `mash thickness ${after.thicknessLPerKg.toFixed(2)} L/kg (was ${before.thicknessLPerKg.toFixed(2)})`,
    ),
  );
  const volumeNote = 'depends on grain weight, boil-off, dead space and losses, not only batch size';
  const v0 = before.volumes;
  const v1 = after.volumes;
  changes.push(
    change('strike water', 'L', v0.strikeL, v1.strikeL, v0.strikeL * ratio, 'grain weight × mash thickness'),
  );
  changes.push(change('sparge water', 'L', v0.spargeL, v1.spargeL, v0.spargeL * ratio, volumeNote));
  changes.push(change('total water', 'L', v0.totalWaterL, v1.totalWaterL, v0.totalWaterL * ratio, volumeNote));
  changes.push(change('pre-boil volume', 'L', v0.preBoilL, v1.preBoilL, v0.preBoilL * ratio, volumeNote));
  changes.push(change('post-boil volume', 'L', v0.postBoilL, v1.postBoilL, v0.postBoilL * ratio, volumeNote));
  return changes;
}

/**
 * Restates a recipe written for `source` equipment on `target` equipment:
 * fermentables re-solved for the same OG at the target efficiency (same % by
 * weight), hops re-solved for the same IBU per addition at the target's boil
 * gravity (dry hops and other non-bittering additions scale with volume), salts
 * recomputed for the same ppm in the target's mash and sparge water, adjuncts
 * by their dose rules, and volumes and strike temperature recomputed.
 * Returns both computations, every change with its proportional expectation,
 * and the target's warnings (e.g. mash tun or kettle overfilled).
 */
export function scaleRecipe(recipe: RecipeInput, source: EquipmentProfile, target: EquipmentProfile): ScaledRecipe {
  const before = computeRecipe(recipe, source);
  const volumeRatio = target.batchVolumeL / source.batchVolumeL;
  const grainBill = scaleGrainBill(recipe, before, target);
  const wort = planWort({ ...recipe, grainBill }, target);
  const hops: HopAddition[] = recipe.hops.map((hop, i) => {
    const ibu = before.hops[i]!.ibu;
    const weightG =
      ibu > 0
        ? hopWeightForIbu(ibu, hop, wort.boilGravity, target.batchVolumeL, `hops.${i}`)
        : hop.weightG * volumeRatio;
    return { ...hop, weightG };
  });
  const water = scaleWater(recipe.water, before, wort.mashWaterL, wort.volumes.spargeL);
  const scaled: RecipeInput = { ...recipe, grainBill, hops, ...(water ? { water } : {}) };
  const after = computeRecipe(scaled, target);
  const changes = listChanges(recipe, before, after, volumeRatio, source, target);
  return {
    recipe: scaled,
    volumeRatio,
    before,
    after,
    changes,
    nonLinearChanges: changes.filter((c) => c.nonLinear),
    warnings: after.warnings,
  };
}
