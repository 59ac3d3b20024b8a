/**
 * Bitterness: Tinseth's utilisation model, its inverse, and a labelled
 * approximation for whirlpool (hop stand) additions.
 */
import {
  BrewingInputError,
  requireAlphaAcid,
  requireGravity,
  requireInRange,
  requireNonNegative,
  requirePositive,
} from './errors';
import type { HopAddition, HopSpec } from './types';

/** Tinseth bigness factor, G = boil gravity (SG): 1.65 × 0.000125^(G − 1) (G. Tinseth, "Glenn's Hop Utilization Numbers", 1995–97). */
export function tinsethBignessFactor(boilGravity: number): number {
  requireGravity(boilGravity, 'boilGravity', 'Boil gravity');
  return 1.65 * Math.pow(0.000125, boilGravity - 1);
}

/** Tinseth boil-time factor, t in minutes: (1 − e^(−0.04·t)) / 4.15 (Tinseth, as above). */
export function tinsethBoilTimeFactor(minutes: number): number {
  requireNonNegative(minutes, 'minutes', 'Minutes');
  return (1 - Math.exp(-0.04 * minutes)) / 4.15;
}

/** Tinseth utilisation (fraction of alpha acids that reach the beer as iso-alpha acids) = bigness × boil-time factor. */
export function tinsethUtilisation(boilGravity: number, minutes: number): number {
  return tinsethBignessFactor(boilGravity) * tinsethBoilTimeFactor(minutes);
}

/** Temperature at which the Tinseth numbers apply, °C (a boil at sea level). */
const BOIL_C = 100;
/** Activation temperature Ea/R of alpha-acid isomerisation, K (Malowicki & Shellhammer, J. Agric. Food Chem. 2005, k = 7.9×10¹¹·e^(−11858/T) min⁻¹; from memory). */
const ISOMERISATION_EA_OVER_R_K = 11858;

/**
 * APPROXIMATION for whirlpool additions: relative isomerisation rate at the
 * stand temperature versus boiling, by the Arrhenius law, k(T)/k(100 °C) =
 * e^(−Ea/R·(1/T − 1/373.15 K)). 1 at 100 °C, ≈ 0.17 at 80 °C.
 */
export function whirlpoolTemperatureFactor(tempC: number): number {
  requireInRange(tempC, 'whirlpoolTempC', 0, BOIL_C, 'Whirlpool temperature', true);
  const kelvin = tempC + 273.15;
  return Math.exp(-ISOMERISATION_EA_OVER_R_K * (1 / kelvin - 1 / (BOIL_C + 273.15)));
}

/**
 * What the UI shows beside whirlpool IBU. Assumption: the stand holds its
 * temperature for its whole duration, utilisation follows Tinseth's time curve
 * scaled by the Arrhenius rate factor, and isomerisation of boil additions
 * during the stand is not counted.
 */
export const WHIRLPOOL_APPROXIMATION_NOTE =
  'Approximation: Tinseth utilisation for the stand time, scaled by the isomerisation rate at the stand temperature relative to boiling (Arrhenius). Assumes a constant stand temperature.';

/**
 * Utilisation of one hop addition, fraction. Boil: Tinseth. Whirlpool: see
 * {@link whirlpoolTemperatureFactor} (approximation). Dry hop: 0 (no
 * isomerisation in cold beer).
 */
export function hopUtilisation(hop: HopSpec, boilGravity: number, field = 'hop'): number {
  if (hop.use === 'dryHop') return 0;
  requireNonNegative(hop.minutes, `${field}.minutes`, 'Minutes');
  if (hop.use === 'boil') return tinsethUtilisation(boilGravity, hop.minutes);
  if (hop.whirlpoolTempC === undefined) {
    throw new BrewingInputError(`${field}.whirlpoolTempC`, 'A whirlpool addition needs its stand temperature.');
  }
  return tinsethUtilisation(boilGravity, hop.minutes) * whirlpoolTemperatureFactor(hop.whirlpoolTempC);
}

/**
 * IBU of one addition (Tinseth): utilisation × mg/L of alpha acids, where
 * mg/L = alpha fraction × grams × 1000 / litres of finished wort.
 * @param boilGravity average gravity over the boil (SG)
 * @param volumeL finished volume (we use the volume into the fermenter), L
 */
export function ibuForAddition(hop: HopAddition, boilGravity: number, volumeL: number, field = 'hop'): number {
  requireAlphaAcid(hop.alphaAcidPct, `${field}.alphaAcidPct`);
  requireNonNegative(hop.weightG, `${field}.weightG`, 'Hop weight');
  requirePositive(volumeL, 'volumeL', 'Volume');
  const alphaMgPerL = ((hop.alphaAcidPct / 100) * hop.weightG * 1000) / volumeL;
  return hopUtilisation(hop, boilGravity, field) * alphaMgPerL;
}

/** IBU of each addition and their sum (Tinseth; see {@link ibuForAddition}). */
export function totalIbu(
  hops: readonly HopAddition[],
  boilGravity: number,
  volumeL: number,
): { perAddition: number[]; total: number } {
  const perAddition = hops.map((hop, i) => ibuForAddition(hop, boilGravity, volumeL, `hops.${i}`));
  return { perAddition, total: perAddition.reduce((a, b) => a + b, 0) };
}

/**
 * Inverse of {@link ibuForAddition}: hop weight, g, for a target IBU.
 * Throws when the addition cannot bitter at all (dry hop, 0-minute boil).
 */
export function hopWeightForIbu(
  targetIbu: number,
  hop: HopSpec,
  boilGravity: number,
  volumeL: number,
  field = 'hop',
): number {
  requireNonNegative(targetIbu, 'targetIbu', 'Target IBU');
  requireAlphaAcid(hop.alphaAcidPct, `${field}.alphaAcidPct`);
  requirePositive(volumeL, 'volumeL', 'Volume');
  if (targetIbu === 0) return 0;
  const utilisation = hopUtilisation(hop, boilGravity, field);
  if (utilisation <= 0) {
    throw new BrewingInputError(
      `${field}.use`,
      'This addition adds no bitterness, so no weight reaches the target IBU.',
    );
  }
  return (targetIbu * volumeL) / (utilisation * (hop.alphaAcidPct / 100) * 1000);
}

/** BU:GU, IBU divided by OG gravity points (balance of bitterness to malt). */
export function buGu(ibu: number, og: number): number {
  requireNonNegative(ibu, 'ibu', 'IBU');
  requireGravity(og, 'og', 'OG');
  if (og <= 1) throw new BrewingInputError('og', 'OG must be above 1.000 for BU:GU.');
  return ibu / ((og - 1) * 1000);
}
