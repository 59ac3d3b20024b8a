// The starter ingredient library every brewery begins with.
import type { IngredientInput } from '../../shared/schemas/recipes';

type Starter = Omit<IngredientInput, 'notes'> & { notes?: string };

/** Generic entries with typical values (trade typical figures, from memory); no brand names. */
export const STARTER_INGREDIENTS: Starter[] = [
  { kind: 'fermentable', name: 'Pale ale malt', ppg: 37, colourLovibond: 3 },
  { kind: 'fermentable', name: 'Pilsner malt', ppg: 37, colourLovibond: 1.7 },
  { kind: 'fermentable', name: 'Two-row malt', ppg: 37, colourLovibond: 1.8 },
  { kind: 'fermentable', name: 'Munich malt', ppg: 35, colourLovibond: 9 },
  { kind: 'fermentable', name: 'Vienna malt', ppg: 36, colourLovibond: 3.5 },
  { kind: 'fermentable', name: 'Wheat malt', ppg: 37, colourLovibond: 2 },
  { kind: 'fermentable', name: 'Caramel 40', ppg: 34, colourLovibond: 40 },
  { kind: 'fermentable', name: 'Caramel 120', ppg: 33, colourLovibond: 120 },
  { kind: 'fermentable', name: 'Chocolate malt', ppg: 28, colourLovibond: 350 },
  { kind: 'fermentable', name: 'Roasted barley', ppg: 25, colourLovibond: 300 },
  { kind: 'fermentable', name: 'Flaked oats', ppg: 33, colourLovibond: 1 },
  { kind: 'fermentable', name: 'Cane sugar', ppg: 46, colourLovibond: 0 },
  { kind: 'hop', name: 'Bittering hop, high alpha', alphaAcidPct: 13 },
  { kind: 'hop', name: 'Citrus aroma hop', alphaAcidPct: 10 },
  { kind: 'hop', name: 'Noble-type aroma hop', alphaAcidPct: 4 },
  { kind: 'hop', name: 'Earthy English-type hop', alphaAcidPct: 5 },
  { kind: 'yeast', name: 'Clean American ale yeast', attenuationPct: 77 },
  { kind: 'yeast', name: 'English ale yeast', attenuationPct: 70 },
  { kind: 'yeast', name: 'Lager yeast', attenuationPct: 80 },
  { kind: 'adjunct', name: 'Fruit purée', notes: 'Dose per volume; usually in the fermenter' },
  { kind: 'adjunct', name: 'Lactose' },
  { kind: 'adjunct', name: 'Rice hulls', notes: 'Filter aid in the mash' },
  { kind: 'salt', name: 'Gypsum' },
  { kind: 'salt', name: 'Calcium chloride' },
  { kind: 'salt', name: 'Epsom salt' },
];
