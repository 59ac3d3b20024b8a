/** The ingredient library: generic starter entries with typical values, plus the brewery's own. */
import type { Transaction } from 'sequelize';
import type { IngredientInput, IngredientKind } from '../../shared/schemas/recipes';
import { notFound } from '../errors';
import { Ingredient } from '../models';

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

function json(row: Ingredient) {
  return {
    id: row.id,
    kind: row.kind,
    name: row.name,
    ppg: row.ppg,
    colourLovibond: row.colourLovibond,
    alphaAcidPct: row.alphaAcidPct,
    attenuationPct: row.attenuationPct,
    notes: row.notes,
    typical: row.typical,
  };
}
export type IngredientJson = ReturnType<typeof json>;

/** Gives a brewery the starter entries (once: only when its library is empty). */
export async function seedStarterIngredients(breweryId: number, transaction?: Transaction): Promise<void> {
  if ((await Ingredient.count({ where: { breweryId }, transaction })) > 0) return;
  await Ingredient.bulkCreate(
    STARTER_INGREDIENTS.map((s) => ({
      breweryId,
      kind: s.kind,
      name: s.name,
      ppg: s.ppg ?? null,
      colourLovibond: s.colourLovibond ?? null,
      alphaAcidPct: s.alphaAcidPct ?? null,
      attenuationPct: s.attenuationPct ?? null,
      notes: s.notes ?? '',
      typical: true,
    })),
    // Two first visits at once both see an empty library; the second insert is a no-op.
    { transaction, ignoreDuplicates: true },
  );
}

export async function listIngredients(breweryId: number, kind?: IngredientKind): Promise<IngredientJson[]> {
  await seedStarterIngredients(breweryId);
  const rows = await Ingredient.findAll({ where: { breweryId, ...(kind ? { kind } : {}) }, order: [['kind', 'ASC'], ['name', 'ASC']] });
  return rows.map(json);
}

const columns = (input: IngredientInput) => ({
  kind: input.kind,
  name: input.name,
  ppg: input.ppg ?? null,
  colourLovibond: input.colourLovibond ?? null,
  alphaAcidPct: input.alphaAcidPct ?? null,
  attenuationPct: input.attenuationPct ?? null,
  notes: input.notes,
});

export async function createIngredient(breweryId: number, input: IngredientInput): Promise<IngredientJson> {
  return json(await Ingredient.create({ breweryId, ...columns(input), typical: false }));
}

/** Editing an entry makes it the brewery's own figures, no longer "typical". */
export async function updateIngredient(breweryId: number, id: number, input: IngredientInput): Promise<IngredientJson> {
  const row = await Ingredient.findOne({ where: { id, breweryId } });
  if (!row) throw notFound('This ingredient');
  await row.update({ ...columns(input), typical: false });
  return json(row);
}
