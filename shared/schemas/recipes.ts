/**
 * Recipes, their versions, equipment profiles and the ingredient library.
 * One schema per resource: the editor's resolver, the API's validator and the type.
 * A version's content mirrors `RecipeInput` from shared/brewing (so computeRecipe and
 * scaleRecipe do every calculation) plus what the brew day needs beyond the maths.
 */
import { z } from 'zod';
import { batchVolumeField, batchVolumeQueryField, quantityField } from '../quantities/field';
import { hopWeightsForIbuShares, type AdjunctAddition, type EquipmentProfile, type RecipeInput } from '../brewing';

/** A dose in the unit its rule's basis names (kg/hL, tsp per 5 gal …): the basis carries the unit, not the table. */
const dose = (label: string) =>
  z
    .number({ error: `${label}: enter a number` })
    .refine(Number.isFinite, `${label}: enter a number`)
    .min(0, `${label} must be at least 0`)
    .max(100_000, `${label} must be at most 100000`);

const name = (label: string, max = 80) =>
  z.string().trim().min(1, `Enter ${label}`).max(max, `Use at most ${max} characters`);

export const idParam = z.coerce
  .number({ error: 'Must be a number' })
  .int('Must be a whole number')
  .positive('Must be positive')
  .max(2147483647);

// ---------------------------------------------------------------- fermentables

export const FERMENTABLE_STAGES = ['mash', 'kettle', 'fermenter'] as const;

const potentialSchema = z.union([
  z.strictObject({ ppg: quantityField('potential', { label: 'Potential' }) }),
  z.strictObject({ extractPct: quantityField('percent', { label: 'Extract', min: 1 }) }),
]);

const fermentableBase = {
  name: name('a fermentable'),
  potential: potentialSchema,
  colourLovibond: quantityField('maltColour'),
  stage: z.enum(FERMENTABLE_STAGES),
};

export const grainBillSchema = z.discriminatedUnion('mode', [
  z.strictObject({
    mode: z.literal('weight'),
    items: z
      .array(z.strictObject({ ...fermentableBase, weightKg: quantityField('grainWeight', { min: 0.001 }) }))
      .min(1, 'Add at least one fermentable')
      .max(40),
  }),
  z.strictObject({
    mode: z.literal('percent'),
    targetOg: quantityField('gravity', { label: 'Target OG', min: 1.001 }),
    items: z
      .array(z.strictObject({ ...fermentableBase, percent: quantityField('percent', { min: 0.01 }) }))
      .min(1, 'Add at least one fermentable')
      .max(40),
  }),
]);

// ------------------------------------------------------------------------ hops

export const HOP_USES = ['boil', 'whirlpool', 'dryHop'] as const;
export const HOP_FORMS = ['pellet', 'whole', 'extract'] as const;

export const hopSchema = z
  .strictObject({
    name: name('a hop variety'),
    alphaAcidPct: quantityField('alphaAcid'),
    form: z.enum(HOP_FORMS),
    use: z.enum(HOP_USES),
    minutes: quantityField('minutes', { label: 'Minutes' }),
    whirlpoolTempC: quantityField('temperature', { label: 'Whirlpool temperature', min: 40, max: 100 }).optional(),
    /** When set, the weight is solved for this share of the target IBU (see resolveHopShares). */
    ibuSharePct: quantityField('percent', { label: 'Share of the target IBU', min: 0.1 }).optional(),
    weightG: quantityField('hopWeight'),
  })
  .refine((h) => h.use !== 'whirlpool' || h.whirlpoolTempC !== undefined, {
    path: ['whirlpoolTempC'],
    message: 'A whirlpool addition needs its stand temperature',
  })
  .refine((h) => h.ibuSharePct === undefined || h.use !== 'dryHop', {
    path: ['ibuSharePct'],
    message: 'A dry hop adds no bitterness: give it a weight',
  });

// ----------------------------------------------------------------------- water

export const SALT_IDS = [
  'gypsum',
  'calciumChlorideDihydrate',
  'calciumChlorideAnhydrous',
  'epsomSalt',
  'tableSalt',
  'bakingSoda',
  'chalk',
] as const;

export const SALT_LABELS: Record<(typeof SALT_IDS)[number], string> = {
  gypsum: 'Gypsum (CaSO₄·2H₂O)',
  calciumChlorideDihydrate: 'Calcium chloride (CaCl₂·2H₂O)',
  calciumChlorideAnhydrous: 'Calcium chloride, anhydrous',
  epsomSalt: 'Epsom salt (MgSO₄·7H₂O)',
  tableSalt: 'Table salt (NaCl)',
  bakingSoda: 'Baking soda (NaHCO₃)',
  chalk: 'Chalk (CaCO₃)',
};

const ppm = (label: string) => quantityField('ionConcentration', { label });
export const waterProfileSchema = z.strictObject({
  calciumPpm: ppm('Calcium'),
  magnesiumPpm: ppm('Magnesium'),
  sodiumPpm: ppm('Sodium'),
  sulfatePpm: ppm('Sulfate'),
  chloridePpm: ppm('Chloride'),
  bicarbonatePpm: ppm('Bicarbonate'),
});

const saltAdditionSchema = z.strictObject({ salt: z.enum(SALT_IDS), grams: quantityField('saltWeight') });

export const waterPlanSchema = z.discriminatedUnion('mode', [
  z.strictObject({
    mode: z.literal('additions'),
    source: waterProfileSchema,
    mashSalts: z.array(saltAdditionSchema).max(7),
    spargeSalts: z.array(saltAdditionSchema).max(7),
  }),
  z.strictObject({
    mode: z.literal('target'),
    source: waterProfileSchema,
    target: waterProfileSchema,
    allowedSalts: z.array(z.enum(SALT_IDS)).min(1, 'Allow at least one salt').max(7),
  }),
]);

// ------------------------------------------------------------------------ mash

export const MASH_METHODS = ['infusion', 'directHeat', 'recirculate'] as const;

export const mashSchema = z.strictObject({
  thicknessLPerKg: quantityField('waterToGrain', { label: 'Mash thickness', min: 1.5, max: 6 }).optional(),
  grainTempC: quantityField('temperature', { label: 'Grain temperature', max: 45 }),
  steps: z
    .array(
      z.strictObject({
        name: name('a rest name', 60),
        tempC: quantityField('temperature', { label: 'Rest temperature', min: 30, max: 80 }),
        minutes: quantityField('minutes', { label: 'Rest time' }),
        method: z.enum(MASH_METHODS),
        infusionWaterTempC: quantityField('temperature', { label: 'Infusion water', min: 60, max: 100 }).optional(),
      }),
    )
    .min(1, 'Add the mash-in rest')
    .max(8),
});

// ----------------------------------------------------------- adjuncts & spices

export const DOSE_BASES = [
  'lbPerUsGal',
  'ozPerUsGal',
  'kgPerHl',
  'gPerHl',
  'gPerL',
  'tspPer5UsGal',
  'mlPerHl',
  'fixedPerBatch',
] as const;
export const ADJUNCT_CATEGORIES = [
  'fruit',
  'vegetable',
  'spice',
  'herb',
  'sugar',
  'honey',
  'lactose',
  'other',
] as const;
export const ADJUNCT_STAGES = ['mash', 'boil', 'whirlpool', 'fermenter', 'packaging'] as const;

const doseRuleSchema = z
  .strictObject({
    basis: z.enum(DOSE_BASES),
    low: dose('Low dose'),
    high: dose('High dose'),
    fixedUnit: z.enum(['kg', 'mL', 'each']).optional(),
  })
  .refine((r) => r.high >= r.low, { path: ['high'], message: 'The high dose must not be below the low dose' });

const additionBase = {
  name: name('the addition'),
  category: z.enum(ADJUNCT_CATEGORIES),
  stage: z.enum(ADJUNCT_STAGES),
  boilMinutes: quantityField('minutes', { label: 'Boil minute' }).optional(),
  rule: doseRuleSchema,
  level: dose('Dose'),
  /** Fermentable sugar, % of weight; blank: typical for its kind (fruit 10, honey 82, sugar 100, others 0). */
  sugarPct: quantityField('percent', { label: 'Sugar' }).optional(),
  /** How it goes in, e.g. "in mesh bags, lifted out at knockout". */
  howAdded: z.string().trim().max(200, 'Use at most 200 characters'),
};

const boilMinuteRequired = (a: { stage: string; boilMinutes?: number | undefined }) =>
  a.stage !== 'boil' || a.boilMinutes !== undefined;

/** Only a boil addition has a minute: one left over from before the stage changed is dropped, not saved or printed. */
function withoutStaleMinute<T extends { stage: string; boilMinutes?: number | undefined }>(a: T): T {
  if (a.stage === 'boil' || a.boilMinutes === undefined) return a;
  const { boilMinutes: _stale, ...rest } = a;
  return rest as T;
}

/** A prepared adjunct: the dose rule plus what is done to it before it goes in. */
export const adjunctSchema = z
  .strictObject({
    ...additionBase,
    preparation: z
      .array(
        z.strictObject({ text: z.string().trim().min(1, 'Describe the step').max(300, 'Use at most 300 characters') }),
      )
      .max(12),
  })
  .refine(boilMinuteRequired, { path: ['boilMinutes'], message: 'A boil addition needs its minute' })
  .transform(withoutStaleMinute);

export const spiceSchema = z
  .strictObject(additionBase)
  .refine(boilMinuteRequired, { path: ['boilMinutes'], message: 'A boil addition needs its minute' })
  .transform(withoutStaleMinute);

// ------------------------------------------------------------- yeast/ferment

export const YEAST_TYPES = ['ale', 'lager', 'wheat', 'saison', 'wild', 'other'] as const;

export const yeastSchema = z
  .strictObject({
    name: name('the yeast'),
    strainType: z.enum(YEAST_TYPES),
    attenuationPct: quantityField('percent', { label: 'Expected attenuation', min: 40 }),
    attenuationLowPct: quantityField('percent', { label: 'Attenuation low', min: 40 }),
    attenuationHighPct: quantityField('percent', { label: 'Attenuation high', min: 40 }),
    pitchTempC: quantityField('temperature', { label: 'Pitch temperature', min: 2, max: 35 }),
    pitchRateMillionCellsPerMlPerPlato: quantityField('pitchRate').optional(),
  })
  .refine((y) => y.attenuationHighPct >= y.attenuationLowPct, {
    path: ['attenuationHighPct'],
    message: 'High must not be below low',
  });

export const fermentationSchema = z.strictObject({
  primaryTempC: quantityField('temperature', { label: 'Primary temperature', min: 2, max: 35 }),
  /** Raise for the diacetyl rest when gravity is this many points above the expected FG. */
  dRestPointsAboveFg: quantityField('gravityPoints', { label: 'D-rest trigger', max: 20 }).optional(),
  dRestTempC: quantityField('temperature', { label: 'D-rest temperature', min: 2, max: 30 }).optional(),
  crashTempC: quantityField('temperature', { label: 'Crash temperature', min: -2, max: 15 }),
  co2Volumes: quantityField('co2Volumes', { label: 'Target CO₂', min: 1, max: 4.5 }),
});

export const targetsSchema = z.strictObject({
  og: quantityField('gravity', { label: 'Target OG', min: 1.001 }),
  fg: quantityField('gravity', { label: 'Target FG', min: 0.99, max: 1.1 }),
  ibu: quantityField('bitterness', { label: 'Target IBU' }),
  srm: quantityField('beerColour', { label: 'Target colour' }),
  batchVolumeL: batchVolumeField(),
});

// ------------------------------------------------------------ version content

export const recipeContentSchema = z.strictObject({
  grainBill: grainBillSchema,
  hops: z.array(hopSchema).max(30),
  yeast: yeastSchema,
  mash: mashSchema,
  water: waterPlanSchema.optional(),
  adjuncts: z.array(adjunctSchema).max(10),
  spices: z.array(spiceSchema).max(10),
  fermentation: fermentationSchema,
  targets: targetsSchema,
  notes: z.string().trim().max(2000, 'Use at most 2000 characters'),
});
export type RecipeVersionContent = z.infer<typeof recipeContentSchema>;
export type AdjunctPrep = z.infer<typeof adjunctSchema>;
export type SpiceAddition = z.infer<typeof spiceSchema>;

export const RECIPE_STATUSES = ['draft', 'active', 'retired'] as const;
export type RecipeStatus = (typeof RECIPE_STATUSES)[number];

const recipeMeta = {
  name: name('the recipe name', 120),
  style: z.string().trim().max(80, 'Use at most 80 characters'),
  description: z.string().trim().max(2000, 'Use at most 2000 characters'),
  status: z.enum(RECIPE_STATUSES),
};

const versionBody = {
  changeNote: z.string().trim().min(1, 'Say what changed').max(300, 'Use at most 300 characters'),
  equipmentProfileId: idParam,
  content: recipeContentSchema,
};

export const createRecipeSchema = z.strictObject({ ...recipeMeta, ...versionBody });
export type CreateRecipeInput = z.infer<typeof createRecipeSchema>;

export const updateRecipeSchema = z.strictObject(recipeMeta).partial();
export type UpdateRecipeInput = z.infer<typeof updateRecipeSchema>;

/** Saving a version: edit in place (PATCH, unfrozen only) or as the next version (POST). */
export const saveVersionSchema = z.strictObject(versionBody);
export type SaveVersionInput = z.infer<typeof saveVersionSchema>;

/** The target of a scale: another equipment profile, a typed batch volume, both, or neither (the version as written). */
export const scaleQuerySchema = z.strictObject({
  equipmentProfileId: idParam.optional(),
  batchVolumeL: batchVolumeQueryField().optional(),
});
export type ScaleTarget = z.infer<typeof scaleQuerySchema>;

export const saveScaledSchema = z.strictObject({
  changeNote: versionBody.changeNote,
  equipmentProfileId: idParam.optional(),
  batchVolumeL: batchVolumeField().optional(),
});
export type SaveScaledInput = z.infer<typeof saveScaledSchema>;

export const compareQuerySchema = z.strictObject({ a: idParam, b: idParam });

// ------------------------------------------------------------------ equipment

export const equipmentSchema = z.strictObject({
  name: name('a name', 80),
  batchVolumeL: batchVolumeField('Batch volume into the fermenter'),
  brewhouseEfficiency: quantityField('fraction', { label: 'Brewhouse efficiency', min: 0.3 }),
  boilOffLPerHour: quantityField('volumePerHour', { label: 'Boil-off' }),
  boilMinutes: quantityField('minutes', { label: 'Boil time' }),
  mashTunDeadSpaceL: quantityField('volume', { label: 'Mash tun dead space', max: 2000 }),
  kettleDeadSpaceL: quantityField('volume', { label: 'Kettle dead space', max: 2000 }),
  trubChillerLossL: quantityField('volume', { label: 'Trub and chiller loss', max: 2000 }),
  fermenterLossL: quantityField('volume', { label: 'Fermenter loss', max: 2000 }),
  grainAbsorptionLPerKg: quantityField('waterToGrain', { label: 'Grain absorption', min: 0.3, max: 2 }),
  maxMashTunVolumeL: quantityField('volume', { label: 'Mash tun capacity', min: 1, max: 40_000 }),
  maxKettleVolumeL: quantityField('volume', { label: 'Kettle capacity', min: 1, max: 40_000 }),
  mashThicknessLPerKg: quantityField('waterToGrain', { label: 'Mash thickness', min: 1.5, max: 6 }),
});
export type EquipmentInput = z.infer<typeof equipmentSchema>;

// ------------------------------------------------------------------ ingredients

export const INGREDIENT_KINDS = ['fermentable', 'hop', 'yeast', 'adjunct', 'salt'] as const;
export type IngredientKind = (typeof INGREDIENT_KINDS)[number];

export const ingredientSchema = z.strictObject({
  kind: z.enum(INGREDIENT_KINDS),
  name: name('a name', 80),
  /** Typical values: a starting point, not a lot's analysis. */
  ppg: quantityField('potential').optional(),
  colourLovibond: quantityField('maltColour').optional(),
  alphaAcidPct: quantityField('alphaAcid').optional(),
  attenuationPct: quantityField('percent', { label: 'Attenuation', min: 40 }).optional(),
  notes: z.string().trim().max(300, 'Use at most 300 characters'),
});
export type IngredientInput = z.infer<typeof ingredientSchema>;
export const ingredientQuerySchema = z.strictObject({ kind: z.enum(INGREDIENT_KINDS).optional() });

// ------------------------------------------------------------- to the maths

/** The calculation view of a version: what computeRecipe and scaleRecipe take. */
export function toRecipeInput(recipeName: string, content: RecipeVersionContent): RecipeInput {
  const addition = ({
    name,
    category,
    stage,
    boilMinutes,
    rule,
    level,
    sugarPct,
  }: SpiceAddition | AdjunctPrep): AdjunctAddition => ({
    name,
    category,
    stage,
    ...(boilMinutes === undefined || stage !== 'boil' ? {} : { boilMinutes }),
    rule,
    level,
    ...(sugarPct === undefined ? {} : { sugarPct }),
  });
  return {
    name: recipeName,
    grainBill: content.grainBill,
    hops: content.hops.map(({ form: _form, ibuSharePct: _share, ...hop }) => hop),
    yeast: {
      name: content.yeast.name,
      attenuationPct: content.yeast.attenuationPct,
      ...(content.yeast.pitchRateMillionCellsPerMlPerPlato === undefined
        ? {}
        : { pitchRateMillionCellsPerMlPerPlato: content.yeast.pitchRateMillionCellsPerMlPerPlato }),
    },
    mash: content.mash,
    ...(content.water ? { water: content.water } : {}),
    // Prepared adjuncts first, then spices: computed.adjuncts[i] lines up with this order.
    adjuncts: [...content.adjuncts.map(addition), ...content.spices.map(addition)],
  };
}

/** The brewhouse a version is computed on: its equipment profile at the version's batch volume. */
export function equipmentAtVolume(profile: EquipmentInput, batchVolumeL: number): EquipmentProfile {
  return { ...profile, batchVolumeL };
}

/**
 * The content with every hop written as a share of the target IBU given its solved weight on
 * this brewhouse; saved versions store the solved weights so lists, scaling and batches read them.
 */
export function resolveHopShares(
  recipeName: string,
  content: RecipeVersionContent,
  equipment: EquipmentProfile,
): RecipeVersionContent {
  const shares = content.hops.map((h) => h.ibuSharePct);
  if (shares.every((s) => s === undefined)) return content;
  const solved = hopWeightsForIbuShares(toRecipeInput(recipeName, content), equipment, content.targets.ibu, shares);
  return { ...content, hops: content.hops.map((h, i) => ({ ...h, weightG: solved[i]!.weightG })) };
}

// ---------------------------------------------------------------- API answers (shared by the server and the client)

/** One row of the recipe list: the recipe with its latest version's numbers. */
export interface RecipeListRow {
  id: number;
  name: string;
  style: string;
  status: RecipeStatus;
  latestVersionId: number;
  latestVersion: number;
  og: number;
  fg: number;
  ibu: number;
  srm: number;
  abvPct: number;
  /** Brew date (YYYY-MM-DD) of the latest batch actually brewed (brew day started or later); null if none. */
  lastBrewedAt: string | null;
  updatedAt: string;
}

/** A version in a recipe's history. */
export interface VersionSummary {
  id: number;
  number: number;
  changeNote: string;
  authorName: string;
  createdAt: string;
  frozenAt: string | null;
  equipmentProfileId: number;
  batchVolumeL: number;
  og: number;
  fg: number;
  ibu: number;
  srm: number;
  abvPct: number;
}

/** One changed value between two versions, by its path in the version's content. */
export interface Difference {
  path: string;
  a: string | number | boolean | null;
  b: string | number | boolean | null;
}
