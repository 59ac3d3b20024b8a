import { QueryTypes } from 'sequelize';
import type { Migration } from './umzug';
import { STARTER_INGREDIENTS } from '../services/starter-ingredients';

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
      STARTER_INGREDIENTS.map((s) => ({
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
