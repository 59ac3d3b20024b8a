/** The ingredient library: generic starter entries with typical values, plus the brewery's own. */
import type { Transaction } from 'sequelize';
import type { IngredientInput, IngredientKind } from '../../shared/schemas/recipes';
import { notFound } from '../errors';
import { Ingredient } from '../models';
import { STARTER_INGREDIENTS } from './starter-ingredients';

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

/** The starter entries a new brewery's library begins with (createBrewery in services/auth.ts). */
export async function addStarterIngredients(breweryId: number, transaction?: Transaction): Promise<void> {
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
    { transaction },
  );
}

export async function listIngredients(breweryId: number, kind?: IngredientKind): Promise<IngredientJson[]> {
  const rows = await Ingredient.findAll({
    where: { breweryId, ...(kind ? { kind } : {}) },
    order: [
      ['kind', 'ASC'],
      ['name', 'ASC'],
    ],
  });
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

/** Removes an entry from the library; recipes keep their own copy of what they use. */
export async function deleteIngredient(breweryId: number, id: number, transaction?: Transaction): Promise<void> {
  if ((await Ingredient.destroy({ where: { id, breweryId }, transaction })) === 0) throw notFound('This ingredient');
}
