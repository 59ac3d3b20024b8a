/**
 * Mash and brew-day water: strike temperature and volume, infusions,
 * recirculation, and the volume chain from water to packaged beer.
 */
import {
  BrewingInputError,
  requireEfficiency,
  requireFinite,
  requireInRange,
  requireNonNegative,
  requirePositive,
} from './errors';
import type { BrewingWarning, EquipmentProfile, VolumePlan } from './types';
import { galPerLbToLPerKg } from '../quantities/convert';

/** Volume lost when wort cools from boiling (thermal contraction of water, ≈ 4 %; common practice). */
export const COOLING_SHRINKAGE = 0.04;
/** Default HLT coil effectiveness when the equipment gives none (common practice, no source). */
export const DEFAULT_HLT_COIL_EFFECTIVENESS = 0.8;
/** Volume one kg of grain adds to the mash: 0.08 US gal/lb ≈ 0.67 L/kg (common practice, no source). */
export const GRAIN_DISPLACEMENT_L_PER_KG = galPerLbToLPerKg(0.08);

function requireTemperatures(grainTemp: number, target: number, ratio: number): void {
  requireFinite(grainTemp, 'grainTemp', 'Grain temperature');
  requireFinite(target, 'targetTemp', 'Mash temperature');
  requirePositive(ratio, 'thickness', 'Mash thickness');
}

/**
 * Strike water temperature, °C. Palmer, How to Brew (metric form):
 * Tw = (0.41/r)(T2 − T1) + T2, r in L/kg, temperatures in °C.
 * (Palmer rounds the grain/water heat-capacity factor to 0.41; converting his
 * 0.2 qt/lb exactly would give 0.417, about 0.2 °C apart in practice.)
 */
export function strikeTemperatureC(grainTempC: number, targetMashC: number, thicknessLPerKg: number): number {
  requireTemperatures(grainTempC, targetMashC, thicknessLPerKg);
  return (0.41 / thicknessLPerKg) * (targetMashC - grainTempC) + targetMashC;
}

/** Strike water temperature, °F. Palmer, How to Brew: Tw = (0.2/r)(T2 − T1) + T2, r in qt/lb, temperatures in °F. */
export function strikeTemperatureF(grainTempF: number, targetMashF: number, thicknessQtPerLb: number): number {
  requireTemperatures(grainTempF, targetMashF, thicknessQtPerLb);
  return (0.2 / thicknessQtPerLb) * (targetMashF - grainTempF) + targetMashF;
}

/** Strike water volume, L = grain kg × thickness L/kg. */
export function strikeVolumeL(grainKg: number, thicknessLPerKg: number): number {
  return (
    requireNonNegative(grainKg, 'grainKg', 'Grain weight') *
    requirePositive(thicknessLPerKg, 'thicknessLPerKg', 'Mash thickness')
  );
}

/** Water retained by spent grain, L = grain kg × absorption L/kg. */
export function grainAbsorptionL(grainKg: number, absorptionLPerKg: number): number {
  return (
    requireNonNegative(grainKg, 'grainKg', 'Grain weight') *
    requireNonNegative(absorptionLPerKg, 'grainAbsorptionLPerKg', 'Grain absorption')
  );
}

/** Mash volume, L: water plus grain displacement ({@link GRAIN_DISPLACEMENT_L_PER_KG}). */
export function mashVolumeL(grainKg: number, waterL: number): number {
  return (
    requireNonNegative(grainKg, 'grainKg', 'Grain weight') * GRAIN_DISPLACEMENT_L_PER_KG +
    requireNonNegative(waterL, 'waterL', 'Water')
  );
}

export interface InfusionInput {
  grainKg: number;
  /** Water already in the mash, L. */
  mashWaterL: number;
  currentC: number;
  targetC: number;
  infusionWaterC: number;
}

function infusion(coefficient: number, grain: number, water: number, t1: number, t2: number, tw: number): number {
  requireNonNegative(grain, 'grainKg', 'Grain weight');
  requireNonNegative(water, 'mashWaterL', 'Mash water');
  requireFinite(t1, 'currentC', 'Current mash temperature');
  requireFinite(t2, 'targetC', 'Target temperature');
  requireFinite(tw, 'infusionWaterC', 'Infusion water temperature');
  if (t2 < t1) throw new BrewingInputError('targetC', 'An infusion can only raise the mash temperature.');
  if (tw <= t2)
    throw new BrewingInputError('infusionWaterC', 'Infusion water must be hotter than the target temperature.');
  return ((t2 - t1) * (coefficient * grain + water)) / (tw - t2);
}

/**
 * Hot water to add to raise the mash, L. Palmer's infusion equation in
 * metric form: Wa = (T2 − T1)(0.41·G + Wm)/(Tw − T2), G kg, Wm and Wa L, °C.
 */
export function infusionVolumeL(input: InfusionInput): number {
  return infusion(0.41, input.grainKg, input.mashWaterL, input.currentC, input.targetC, input.infusionWaterC);
}

/** Palmer, How to Brew: Wa = (T2 − T1)(0.2·G + Wm)/(Tw − T2), G lb, Wm and Wa US qt, °F. */
export function infusionVolumeQt(
  grainLb: number,
  mashWaterQt: number,
  currentF: number,
  targetF: number,
  infusionWaterF: number,
): number {
  return infusion(0.2, grainLb, mashWaterQt, currentF, targetF, infusionWaterF);
}

/**
 * HLT temperature for a recirculated (coil-in-HLT) step, °C. The HLT is
 * treated as a constant-temperature reservoir, so the coil's effectiveness
 * ε = (Tout − Tin)/(THLT − Tin) (heat-exchanger effectiveness definition,
 * Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, ε-NTU method)
 * gives THLT = Tin + (Tout − Tin)/ε. With Tin the mash runnings and Tout the
 * step temperature, this is the setpoint at the start of the ramp that does
 * not overshoot the wort returning to the mash; as the mash warms, the
 * setpoint needed falls toward the step temperature.
 */
export function hltTemperatureForRecirculationC(wortInC: number, wortOutC: number, coilEffectiveness: number): number {
  requireFinite(wortInC, 'wortInC', 'Wort temperature into the coil');
  requireFinite(wortOutC, 'wortOutC', 'Wort temperature out of the coil');
  requireEfficiency(coilEffectiveness, 'hltCoilEffectiveness', 'Coil effectiveness');
  return wortInC + (wortOutC - wortInC) / coilEffectiveness;
}

/** Pre-boil volume, L = post-boil volume + boil-off L/h × minutes / 60. */
export function preBoilVolumeL(postBoilL: number, boilOffLPerHour: number, boilMinutes: number): number {
  requireNonNegative(postBoilL, 'postBoilL', 'Post-boil volume');
  requireNonNegative(boilOffLPerHour, 'boilOffLPerHour', 'Boil-off rate');
  requireNonNegative(boilMinutes, 'boilMinutes', 'Boil time');
  return postBoilL + (boilOffLPerHour * boilMinutes) / 60;
}

/**
 * Hot post-boil volume, L, to deliver `intoFermenterL`. What leaves the kettle
 * (fermenter volume + trub/chiller loss) shrinks on cooling by `shrinkage`,
 * and the kettle dead space stays behind hot:
 * post-boil = (into fermenter + trub/chiller) / (1 − shrinkage) + kettle dead space.
 */
export function postBoilVolumeL(
  intoFermenterL: number,
  trubChillerLossL: number,
  kettleDeadSpaceL: number,
  shrinkage = COOLING_SHRINKAGE,
): number {
  requirePositive(intoFermenterL, 'batchVolumeL', 'Batch volume');
  requireNonNegative(trubChillerLossL, 'trubChillerLossL', 'Trub and chiller loss');
  requireNonNegative(kettleDeadSpaceL, 'kettleDeadSpaceL', 'Kettle dead space');
  requireInRange(shrinkage, 'coolingShrinkage', 0, 0.2, 'Cooling shrinkage');
  return (intoFermenterL + trubChillerLossL) / (1 - shrinkage) + kettleDeadSpaceL;
}

/** Checks every number in an equipment profile; throws BrewingInputError on the first bad one. */
export function validateEquipment(equipment: EquipmentProfile, field = 'equipment'): void {
  requirePositive(equipment.batchVolumeL, `${field}.batchVolumeL`, 'Batch volume');
  requireEfficiency(equipment.brewhouseEfficiency, `${field}.brewhouseEfficiency`, 'Brewhouse efficiency');
  requireNonNegative(equipment.boilOffLPerHour, `${field}.boilOffLPerHour`, 'Boil-off rate');
  requireNonNegative(equipment.boilMinutes, `${field}.boilMinutes`, 'Boil time');
  requireNonNegative(equipment.mashTunDeadSpaceL, `${field}.mashTunDeadSpaceL`, 'Mash tun dead space');
  requireNonNegative(equipment.kettleDeadSpaceL, `${field}.kettleDeadSpaceL`, 'Kettle dead space');
  requireNonNegative(equipment.trubChillerLossL, `${field}.trubChillerLossL`, 'Trub and chiller loss');
  requireNonNegative(equipment.fermenterLossL, `${field}.fermenterLossL`, 'Fermenter loss');
  requireNonNegative(equipment.grainAbsorptionLPerKg, `${field}.grainAbsorptionLPerKg`, 'Grain absorption');
  requirePositive(equipment.maxMashTunVolumeL, `${field}.maxMashTunVolumeL`, 'Mash tun capacity');
  requirePositive(equipment.maxKettleVolumeL, `${field}.maxKettleVolumeL`, 'Kettle capacity');
  requirePositive(equipment.mashThicknessLPerKg, `${field}.mashThicknessLPerKg`, 'Mash thickness');
  if (equipment.coolingShrinkage !== undefined)
    requireInRange(equipment.coolingShrinkage, `${field}.coolingShrinkage`, 0, 0.2, 'Cooling shrinkage');
  if (equipment.hltCoilEffectiveness !== undefined)
    requireEfficiency(equipment.hltCoilEffectiveness, `${field}.hltCoilEffectiveness`, 'Coil effectiveness');
  if (equipment.fermenterLossL >= equipment.batchVolumeL) {
    throw new BrewingInputError(`${field}.fermenterLossL`, 'Fermenter loss must be smaller than the batch volume.');
  }
}

/**
 * The brew day's volumes, L, working back from the fermenter:
 * into fermenter → knockout (+ trub/chiller) → hot post-boil (÷ (1 − shrinkage),
 * + kettle dead space) → pre-boil (+ boil-off) → total water (+ grain absorption
 * + mash tun dead space) → sparge = total − strike − infusions.
 * @param mashGrainKg grain in the mash, kg
 * @param thicknessLPerKg strike water ratio, L/kg
 * @param infusionL water added by later infusion steps, L
 */
export function planVolumes(
  equipment: EquipmentProfile,
  mashGrainKg: number,
  thicknessLPerKg: number,
  infusionL = 0,
): { volumes: VolumePlan; warnings: BrewingWarning[] } {
  validateEquipment(equipment);
  const warnings: BrewingWarning[] = [];
  const shrinkage = equipment.coolingShrinkage ?? COOLING_SHRINKAGE;
  const intoFermenterL = equipment.batchVolumeL;
  const knockoutL = intoFermenterL + equipment.trubChillerLossL;
  const postBoilL = postBoilVolumeL(intoFermenterL, equipment.trubChillerLossL, equipment.kettleDeadSpaceL, shrinkage);
  const preBoilL = preBoilVolumeL(postBoilL, equipment.boilOffLPerHour, equipment.boilMinutes);
  const absorptionL = grainAbsorptionL(mashGrainKg, equipment.grainAbsorptionLPerKg);
  const totalWaterL = preBoilL + absorptionL + equipment.mashTunDeadSpaceL;
  const strikeL = strikeVolumeL(mashGrainKg, thicknessLPerKg);
  requireNonNegative(infusionL, 'infusionL', 'Infusion volume');
  let spargeL = totalWaterL - strikeL - infusionL;
  if (spargeL < 0) {
    warnings.push({
      code: 'strikeExceedsTotalWater',
      field: 'mash.thicknessLPerKg',
      message: `Mash water exceeds the total water needed by ${(-spargeL).toFixed(1)} L: no sparge, and the pre-boil volume will run over plan. Use a thicker mash.`,
    });
    spargeL = 0;
  }
  const fullestMashL = mashVolumeL(mashGrainKg, strikeL + infusionL);
  if (fullestMashL > equipment.maxMashTunVolumeL) {
    warnings.push({
      code: 'mashTunOverfilled',
      field: 'equipment.maxMashTunVolumeL',
      message: `The mash needs ${fullestMashL.toFixed(1)} L but the mash tun holds ${equipment.maxMashTunVolumeL.toFixed(1)} L.`,
    });
  }
  if (preBoilL > equipment.maxKettleVolumeL) {
    warnings.push({
      code: 'kettleOverfilled',
      field: 'equipment.maxKettleVolumeL',
      message: `The pre-boil volume is ${preBoilL.toFixed(1)} L but the kettle holds ${equipment.maxKettleVolumeL.toFixed(1)} L.`,
    });
  }
  return {
    volumes: {
      strikeL,
      infusionL,
      spargeL,
      totalWaterL,
      grainAbsorptionL: absorptionL,
      mashVolumeL: fullestMashL,
      preBoilL,
      postBoilL,
      knockoutL,
      intoFermenterL,
      packagedL: intoFermenterL - equipment.fermenterLossL,
    },
    warnings,
  };
}
