import { QueryTypes } from 'sequelize';
import type { Migration } from './umzug';

/**
 * The starter library as it stood when this migration was written: a frozen copy, so a later change to the
 * library that new breweries receive never changes what this migration writes.
 */
const STARTER_ROWS: {
  kind: string;
  name: string;
  ppg?: number;
  colourLovibond?: number;
  alphaAcidPct?: number;
  attenuationPct?: number;
  notes?: string;
}[] = [
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

// Breweries now receive the starter ingredient library when they are created. Those created before, whose
// library was never opened (it used to be filled on the first visit), receive it here.
export const up: Migration = async ({ context: qi }) => {
  const empty = await qi.sequelize.query<{ id: number }>(
    'SELECT b.id FROM breweries b WHERE NOT EXISTS (SELECT 1 FROM ingredients i WHERE i.brewery_id = b.id)',
    { type: QueryTypes.SELECT },
  );
  if (empty.length === 0) return;
  const now = new Date();
  await qi.bulkInsert(
    'ingredients',
    empty.flatMap(({ id }) =>
      STARTER_ROWS.map((s) => ({
        brewery_id: id,
        kind: s.kind,
        name: s.name,
        ppg: s.ppg ?? null,
        colour_lovibond: s.colourLovibond ?? null,
        alpha_acid_pct: s.alphaAcidPct ?? null,
        attenuation_pct: s.attenuationPct ?? null,
        notes: s.notes ?? '',
        typical: true,
        created_at: now,
        updated_at: now,
      })),
    ),
  );
};

// The starter rows stay: they may have been edited or used since.
export const down: Migration = async () => {};
