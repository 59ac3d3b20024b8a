import type { AmountsMessage } from '../quantities';
/**
 * Shared types for recipes, equipment and computed results. All quantities are
 * SI unless the name says otherwise: kg, g, L, mL, °C, kPa, minutes. Gravities
 * are specific gravity (e.g. 1.052). Fractions are 0–1; names ending in `Pct`
 * are percentages 0–100.
 */

// ---------------------------------------------------------------- fermentables

/**
 * Extract potential of a fermentable: gravity points per pound per US gallon
 * (`ppg`, e.g. 37 for a base malt), or laboratory extract as a percentage of
 * sucrose (`extractPct`, e.g. 80 for a base malt, 100 for sucrose).
 */
export type FermentablePotential = { ppg: number } | { extractPct: number };

/**
 * Where a fermentable goes. `mash` yields at brewhouse efficiency; `kettle`
 * and `fermenter` additions (sugars, honey, extract) dissolve fully and count
 * at 100 %. Fermenter additions count toward OG (they are fermented like wort)
 * but not toward the boil gravity used for hop utilisation.
 */
export type FermentableStage = 'mash' | 'kettle' | 'fermenter';

/** A fermentable without an amount. */
export interface FermentableSpec {
  name: string;
  potential: FermentablePotential;
  /** Colour in degrees Lovibond. */
  colourLovibond: number;
  stage: FermentableStage;
}

/** A fermentable written as a weight. */
export interface WeighedFermentable extends FermentableSpec {
  weightKg: number;
}

/** A fermentable written as a share of the bill, by weight. */
export interface SharedFermentable extends FermentableSpec {
  /** Percentage of the total fermentable weight (all items sum to 100). */
  percent: number;
}

/**
 * A grain bill. Weights are tied to the equipment they were written for;
 * percentages plus a target OG travel between brewhouses unchanged.
 */
export type GrainBill =
  { mode: 'weight'; items: WeighedFermentable[] } | { mode: 'percent'; targetOg: number; items: SharedFermentable[] };

// ------------------------------------------------------------------------ hops

/** `boil`: timed by minutes remaining; `whirlpool`: hop stand below boiling; `dryHop`: in the fermenter (0 IBU). */
export type HopUse = 'boil' | 'whirlpool' | 'dryHop';

/** A hop addition without its weight. */
export interface HopSpec {
  name: string;
  /** Alpha acid, % by weight, in (0, 30]. */
  alphaAcidPct: number;
  use: HopUse;
  /** boil: minutes remaining in the boil; whirlpool: minutes of the stand; dryHop: ignored (use 0). */
  minutes: number;
  /** Required for whirlpool: the stand temperature, °C. */
  whirlpoolTempC?: number;
}

/** A hop addition as written in a recipe. */
export interface HopAddition extends HopSpec {
  weightG: number;
}

// ----------------------------------------------------------------------- water

/** The salts the water calculator knows. */
export type SaltId =
  | 'gypsum'
  | 'calciumChlorideDihydrate'
  | 'calciumChlorideAnhydrous'
  | 'epsomSalt'
  | 'tableSalt'
  | 'bakingSoda'
  | 'chalk';

/** The ions a water profile tracks. */
export type IonKey = 'calciumPpm' | 'magnesiumPpm' | 'sodiumPpm' | 'sulfatePpm' | 'chloridePpm' | 'bicarbonatePpm';

/** Ion concentrations in mg/L (ppm). */
export type WaterProfile = Record<IonKey, number>;

/** Grams of one salt added to a volume of water. */
export interface SaltAddition {
  salt: SaltId;
  grams: number;
}

/**
 * The water plan. `additions`: grams written for the recipe's own equipment
 * (scaling keeps the same ppm). `target`: a profile to reach; the salts are
 * solved (non-negative least squares) for every equipment.
 */
export type WaterPlan =
  | { mode: 'additions'; source: WaterProfile; mashSalts: SaltAddition[]; spargeSalts: SaltAddition[] }
  | {
      mode: 'target';
      source: WaterProfile;
      target: WaterProfile;
      allowedSalts: SaltId[];
      /** Relative importance of each ion in the fit (default 1 each). */
      ionWeights?: Partial<Record<IonKey, number>>;
    };

// ------------------------------------------------------------------------ mash

/**
 * How a mash step after the first is reached. `infusion`: add hot water;
 * `directHeat`: fire the tun; `recirculate`: wort through a coil in the HLT.
 */
export type MashStepMethod = 'infusion' | 'directHeat' | 'recirculate';

export interface MashStep {
  name: string;
  tempC: number;
  minutes: number;
  /** Ignored for the first step (mash in with strike water). */
  method: MashStepMethod;
  /** Infusion steps: temperature of the added water, °C (default {@link DEFAULT_INFUSION_WATER_C}). */
  infusionWaterTempC?: number;
}

/** Default infusion water temperature: near boiling, common practice. */
export const DEFAULT_INFUSION_WATER_C = 95;

export interface MashPlan {
  /** Strike water per grain weight, L/kg; falls back to the equipment's. */
  thicknessLPerKg?: number;
  /** Grain temperature at mash in, °C. */
  grainTempC: number;
  /** In order; the first is the mash-in rest. */
  steps: MashStep[];
}

// ---------------------------------------------------------------- adjuncts etc

/**
 * How an adjunct or spice is dosed. Per-volume bases refer to the batch
 * volume into the fermenter. `fixedPerBatch` does not scale with volume.
 */
export type DoseBasis =
  'lbPerUsGal' | 'ozPerUsGal' | 'kgPerHl' | 'gPerHl' | 'gPerL' | 'tspPer5UsGal' | 'mlPerHl' | 'fixedPerBatch';

/** Unit of an absolute amount (SI for mass and volume, plus a count). */
export type AmountUnit = 'kg' | 'mL' | 'each';

/** A dose rule: low–high range in the basis's own unit. */
export interface DoseRule {
  basis: DoseBasis;
  low: number;
  high: number;
  /** For `fixedPerBatch` only: the unit of low/high/level (default `each`). */
  fixedUnit?: AmountUnit;
}

export type AdjunctCategory = 'fruit' | 'vegetable' | 'spice' | 'herb' | 'sugar' | 'honey' | 'lactose' | 'other';
export type AdjunctStage = 'mash' | 'boil' | 'whirlpool' | 'fermenter' | 'packaging';

/**
 * A fruit, vegetable, spice or other addition dosed by rule. The sugar of a weighed adjunct
 * (fruit, honey, sugar, or any with a sugar %) counts toward OG, like a kettle sugar at 100 %.
 */
export interface AdjunctAddition {
  name: string;
  category: AdjunctCategory;
  stage: AdjunctStage;
  /** Boil additions: minutes remaining. */
  boilMinutes?: number;
  rule: DoseRule;
  /** The chosen dose, in the rule's basis (normally between low and high). */
  level: number;
  /** Fermentable sugar, % of the adjunct's weight; absent: the category's typical value (TYPICAL_SUGAR_PCT). */
  sugarPct?: number;
}

/** An absolute amount. */
export interface Amount {
  value: number;
  unit: AmountUnit;
}

/** A rounded amount for weighing or measuring, in the brewery's display units. */
export interface MeasuredAmount {
  value: number;
  unit: 'g' | 'kg' | 'oz' | 'lb' | 'mL' | 'tsp' | 'each';
}

export type MeasuringSystem = 'metric' | 'us';

export interface YeastSpec {
  name: string;
  /** Apparent attenuation, % of gravity points consumed. */
  attenuationPct: number;
  /** Optional pitch rate in million cells per mL per °Plato (e.g. 0.75 ales, 1.5 lagers). */
  pitchRateMillionCellsPerMlPerPlato?: number;
}

// ---------------------------------------------------------------- recipe/equip

/** A whole recipe. Weights (fermentables, hops, salts) belong to the equipment it is computed on. */
export interface RecipeInput {
  name: string;
  grainBill: GrainBill;
  hops: HopAddition[];
  yeast: YeastSpec;
  mash: MashPlan;
  water?: WaterPlan;
  adjuncts: AdjunctAddition[];
}

/** A brewhouse as the calculations see it. */
export interface EquipmentProfile {
  name: string;
  /** Volume into the fermenter, L. */
  batchVolumeL: number;
  /** Brewhouse efficiency (into the fermenter), fraction in (0, 1]. */
  brewhouseEfficiency: number;
  /** Evaporation, L per hour of boil. */
  boilOffLPerHour: number;
  boilMinutes: number;
  /** Wort left under the false bottom / in the tun, L. */
  mashTunDeadSpaceL: number;
  /** Hot wort left in the kettle, L. */
  kettleDeadSpaceL: number;
  /** Wort lost to trub, hops and the chiller at knockout, L. */
  trubChillerLossL: number;
  /** Beer left behind in the fermenter (yeast, trub) before packaging, L. */
  fermenterLossL: number;
  /** Water retained by spent grain, L/kg (common practice ≈ 0.8–1.0). */
  grainAbsorptionLPerKg: number;
  maxMashTunVolumeL: number;
  maxKettleVolumeL: number;
  /** Default strike water ratio, L/kg, when the recipe gives none. */
  mashThicknessLPerKg: number;
  /** Volume lost on cooling from boiling, fraction (default 0.04, common practice). */
  coolingShrinkage?: number;
  /** Effectiveness of the HLT recirculation coil, fraction in (0, 1] (default 0.8). */
  hltCoilEffectiveness?: number;
}

// --------------------------------------------------------------------- results

export type WarningCode =
  | 'mashTunOverfilled'
  | 'kettleOverfilled'
  | 'strikeExceedsTotalWater'
  | 'adjunctOutsideRange'
  | 'waterTargetNotReached'
  | 'hopMinutesExceedBoil'
  | 'offTarget'
  | 'ionAboveCeiling';

export interface BrewingWarning {
  code: WarningCode;
  /** The metric wording; a screen words `worded` in its brewery's units when it is there. */
  message: string;
  /** The sentence with its amounts as data (see shared/quantities `wordAmounts`). */
  worded?: AmountsMessage;
  field?: string;
}

/** Water volumes through the brew day, L. */
export interface VolumePlan {
  strikeL: number;
  infusionL: number;
  spargeL: number;
  totalWaterL: number;
  grainAbsorptionL: number;
  /** Strike and infusion water plus grain displacement at the fullest point. */
  mashVolumeL: number;
  preBoilL: number;
  /** Hot, at the end of the boil. */
  postBoilL: number;
  /** Cold volume leaving the kettle toward the fermenter. */
  knockoutL: number;
  intoFermenterL: number;
  packagedL: number;
}

export interface ComputedFermentable {
  name: string;
  weightKg: number;
  percent: number;
  stage: FermentableStage;
  /** Gravity points this item adds to the OG. */
  gravityPoints: number;
}

export interface ComputedHop {
  name: string;
  weightG: number;
  use: HopUse;
  minutes: number;
  /** Fraction of alpha acids that end up as iso-alpha acids in the beer. */
  utilisation: number;
  ibu: number;
  /** True for whirlpool additions, whose utilisation is an approximation. */
  approximate: boolean;
}

export interface ComputedMashStep {
  name: string;
  tempC: number;
  minutes: number;
  method: MashStepMethod | 'strike';
  /** Strike or infusion water added for this step, L. */
  waterAddedL: number;
  /** Temperature of that water, °C (strike temperature for the first step). */
  waterTempC?: number;
  /** Recirculating steps: HLT temperature needed, °C. */
  hltTempC?: number;
}

export interface ResidualAlkalinity {
  /** Kolbach RA in mEq/L. */
  mEqPerL: number;
  /** The same expressed as ppm CaCO3. */
  asCaCO3Ppm: number;
}

export interface ComputedWater {
  source: WaterProfile;
  mashSalts: SaltAddition[];
  spargeSalts: SaltAddition[];
  mash: WaterProfile;
  sparge: WaterProfile;
  /** Chloride-to-sulfate ratio of the mash water; null without sulfate. */
  chlorideSulfateRatio: number | null;
  residualAlkalinity: ResidualAlkalinity;
  /** Target mode: achieved − target per ion, mg/L. */
  residualPpm?: WaterProfile;
}

export interface ComputedAdjunct {
  name: string;
  category: AdjunctCategory;
  stage: AdjunctStage;
  amount: Amount;
  low: Amount;
  high: Amount;
  measuredMetric: MeasuredAmount;
  measuredUs: MeasuredAmount;
  /** Sugar % of weight used for gravity. */
  sugarPct: number;
  /** Gravity points this adjunct's sugar adds to the OG. */
  gravityPoints: number;
  /** Set when the adjunct has sugar that is not counted, saying why. */
  sugarNotCounted?: string;
}

/** Every live number for a recipe on one equipment profile. */
export interface ComputedRecipe {
  og: number;
  fg: number;
  ogPlato: number;
  fgPlato: number;
  /** ABV, % by volume, by {@link ABV_METHOD_SHOWN}. */
  abvPct: number;
  abvSimplePct: number;
  abvBallingPct: number;
  apparentAttenuation: number;
  realAttenuation: number;
  preBoilGravity: number;
  postBoilGravity: number;
  fermentables: ComputedFermentable[];
  mashGrainKg: number;
  hops: ComputedHop[];
  ibu: number;
  /** BU:GU, IBU per gravity point. */
  buGu: number;
  srm: number;
  ebc: number;
  /** Swatch colour, `#rrggbb`. */
  colourHex: string;
  water?: ComputedWater;
  strikeTempC: number;
  thicknessLPerKg: number;
  mashSteps: ComputedMashStep[];
  volumes: VolumePlan;
  adjuncts: ComputedAdjunct[];
  /** Yeast cells to pitch, billions, when a pitch rate is given. */
  yeastCellsBillion?: number;
  warnings: BrewingWarning[];
}

/** One quantity compared before and after scaling. */
export interface ScaleChange {
  /** What it is, e.g. `hop: Cascade 60 min` or `strike temperature`. */
  item: string;
  unit: 'kg' | 'g' | 'L' | 'mL' | 'each' | '°C';
  from: number;
  to: number;
  /** What straight proportional scaling by batch volume would have given. */
  linear: number;
  /** True when `to` differs from `linear` by more than {@link NON_LINEAR_TOLERANCE}. */
  nonLinear: boolean;
  reason: string;
}

/** Relative difference from proportional scaling above which a change is reported as non-linear. */
export const NON_LINEAR_TOLERANCE = 0.005;

export interface ScaledRecipe {
  /** The recipe restated for the target equipment (weights re-solved). */
  recipe: RecipeInput;
  /** Batch volume ratio target / source. */
  volumeRatio: number;
  before: ComputedRecipe;
  after: ComputedRecipe;
  changes: ScaleChange[];
  /** The subset of `changes` that did not scale with batch volume. */
  nonLinearChanges: ScaleChange[];
  warnings: BrewingWarning[];
}
