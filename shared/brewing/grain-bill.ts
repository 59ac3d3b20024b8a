/**
 * Grain bill: percentages ↔ weights. Recipes travel as percentages by weight
 * plus a target OG; each brewhouse turns them into weights at its own
 * efficiency and volume.
 */
import {
  BrewingInputError,
  requireEfficiency,
  requireGravity,
  requireNonNegative,
  requirePercentSum,
  requirePositive,
} from './errors';
import { potentialPointLitresPerKg, stageEfficiency } from './gravity';
import type { FermentablePotential, FermentableStage } from './types';

/** A share of the bill for the weight solver. */
export interface BillShare {
  percent: number;
  potential: FermentablePotential;
  stage: FermentableStage;
}

/**
 * Weights for a target OG. With total weight W and shares fᵢ, the points
 * needed (OG − 1)·1000·V equal W·Σ fᵢ·potentialᵢ·effᵢ (extract-potential
 * method), so W follows directly; mash items at brewhouse efficiency, kettle
 * and fermenter items at 100 %.
 * @param targetOg specific gravity
 * @param brewhouseEfficiency fraction in (0, 1]
 * @param volumeL volume into the fermenter, L
 * @returns weight of each item, kg, in input order
 */
export function weightsForTargetOg(
  items: readonly BillShare[],
  targetOg: number,
  brewhouseEfficiency: number,
  volumeL: number,
  field = 'grainBill.items',
): number[] {
  requirePercentSum(
    items.map((i) => i.percent),
    field,
  );
  requireGravity(targetOg, 'targetOg', 'Target OG');
  requireEfficiency(brewhouseEfficiency, 'brewhouseEfficiency', 'Brewhouse efficiency');
  requirePositive(volumeL, 'volumeL', 'Volume');
  const pointsNeeded = (targetOg - 1) * 1000 * volumeL;
  let perKg = 0;
  items.forEach((item, i) => {
    perKg +=
      (item.percent / 100) *
      potentialPointLitresPerKg(item.potential, `${field}.${i}.potential`) *
      stageEfficiency(item.stage, brewhouseEfficiency);
  });
  if (perKg <= 0) {
    if (pointsNeeded === 0) return items.map(() => 0);
    throw new BrewingInputError(
      field,
      'None of these fermentables gives any extract, so no weight reaches the target OG.',
    );
  }
  const totalKg = pointsNeeded / perKg;
  if (totalKg < 0) throw new BrewingInputError('targetOg', 'Target OG must be at least 1.000 to solve a grain bill.');
  return items.map((item) => (totalKg * item.percent) / 100);
}

/** Weights (kg, or any one mass unit) → percentages of the total, summing to 100. */
export function percentagesFromWeights(weightsKg: readonly number[], field = 'grainBill.items'): number[] {
  let total = 0;
  weightsKg.forEach((w, i) => {
    total += requireNonNegative(w, `${field}.${i}.weightKg`, 'Weight');
  });
  if (total <= 0)
    throw new BrewingInputError(field, 'The grain bill needs at least one fermentable with a weight above zero.');
  return weightsKg.map((w) => (w / total) * 100);
}
