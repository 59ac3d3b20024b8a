// Demo recipes and equipment for the demo brewery, as plain data (tests use it too). Every name and number is invented.
import { usBblToL, usGalToL, type WaterProfile } from '../../shared/brewing';
import type { EquipmentInput, RecipeStatus, RecipeVersionContent } from '../../shared/schemas/recipes';

export const DEMO_EQUIPMENT: Record<'pilot' | 'mid' | 'big', EquipmentInput> = {
  pilot: {
    name: 'Pilot kit 10 gal',
    batchVolumeL: usGalToL(10),
    brewhouseEfficiency: 0.7,
    boilOffLPerHour: 5.5,
    boilMinutes: 60,
    mashTunDeadSpaceL: 2.5,
    kettleDeadSpaceL: 1.5,
    trubChillerLossL: 2.5,
    fermenterLossL: 2,
    grainAbsorptionLPerKg: 1,
    maxMashTunVolumeL: 80,
    maxKettleVolumeL: 80,
    mashThicknessLPerKg: 3,
  },
  mid: {
    name: 'Harbour 3.5 bbl',
    batchVolumeL: usBblToL(3.5),
    brewhouseEfficiency: 0.76,
    boilOffLPerHour: 30,
    boilMinutes: 60,
    mashTunDeadSpaceL: 15,
    kettleDeadSpaceL: 8,
    trubChillerLossL: 20,
    fermenterLossL: 18,
    grainAbsorptionLPerKg: 0.95,
    maxMashTunVolumeL: 600,
    maxKettleVolumeL: 650,
    mashThicknessLPerKg: 2.9,
  },
  big: {
    name: 'Main brewhouse 10 bbl',
    batchVolumeL: usBblToL(10),
    brewhouseEfficiency: 0.8,
    boilOffLPerHour: 75,
    boilMinutes: 60,
    mashTunDeadSpaceL: 35,
    kettleDeadSpaceL: 18,
    trubChillerLossL: 55,
    fermenterLossL: 45,
    grainAbsorptionLPerKg: 0.9,
    maxMashTunVolumeL: 1600,
    maxKettleVolumeL: 1750,
    mashThicknessLPerKg: 2.8,
  },
};

/** The harbour town's mains water (invented figures). */
const HARBOUR_TAP: WaterProfile = {
  calciumPpm: 18,
  magnesiumPpm: 4,
  sodiumPpm: 12,
  sulfatePpm: 14,
  chloridePpm: 20,
  bicarbonatePpm: 45,
};

const malt = (name: string, ppg: number, colourLovibond: number, weightKg: number) => ({
  name,
  potential: { ppg },
  colourLovibond,
  stage: 'mash' as const,
  weightKg,
});

/** The seasonal: roasted quince and golden beet in the boil, a warming spice blend at the end. Written for the pilot kit. */
export const SEASONAL_CONTENT: RecipeVersionContent = {
  grainBill: {
    mode: 'weight',
    items: [
      malt('Pale ale malt', 37, 3, 8),
      malt('Munich malt', 35, 9, 1.4),
      malt('Caramel 40', 34, 40, 0.6),
      malt('Flaked oats', 33, 1, 0.35),
    ],
  },
  hops: [
    { name: 'Earthy English-type hop', alphaAcidPct: 5.5, form: 'pellet', use: 'boil', minutes: 60, weightG: 66 },
    { name: 'Noble-type aroma hop', alphaAcidPct: 4, form: 'pellet', use: 'boil', minutes: 10, weightG: 30 },
  ],
  yeast: {
    name: 'English ale yeast',
    strainType: 'ale',
    attenuationPct: 72,
    attenuationLowPct: 68,
    attenuationHighPct: 75,
    pitchTempC: 18,
    pitchRateMillionCellsPerMlPerPlato: 0.75,
  },
  mash: {
    grainTempC: 17,
    steps: [
      { name: 'Saccharification rest', tempC: 67, minutes: 60, method: 'infusion' },
      { name: 'Mash out', tempC: 76, minutes: 10, method: 'infusion', infusionWaterTempC: 95 },
    ],
  },
  water: {
    mode: 'additions',
    source: HARBOUR_TAP,
    mashSalts: [
      { salt: 'calciumChlorideDihydrate', grams: 3 },
      { salt: 'gypsum', grams: 2 },
    ],
    spargeSalts: [
      { salt: 'calciumChlorideDihydrate', grams: 1.5 },
      { salt: 'gypsum', grams: 1 },
    ],
  },
  adjuncts: [
    {
      name: 'Roasted quince and golden beet',
      category: 'fruit',
      stage: 'boil',
      boilMinutes: 15,
      rule: { basis: 'lbPerUsGal', low: 0.4, high: 1 },
      level: 0.6,
      howAdded: 'In mesh bags tied to the kettle rail; lift out at knockout and let drain.',
      preparation: [
        { text: 'Weigh quince and golden beet 2 : 1 by weight; scrub the beet.' },
        { text: 'Quarter and core the quince, keep the skin; cut the beet into 2 cm cubes.' },
        {
          text: 'Toss with 5 % of their weight in brown sugar; roast at 190 °C (375 °F) for 50–60 min until soft and edged dark.',
        },
        { text: 'Scrape the roasting juices into the bags with the pieces; cool covered if roasting the day before.' },
      ],
    },
  ],
  spices: [
    {
      name: 'Harbour spice blend (ginger, grains of paradise, cardamom 2:1:1)',
      category: 'spice',
      stage: 'boil',
      boilMinutes: 5,
      rule: { basis: 'tspPer5UsGal', low: 0.5, high: 2 },
      level: 1,
      howAdded: 'Freshly cracked, loose into the boil; taste at packaging before adding any more as a tincture.',
    },
  ],
  fermentation: { primaryTempC: 19, dRestPointsAboveFg: 3, dRestTempC: 21, crashTempC: 1, co2Volumes: 2.3 },
  targets: { og: 1.058, fg: 1.016, ibu: 24, srm: 9, batchVolumeL: usGalToL(10) },
  notes: 'Winter seasonal. Amber, gently sweet, the quince on the nose and the spice in the finish.',
};

const PALE_V1: RecipeVersionContent = {
  grainBill: {
    mode: 'percent',
    targetOg: 1.052,
    items: [
      { name: 'Two-row malt', potential: { ppg: 37 }, colourLovibond: 1.8, stage: 'mash', percent: 88 },
      { name: 'Munich malt', potential: { ppg: 35 }, colourLovibond: 9, stage: 'mash', percent: 7 },
      { name: 'Caramel 40', potential: { ppg: 34 }, colourLovibond: 40, stage: 'mash', percent: 5 },
    ],
  },
  hops: [
    { name: 'Bittering hop, high alpha', alphaAcidPct: 13, form: 'pellet', use: 'boil', minutes: 60, weightG: 900 },
    { name: 'Citrus aroma hop', alphaAcidPct: 10, form: 'pellet', use: 'boil', minutes: 10, weightG: 1400 },
    {
      name: 'Citrus aroma hop',
      alphaAcidPct: 10,
      form: 'pellet',
      use: 'whirlpool',
      minutes: 20,
      whirlpoolTempC: 85,
      weightG: 2200,
    },
    { name: 'Citrus aroma hop', alphaAcidPct: 10, form: 'pellet', use: 'dryHop', minutes: 0, weightG: 4500 },
  ],
  yeast: {
    name: 'Clean American ale yeast',
    strainType: 'ale',
    attenuationPct: 77,
    attenuationLowPct: 73,
    attenuationHighPct: 80,
    pitchTempC: 18,
    pitchRateMillionCellsPerMlPerPlato: 0.75,
  },
  mash: {
    grainTempC: 18,
    steps: [
      { name: 'Single infusion', tempC: 66, minutes: 60, method: 'infusion' },
      { name: 'Mash out', tempC: 76, minutes: 10, method: 'recirculate' },
    ],
  },
  water: {
    mode: 'additions',
    source: HARBOUR_TAP,
    mashSalts: [
      { salt: 'gypsum', grams: 110 },
      { salt: 'calciumChlorideDihydrate', grams: 35 },
    ],
    spargeSalts: [{ salt: 'gypsum', grams: 60 }],
  },
  adjuncts: [],
  spices: [],
  fermentation: { primaryTempC: 19, crashTempC: 1, co2Volumes: 2.5 },
  targets: { og: 1.052, fg: 1.012, ibu: 40, srm: 6, batchVolumeL: usBblToL(10) },
  notes: 'The flagship: bright, citrus, dry finish.',
};

/** Version 2 of the pale ale: more late hop, a touch less bittering, warmer whirlpool. */
const PALE_V2: RecipeVersionContent = {
  ...PALE_V1,
  hops: [
    { ...PALE_V1.hops[0]!, weightG: 780 },
    PALE_V1.hops[1]!,
    { ...PALE_V1.hops[2]!, weightG: 2600, whirlpoolTempC: 88 },
    PALE_V1.hops[3]!,
  ],
};

const STOUT: RecipeVersionContent = {
  grainBill: {
    mode: 'weight',
    items: [
      malt('Pale ale malt', 37, 3, 80),
      malt('Flaked oats', 33, 1, 12),
      malt('Roasted barley', 25, 300, 9),
      malt('Chocolate malt', 28, 350, 6),
      malt('Caramel 120', 33, 120, 5),
    ],
  },
  hops: [
    { name: 'Earthy English-type hop', alphaAcidPct: 5.5, form: 'pellet', use: 'boil', minutes: 60, weightG: 1300 },
  ],
  yeast: {
    name: 'English ale yeast',
    strainType: 'ale',
    attenuationPct: 70,
    attenuationLowPct: 67,
    attenuationHighPct: 74,
    pitchTempC: 18,
  },
  mash: { grainTempC: 17, steps: [{ name: 'Single infusion', tempC: 68, minutes: 60, method: 'infusion' }] },
  water: {
    mode: 'additions',
    source: HARBOUR_TAP,
    mashSalts: [
      { salt: 'calciumChlorideDihydrate', grams: 60 },
      { salt: 'chalk', grams: 25 },
    ],
    spargeSalts: [],
  },
  adjuncts: [],
  spices: [],
  fermentation: { primaryTempC: 19, crashTempC: 2, co2Volumes: 2.1 },
  targets: { og: 1.06, fg: 1.018, ibu: 37, srm: 38, batchVolumeL: usBblToL(3.5) },
  notes: 'Oat stout for the fire-side tables.',
};

const LAGER: RecipeVersionContent = {
  grainBill: {
    mode: 'percent',
    targetOg: 1.047,
    items: [
      { name: 'Pilsner malt', potential: { ppg: 37 }, colourLovibond: 1.7, stage: 'mash', percent: 94 },
      { name: 'Vienna malt', potential: { ppg: 36 }, colourLovibond: 3.5, stage: 'mash', percent: 6 },
    ],
  },
  hops: [
    { name: 'Noble-type aroma hop', alphaAcidPct: 4, form: 'pellet', use: 'boil', minutes: 60, weightG: 2200 },
    { name: 'Noble-type aroma hop', alphaAcidPct: 4, form: 'pellet', use: 'boil', minutes: 15, weightG: 1200 },
  ],
  yeast: {
    name: 'Lager yeast',
    strainType: 'lager',
    attenuationPct: 80,
    attenuationLowPct: 76,
    attenuationHighPct: 83,
    pitchTempC: 9,
    pitchRateMillionCellsPerMlPerPlato: 1.5,
  },
  mash: {
    grainTempC: 16,
    steps: [
      { name: 'Beta rest', tempC: 63, minutes: 40, method: 'infusion' },
      { name: 'Alpha rest', tempC: 70, minutes: 20, method: 'recirculate' },
      { name: 'Mash out', tempC: 76, minutes: 10, method: 'recirculate' },
    ],
  },
  water: {
    mode: 'target',
    source: HARBOUR_TAP,
    target: { calciumPpm: 50, magnesiumPpm: 5, sodiumPpm: 12, sulfatePpm: 60, chloridePpm: 50, bicarbonatePpm: 45 },
    allowedSalts: ['gypsum', 'calciumChlorideDihydrate'],
  },
  adjuncts: [],
  spices: [],
  fermentation: { primaryTempC: 10, dRestPointsAboveFg: 4, dRestTempC: 16, crashTempC: 0, co2Volumes: 2.6 },
  targets: { og: 1.047, fg: 1.009, ibu: 22, srm: 3, batchVolumeL: usBblToL(10) },
  notes: 'House lager: long cold conditioning, at least four weeks.',
};

interface DemoRecipe {
  name: string;
  style: string;
  description: string;
  status: RecipeStatus;
  equipment: keyof typeof DEMO_EQUIPMENT;
  versions: { changeNote: string; content: RecipeVersionContent }[];
}

export const SEASONAL_NAME = 'Low Tide Quince';

export const DEMO_RECIPES: DemoRecipe[] = [
  {
    name: 'Breakwater Pale',
    style: 'American pale ale',
    description: 'The flagship pale ale.',
    status: 'active',
    equipment: 'big',
    versions: [
      { changeNote: 'First production recipe', content: PALE_V1 },
      { changeNote: 'Less bittering, more whirlpool hop at a warmer stand', content: PALE_V2 },
    ],
  },
  {
    name: 'Lamplighter Oat Stout',
    style: 'Oatmeal stout',
    description: 'Dark, smooth, roasty.',
    status: 'active',
    equipment: 'mid',
    versions: [{ changeNote: 'First recipe', content: STOUT }],
  },
  {
    name: 'Slack Water Lager',
    style: 'Pale lager',
    description: 'Crisp house lager.',
    status: 'active',
    equipment: 'big',
    versions: [{ changeNote: 'First recipe', content: LAGER }],
  },
  {
    name: SEASONAL_NAME,
    style: 'Spiced fruit and vegetable amber ale',
    description:
      'Winter seasonal with roasted quince, golden beet and a warming spice blend. Piloted on the 10 gal kit.',
    status: 'draft',
    equipment: 'pilot',
    versions: [{ changeNote: 'Pilot recipe', content: SEASONAL_CONTENT }],
  },
];
