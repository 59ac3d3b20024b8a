import type { CreateRecipeInput } from '../../../../shared/schemas/recipes';

/** A starting point for a new recipe: a plain pale ale shape to edit, not a recommendation. */
export const NEW_RECIPE: Omit<CreateRecipeInput, 'equipmentProfileId'> = {
  name: '',
  style: '',
  description: '',
  status: 'draft',
  changeNote: 'First draft',
  content: {
    grainBill: {
      mode: 'percent',
      targetOg: 1.05,
      items: [{ name: 'Pale ale malt', potential: { ppg: 37 }, colourLovibond: 3, stage: 'mash', percent: 100 }],
    },
    hops: [{ name: 'Bittering hop', alphaAcidPct: 10, form: 'pellet', use: 'boil', minutes: 60, weightG: 28 }],
    yeast: {
      name: 'Clean ale yeast',
      strainType: 'ale',
      attenuationPct: 75,
      attenuationLowPct: 72,
      attenuationHighPct: 78,
      pitchTempC: 18,
    },
    mash: { grainTempC: 18, steps: [{ name: 'Single infusion', tempC: 66, minutes: 60, method: 'infusion' }] },
    adjuncts: [],
    spices: [],
    fermentation: { primaryTempC: 19, crashTempC: 1, co2Volumes: 2.4 },
    targets: { og: 1.05, fg: 1.012, ibu: 30, srm: 5, batchVolumeL: 100 },
    notes: '',
  },
};
