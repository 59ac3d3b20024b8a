import { BrewingInputError } from './errors';
import { gravityPoints } from './gravity';

/**
 * Brewhouse efficiency achieved on the day, fraction 0–1.
 *
 * Extract delivered is gravity points × volume (Palmer, "How to Brew", 4th ed., ch. 12: efficiency is
 * points delivered ÷ points available). The points available are fixed by the grain bill, so measured
 * against the plan: achieved = planned efficiency × (actual points × actual volume) ÷ (planned points × planned volume).
 * Gravities as SG, volumes in L (both measured at the same point, e.g. knockout).
 */
export function achievedEfficiency(input: {
  plannedEfficiency: number;
  plannedOg: number;
  plannedVolumeL: number;
  actualOg: number;
  actualVolumeL: number;
}): number {
  const { plannedEfficiency, plannedVolumeL, actualVolumeL } = input;
  if (!(plannedEfficiency > 0 && plannedEfficiency <= 1)) {
    throw new BrewingInputError('plannedEfficiency', 'Planned efficiency must be between 0 and 1');
  }
  if (!(plannedVolumeL > 0)) throw new BrewingInputError('plannedVolumeL', 'Planned volume must be above 0 L');
  if (!(actualVolumeL >= 0) || !Number.isFinite(actualVolumeL)) {
    throw new BrewingInputError('actualVolumeL', 'Actual volume must be 0 L or more');
  }
  const planned = gravityPoints(input.plannedOg, 'plannedOg') * plannedVolumeL;
  if (planned <= 0) throw new BrewingInputError('plannedOg', 'Planned OG must be above 1.000');
  return (plannedEfficiency * gravityPoints(input.actualOg, 'actualOg') * actualVolumeL) / planned;
}
