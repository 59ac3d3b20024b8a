/**
 * Example equipment and a full example recipe, used by tests and the scaling
 * bench, and handy as seed data. Numbers are plausible, not measured.
 */
import type { EquipmentProfile, RecipeInput, WaterProfile } from './types';
import { usBblToL, usGalToL } from '../quantities/convert';

/** A 10 US gal pilot system. */
export const PILOT_SYSTEM: EquipmentProfile = {
  name: 'Pilot 10 gal',
  batchVolumeL: usGalToL(10),
  brewhouseEfficiency: 0.72,
  boilOffLPerHour: 6,
  boilMinutes: 60,
  mashTunDeadSpaceL: 2,
  kettleDeadSpaceL: 1.5,
  trubChillerLossL: 2,
  fermenterLossL: 2,
  grainAbsorptionLPerKg: 1.0,
  maxMashTunVolumeL: 75,
  maxKettleVolumeL: 75,
  mashThicknessLPerKg: 3.0,
  hltCoilEffectiveness: 0.8,
};

/** A 10 US bbl production brewhouse. */
export const TEN_BBL_BREWHOUSE: EquipmentProfile = {
  name: '10 bbl brewhouse',
  batchVolumeL: usBblToL(10),
  brewhouseEfficiency: 0.82,
  boilOffLPerHour: 80,
  boilMinutes: 75,
  mashTunDeadSpaceL: 40,
  kettleDeadSpaceL: 20,
  trubChillerLossL: 60,
  fermenterLossL: 50,
  grainAbsorptionLPerKg: 0.9,
  maxMashTunVolumeL: 1500,
  maxKettleVolumeL: 1700,
  mashThicknessLPerKg: 2.8,
  hltCoilEffectiveness: 0.85,
};

/** Soft source water (example). */
export const SOFT_WATER: WaterProfile = {
  calciumPpm: 12,
  magnesiumPpm: 3,
  sodiumPpm: 8,
  sulfatePpm: 10,
  chloridePpm: 12,
  bicarbonatePpm: 40,
};

/**
 * A 25-line example (8 fermentables, 8 hops, 4 salts, 3 adjuncts/spices,
 * 2 mash steps) written for {@link PILOT_SYSTEM}.
 */
export const EXAMPLE_IPA: RecipeInput = {
  name: 'Orchard IPA',
  grainBill: {
    mode: 'weight',
    items: [
      { name: 'Pale malt', potential: { ppg: 37 }, colourLovibond: 1.8, stage: 'mash', weightKg: 6.2 },
      { name: 'Munich malt', potential: { ppg: 35 }, colourLovibond: 9, stage: 'mash', weightKg: 0.9 },
      { name: 'Wheat malt', potential: { extractPct: 81 }, colourLovibond: 2, stage: 'mash', weightKg: 0.6 },
      { name: 'Oat flakes', potential: { ppg: 33 }, colourLovibond: 1, stage: 'mash', weightKg: 0.4 },
      { name: 'Crystal 40', potential: { ppg: 34 }, colourLovibond: 40, stage: 'mash', weightKg: 0.35 },
      { name: 'Crystal 120', potential: { ppg: 33 }, colourLovibond: 120, stage: 'mash', weightKg: 0.08 },
      { name: 'Cane sugar', potential: { extractPct: 100 }, colourLovibond: 0, stage: 'kettle', weightKg: 0.3 },
      { name: 'Honey', potential: { extractPct: 76 }, colourLovibond: 2, stage: 'fermenter', weightKg: 0.25 },
    ],
  },
  hops: [
    { name: 'Bittering', alphaAcidPct: 13.5, use: 'boil', minutes: 60, weightG: 28 },
    { name: 'Citrus A', alphaAcidPct: 11, use: 'boil', minutes: 30, weightG: 14 },
    { name: 'Citrus A', alphaAcidPct: 11, use: 'boil', minutes: 15, weightG: 20 },
    { name: 'Pine B', alphaAcidPct: 12.5, use: 'boil', minutes: 5, weightG: 28 },
    { name: 'Pine B', alphaAcidPct: 12.5, use: 'boil', minutes: 0, weightG: 28 },
    { name: 'Stone fruit C', alphaAcidPct: 14, use: 'whirlpool', minutes: 20, whirlpoolTempC: 80, weightG: 56 },
    { name: 'Citrus A', alphaAcidPct: 11, use: 'whirlpool', minutes: 20, whirlpoolTempC: 80, weightG: 42 },
    { name: 'Stone fruit C', alphaAcidPct: 14, use: 'dryHop', minutes: 0, weightG: 110 },
  ],
  yeast: { name: 'Clean ale yeast', attenuationPct: 78, pitchRateMillionCellsPerMlPerPlato: 0.75 },
  mash: {
    grainTempC: 18,
    steps: [
      { name: 'Saccharification', tempC: 66, minutes: 60, method: 'infusion' },
      { name: 'Mash out', tempC: 76, minutes: 10, method: 'infusion', infusionWaterTempC: 95 },
    ],
  },
  water: {
    mode: 'additions',
    source: SOFT_WATER,
    mashSalts: [
      { salt: 'gypsum', grams: 6 },
      { salt: 'calciumChlorideDihydrate', grams: 2 },
    ],
    spargeSalts: [
      { salt: 'gypsum', grams: 2.5 },
      { salt: 'calciumChlorideDihydrate', grams: 0.8 },
    ],
  },
  adjuncts: [
    {
      name: 'Apricot purée',
      category: 'fruit',
      stage: 'fermenter',
      rule: { basis: 'lbPerUsGal', low: 0.5, high: 2 },
      level: 1,
    },
    {
      name: 'Coriander seed, crushed',
      category: 'spice',
      stage: 'boil',
      boilMinutes: 5,
      rule: { basis: 'tspPer5UsGal', low: 0.5, high: 2 },
      level: 1,
    },
    {
      name: 'Sweet orange peel',
      category: 'spice',
      stage: 'whirlpool',
      rule: { basis: 'gPerHl', low: 20, high: 60 },
      level: 35,
    },
  ],
};
