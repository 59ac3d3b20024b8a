/**
 * Kettlewright brewing calculations: pure functions, SI units inside
 * (kg, g, L, mL, °C, kPa, minutes; gravity as SG). Every function throws
 * {@link BrewingInputError} on impossible input rather than returning NaN.
 * The TSDoc on each function states its units; this file only re-exports.
 */
export * from './types';
export { BrewingInputError, MIN_SG, MAX_SG, MAX_ALPHA_ACID_PCT, PERCENT_SUM_TOLERANCE } from './errors';
export * from '../quantities/convert';
export {
  sgToPlato,
  platoToSg,
  gravityPoints,
  sgFromPoints,
  SUCROSE_PPG,
  extractPctToPpg,
  ppgToExtractPct,
  potentialPointLitresPerKg,
  ogFromFermentables,
  fgFromAttenuation,
  abv,
  abvSimple,
  abvBalling,
  abvHall,
  ABV_METHOD_SHOWN,
  type AbvMethod,
  realExtractPlato,
  apparentAttenuation,
  realAttenuation,
  type GravitySource,
} from './gravity';
export { weightsForTargetOg, percentagesFromWeights, type BillShare } from './grain-bill';
export {
  tinsethBignessFactor,
  tinsethBoilTimeFactor,
  tinsethUtilisation,
  whirlpoolTemperatureFactor,
  WHIRLPOOL_APPROXIMATION_NOTE,
  hopUtilisation,
  ibuForAddition,
  totalIbu,
  hopWeightForIbu,
  buGu,
} from './bitterness';
export {
  maltColourUnits,
  moreySrm,
  srmFromFermentables,
  srmToEbc,
  ebcToSrm,
  srmToRgb,
  srmToHex,
  type Rgb,
  type ColourSource,
} from './colour';
export { ATOMIC_WEIGHTS, MOLAR_MASS, molarMass } from './atomic-weights';
export { nnls, type NnlsResult } from './nnls';
export {
  ION_KEYS,
  DISTILLED_WATER,
  SALTS,
  SALT_IDS,
  type SaltInfo,
  ionContribution,
  waterAfterAdditions,
  mashAndSpargeProfiles,
  solveSaltAdditions,
  type SaltSolveInput,
  type SaltSolution,
  residualAlkalinity,
  chlorideSulfateRatio,
} from './water';
export {
  COOLING_SHRINKAGE,
  DEFAULT_HLT_COIL_EFFECTIVENESS,
  GRAIN_DISPLACEMENT_L_PER_KG,
  strikeTemperatureC,
  strikeTemperatureF,
  strikeVolumeL,
  grainAbsorptionL,
  mashVolumeL,
  infusionVolumeL,
  infusionVolumeQt,
  type InfusionInput,
  hltTemperatureForRecirculationC,
  preBoilVolumeL,
  postBoilVolumeL,
  validateEquipment,
  planVolumes,
} from './mash-water';
export {
  headPressurePsi,
  headPressureKpa,
  co2VolumesAtPressure,
  residualCo2Volumes,
  primingSugar,
  carbonationSetting,
  formatGaugePressure,
  type CarbonationSetting,
  type CarbonationUnits,
  MOLAR_VOLUME_L,
  CO2_G_PER_L_PER_VOLUME,
  CO2_YIELD_G_PER_G,
  type PrimingSugar,
  type PrimingResult,
} from './carbonation';
export {
  doseBasisLabel,
  doseUnitLabel,
  doseRangeLabel,
  convertDoseRule,
  validateDoseRule,
  doseAmount,
  doseRange,
  doseLevelFromAmount,
  scaleDose,
  isWithinRange,
  PRACTICAL_EQUIVALENTS,
  type PracticalEquivalent,
  convertPractical,
  roundForMeasuring,
  TYPICAL_SUGAR_PCT,
} from './adjuncts';
export { computeRecipe, planWort, resolveGrainBill, hopWeightsForIbuShares, type WortPlan } from './recipe';
export { scaleRecipe } from './scaling';
export {
  predictFermentation,
  SETTLED_POINTS,
  dRestTriggerSg,
  DEFAULT_WORT_CORRECTION,
  refractometerWortSg,
  refractometerBeerSg,
  refractometerSg,
  crossesDRestTrigger,
  STALL_MAX_FALL_POINTS,
  STALL_WINDOW_HOURS,
  roundSg,
  gravityStalled,
  readingOverdue,
  type GravityPoint,
  type FermentationPrediction,
} from './fermentation';
export {
  KEG_SIZES,
  KEG_SIZE_IDS,
  lineVolumeL,
  packagingTotals,
  packagingLoss,
  PLAUSIBLE_PACKAGING_LOSS,
  type PackagingSource,
  type KegSize,
  type PackageLine,
  type PackagingTotals,
} from './packaging';
export { achievedEfficiency } from './efficiency';
export { targetWarnings, waterDoseWarnings, TARGET_TOLERANCE, ION_CEILINGS_PPM, type RecipeTargets } from './checks';
