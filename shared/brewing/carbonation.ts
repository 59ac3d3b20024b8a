/**
 * Carbonation: CO2 volumes ↔ head pressure, CO2 left after fermentation, and
 * priming sugar. "Volumes" = litres of CO2 (at 0 °C, 1 atm) per litre of beer.
 */
import { MOLAR_MASS } from './atomic-weights';
import { BrewingInputError, requireInRange, requirePositive } from './errors';
import { cToF, kpaToPsi, psiToKpa } from '../quantities/convert';

/** Temperatures the carbonation fits are used over, °C (about 28–86 °F). */
const MIN_TEMP_C = -2;
const MAX_TEMP_C = 30;
/** Highest CO2 level accepted, volumes. */
const MAX_VOLUMES = 5;

const requireBeerTemp = (tempC: number, field = 'tempC'): number =>
  requireInRange(tempC, field, MIN_TEMP_C, MAX_TEMP_C, 'Beer temperature (°C)');
const requireVolumes = (volumes: number, field = 'volumes'): number =>
  requireInRange(volumes, field, 0, MAX_VOLUMES, 'CO2 volumes', true);

/* Regression of the standard brewing carbonation table (equilibrium CO2 in
 * beer vs temperature and gauge pressure), widely circulated among brewers;
 * original author not confirmed (from memory):
 * P_psig = −16.6999 − 0.0101059·T + 0.00116512·T² + 0.173354·T·V + 4.24267·V − 0.0684226·V², T in °F, V in volumes. */
const FIT = { c0: -16.6999, t: -0.0101059, t2: 0.00116512, tv: 0.173354, v: 4.24267, v2: -0.0684226 } as const;

function fitPsi(tempF: number, volumes: number): number {
  return (
    FIT.c0 +
    FIT.t * tempF +
    FIT.t2 * tempF * tempF +
    FIT.tv * tempF * volumes +
    FIT.v * volumes +
    FIT.v2 * volumes * volumes
  );
}

/**
 * Gauge head pressure, psi, that holds `volumes` of CO2 at `tempF` (see the
 * regression above). Throws when the beer would hold that much CO2 without
 * any head pressure at that temperature.
 */
export function headPressurePsi(tempF: number, volumes: number): number {
  requireInRange(tempF, 'tempF', cToF(MIN_TEMP_C), cToF(MAX_TEMP_C), 'Beer temperature (°F)');
  requireVolumes(volumes);
  const psi = fitPsi(tempF, volumes);
  if (psi < 0) {
    throw new BrewingInputError(
      'volumes',
      `At this temperature beer holds more than ${volumes} volumes at zero gauge pressure; no head pressure is needed.`,
    );
  }
  return psi;
}

/** Gauge head pressure, kPa, for `volumes` of CO2 at `tempC` (the same regression, converted). */
export function headPressureKpa(tempC: number, volumes: number): number {
  return psiToKpa(headPressurePsi(cToF(requireBeerTemp(tempC)), volumes));
}

/**
 * Equilibrium CO2 volumes at a gauge pressure (kPa) and temperature (°C): the
 * regression solved for V (the smaller root of its quadratic in V, the one in
 * the table's range).
 */
export function co2VolumesAtPressure(tempC: number, pressureKpaGauge: number): number {
  const tempF = cToF(requireBeerTemp(tempC));
  const psi = kpaToPsi(requireInRange(pressureKpaGauge, 'pressureKpa', 0, psiToKpa(60), 'Head pressure (kPa gauge)'));
  // 0 = α·V² + β·V + γ with α < 0; smaller root written in the cancellation-free form.
  const alpha = FIT.v2;
  const beta = FIT.v + FIT.tv * tempF;
  const gamma = FIT.c0 + FIT.t * tempF + FIT.t2 * tempF * tempF - psi;
  const root = (-2 * gamma) / (beta + Math.sqrt(beta * beta - 4 * alpha * gamma));
  return requireVolumes(root, 'pressureKpa');
}

/**
 * CO2 left in beer after fermentation, volumes, from the warmest temperature
 * it reached (°C; converted to °F for the fit):
 * V = 3.0378 − 0.050062·T + 0.00026555·T², T in °F (regression of CO2
 * solubility at 1 atm widely used for priming calculations; from memory).
 */
export function residualCo2Volumes(tempC: number): number {
  const t = cToF(requireInRange(tempC, 'tempC', 0, MAX_TEMP_C, 'Fermentation temperature (°C)'));
  return 3.0378 - 0.050062 * t + 0.00026555 * t * t;
}

/** Ideal-gas molar volume at 0 °C and 101.325 kPa, L/mol (CODATA 2018: 22.413 969 54). */
export const MOLAR_VOLUME_L = 22.41396954;
/** Grams of CO2 in one "volume" per litre of beer = M(CO2)/molar volume ≈ 1.96 g/L. */
export const CO2_G_PER_L_PER_VOLUME = MOLAR_MASS.carbonDioxide / MOLAR_VOLUME_L;

export type PrimingSugar = 'dextrose' | 'dextroseMonohydrate' | 'sucrose';

/**
 * Grams of CO2 per gram of sugar, by fermentation stoichiometry
 * (C6H12O6 → 2 C2H5OH + 2 CO2; sucrose hydrolyses to two hexoses → 4 CO2).
 * Assumes the sugar ferments completely; yeast growth is ignored.
 */
export const CO2_YIELD_G_PER_G: Readonly<Record<PrimingSugar, number>> = {
  dextrose: (2 * MOLAR_MASS.carbonDioxide) / MOLAR_MASS.glucose,
  dextroseMonohydrate: (2 * MOLAR_MASS.carbonDioxide) / (MOLAR_MASS.glucose + MOLAR_MASS.water),
  sucrose: (4 * MOLAR_MASS.carbonDioxide) / MOLAR_MASS.sucrose,
};

export interface PrimingResult {
  /** Sugar to add, g (0 when the beer already holds the target). */
  grams: number;
  residualVolumes: number;
  /** Target − residual; zero or negative means no sugar is needed. */
  co2ToAddVolumes: number;
}

/**
 * Priming sugar for bottle or keg conditioning.
 * grams = (target − residual) volumes × CO2 g/L per volume × litres / CO2 yield.
 * @param beerVolumeL beer to prime, L
 * @param targetVolumes CO2 target, volumes
 * @param warmestTempC warmest temperature the beer reached after fermentation, °C
 */
export function primingSugar(
  beerVolumeL: number,
  targetVolumes: number,
  warmestTempC: number,
  sugar: PrimingSugar,
): PrimingResult {
  requirePositive(beerVolumeL, 'beerVolumeL', 'Beer volume');
  requireVolumes(targetVolumes, 'targetVolumes');
  const yieldGPerG = CO2_YIELD_G_PER_G[sugar];
  if (yieldGPerG === undefined) throw new BrewingInputError('sugar', `Unknown priming sugar "${String(sugar)}".`);
  const residualVolumes = residualCo2Volumes(warmestTempC);
  const co2ToAddVolumes = targetVolumes - residualVolumes;
  const grams = co2ToAddVolumes > 0 ? (co2ToAddVolumes * CO2_G_PER_L_PER_VOLUME * beerVolumeL) / yieldGPerG : 0;
  return { grams, residualVolumes, co2ToAddVolumes };
}

/** A head pressure to set, checked against the vessel it is set on. */
export interface CarbonationSetting {
  /** Gauge head pressure to set, kPa. */
  pressureKpa: number;
  /** The vessel's rated working pressure, kPa gauge. */
  ratedKpa: number;
}

/** The units a refusal is written in: those of the screen that asked (°F and psi, or °C and kPa). */
export type CarbonationUnits = 'us' | 'metric';

/** "30.0 psi" or "207 kPa": as the carbonation card shows a pressure. */
export function formatGaugePressure(kpa: number, units: CarbonationUnits): string {
  return units === 'us' ? `${kpaToPsi(kpa).toFixed(1)} psi` : `${kpa.toFixed(0)} kPa`;
}

/**
 * The head pressure for `volumes` of CO2 at `tempC` (see {@link headPressureKpa}),
 * refused when it is above the vessel's rated working pressure: the app never
 * recommends a pressure the vessel is not rated for. The refusal is worded in
 * `units`, so a US screen reads °F and psi beside its "Rated … psi".
 */
export function carbonationSetting(
  tempC: number,
  volumes: number,
  ratedKpa: number,
  units: CarbonationUnits = 'metric',
): CarbonationSetting {
  requirePositive(ratedKpa, 'ratedKpa', "Vessel's rated working pressure (kPa)");
  const pressureKpa = headPressureKpa(tempC, volumes);
  if (pressureKpa > ratedKpa) {
    const temp = units === 'us' ? `${Number(cToF(tempC).toFixed(1))} °F` : `${Number(tempC.toFixed(1))} °C`;
    throw new BrewingInputError(
      'volumes',
      `${volumes} volumes at ${temp} needs ${formatGaugePressure(pressureKpa, units)}, above this vessel's rated working pressure of ${formatGaugePressure(ratedKpa, units)}. Chill the beer further or choose a lower target.`,
    );
  }
  return { pressureKpa, ratedKpa };
}
