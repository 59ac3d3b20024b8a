// The demo brewery's taproom: two beers on tap, one coming soon, one packaged and waiting for the head
// brewer's release. Each batch carries a full record (brew-day log with its OG, cellar readings, packaging,
// tasting notes) so the released numbers come from the logs. Every name, number and word is invented.
import { Op, type Transaction } from 'sequelize';
import { Batch, PackagingRun, Recipe, RecipeVersion, Release, Vessel } from '../models';
import { freezeRecipeVersion, planForBatch } from '../services/recipe-plans';
import { assignVessel, createBatchFromPlan } from '../services/batches';
import { appendLogEntry, type LogActor } from '../services/batch-log';
import { addTastingNote } from '../services/tasting';
import { writeReading } from '../services/readings';
import { finalNumbers } from '../services/release';
import { brewDaySteps } from '../../shared/batches/brew-day';
import { abv, ABV_METHOD_SHOWN, KEG_SIZES, lineVolumeL, type PackageLine } from '../../shared/brewing';
import type { TastingNoteContent } from '../../shared/schemas/tasting';
import type { ReleaseSheet } from '../../shared/schemas/taproom';
import type { DemoContext } from './context';

const DAY_MS = 86_400_000;

interface DemoBeer {
  recipeIndex: number;
  brewedDaysAgo: number;
  /** Measured against planned, in SG: OG and FG a little off plan, as real batches are. */
  ogOffset: number;
  fgOffset: number;
  stage: 'conditioning' | 'packaged' | 'released';
  sheet?: Omit<ReleaseSheet, 'beerName' | 'style' | 'photoAttachmentId'>;
  notes: { who: 'head_brewer' | 'assistant_brewer'; content: TastingNoteContent }[];
}

const note = (score: number, aroma: string, flavour: string, overall: string, colour: string): TastingNoteContent => ({
  appearance: { colour, clarity: 'clear', head: 'good' },
  aroma,
  flavour,
  mouthfeel: { body: 'medium', carbonation: 'medium', notes: '' },
  overall,
  offFlavours: [],
  score,
});

const BEERS: DemoBeer[] = [
  {
    recipeIndex: 0,
    brewedDaysAgo: 41,
    ogOffset: -0.001,
    fgOffset: 0.001,
    stage: 'released',
    sheet: {
      description:
        'Our harbour-side session pour: toasty biscuit malt, a gentle earthy bitterness and a clean, dry finish that keeps the next sip coming.',
      glass: 'nonic_pint',
      servingTempC: 10,
      servingNotes: 'Pour gently down the side; a slim, tight head.',
      allergens: ['gluten'],
      comingSoon: false,
    },
    notes: [
      {
        who: 'head_brewer',
        content: note(
          4,
          'Toasted bread, faint orange marmalade',
          'Biscuit malt, earthy hop, dry finish',
          'Right where we want it',
          'amber',
        ),
      },
      {
        who: 'assistant_brewer',
        content: note(
          4.5,
          'Bread crust and a little honey',
          'Malty then dry, soft bitterness',
          'Very easy drinking',
          'copper',
        ),
      },
    ],
  },
  {
    recipeIndex: 1,
    brewedDaysAgo: 30,
    ogOffset: 0.002,
    fgOffset: -0.001,
    stage: 'released',
    sheet: {
      description:
        'Black as the harbour at night: roasted barley and cocoa up front, oats for a silky body, and a quiet coffee bitterness on the way out.',
      glass: 'shaker_pint',
      servingTempC: 11,
      servingNotes: 'Serve cellar-cool, not ice-cold; a thick tan head.',
      allergens: ['gluten'],
      comingSoon: false,
    },
    notes: [
      {
        who: 'head_brewer',
        content: note(
          4.5,
          'Dark chocolate, roast coffee, a little toffee',
          'Roast first, then smooth oats and a dry finish',
          'Body is right where we want it',
          'near black',
        ),
      },
    ],
  },
  {
    recipeIndex: 2,
    brewedDaysAgo: 16,
    ogOffset: 0,
    fgOffset: 0.002,
    stage: 'conditioning',
    sheet: {
      description:
        'A crisp, softly bready pale lager with a floral hop note, lagering now in the bright tank and due on tap soon.',
      glass: 'stange',
      servingTempC: 4,
      servingNotes: '',
      allergens: ['gluten'],
      comingSoon: true,
    },
    notes: [],
  },
  { recipeIndex: 3, brewedDaysAgo: 24, ogOffset: -0.002, fgOffset: 0.001, stage: 'packaged', notes: [] },
];

/** The smallest clean bright tank the beer fits in (the cellar seed made them). */
async function brightTankFor(breweryId: number, litres: number, t: Transaction): Promise<Vessel> {
  const tank = await Vessel.findOne({
    where: { breweryId, type: 'bright_tank', currentBatchId: null, capacityL: { [Op.gte]: litres } },
    order: [['capacityL', 'ASC']],
    transaction: t,
  });
  if (!tank) throw new Error('The demo cellar has no bright tank for the conditioning beer');
  return tank;
}

async function brew(ctx: DemoContext, beer: DemoBeer, recipe: Recipe, t: Transaction): Promise<Batch> {
  const { brewery, users } = ctx;
  const assistant: LogActor = {
    id: users.assistant_brewer.id,
    breweryId: brewery.id,
    role: 'assistant_brewer',
    displayName: users.assistant_brewer.displayName,
  };
  const version = (await RecipeVersion.findOne({
    where: { recipeId: recipe.id },
    order: [['number', 'DESC']],
    transaction: t,
  }))!;
  const plan = await planForBatch(brewery.id, { recipeVersionId: version.id }, t);
  await freezeRecipeVersion(brewery.id, version.id, t);
  const brewDay = new Date(Date.now() - beer.brewedDaysAgo * DAY_MS);
  brewDay.setUTCHours(11, 0, 0, 0);
  const batch = await createBatchFromPlan(
    { id: users.head_brewer.id, breweryId: brewery.id },
    plan,
    { brewDate: brewDay.toISOString().slice(0, 10) },
    t,
  );
  const c = plan.computed;
  const og = Math.round((c.og + beer.ogOffset) * 1000) / 1000;
  const fg = Math.round((c.fg + beer.fgOffset) * 1000) / 1000;
  const knockoutL = c.volumes.knockoutL * 0.97;
  const at = (minutes: number) => new Date(brewDay.getTime() + minutes * 60_000);
  let n = 0;
  const meta = (capturedAt: Date) => ({
    idempotencyKey: `demo-taproom-${batch.id}-${(n += 1)}`.padEnd(16, '0'),
    capturedAt,
    deviceId: 'demo-tablet-1',
  });

  let minute = 0;
  // Each beer at its own recipe's temperatures: pitched cool, fermented at primary, raised for the D-rest near
  // terminal gravity, then crashed cold.
  const { yeast, fermentation } = version.content;
  for (const step of brewDaySteps(plan)) {
    minute += step.boilMinute !== undefined ? 5 : 18;
    const measurements =
      step.key === 'knockout-end' ? { gravitySg: og, volumeL: knockoutL, tempC: yeast.pitchTempC } : undefined;
    await appendLogEntry(
      assistant,
      batch.id,
      { kind: 'step', stepKey: step.key, label: step.label, ...(measurements ? { measurements } : {}) },
      meta(at(minute)),
      { transaction: t },
    );
  }
  await batch.update({ status: 'fermenting' }, { transaction: t });

  // Daily-ish readings falling to the final gravity, recorded as the cellar records them (a log entry and its reading row).
  const primaryC = fermentation.primaryTempC;
  const readings: [number, number][] = [
    [og - (og - fg) * 0.45, primaryC],
    [og - (og - fg) * 0.85, primaryC],
    [fg + 0.001, fermentation.dRestTempC ?? primaryC],
    [fg, fermentation.crashTempC],
  ];
  for (const [i, [raw, tempC]] of readings.entries()) {
    const sg = Math.round(raw * 1000) / 1000;
    await writeReading(
      assistant,
      batch.id,
      { kind: 'reading', method: 'hydrometer', gravity: sg, gravityUnit: 'sg', temp: tempC, tempUnit: 'c' },
      meta(at(60 * 24 * (2 + i * 2))),
      t,
    );
  }
  await batch.update({ status: 'conditioning' }, { transaction: t });
  if (beer.stage === 'conditioning') {
    await assignVessel(brewery.id, batch.id, (await brightTankFor(brewery.id, knockoutL, t)).id, t);
    return batch;
  }

  const lines: PackageLine[] = [
    { kind: 'keg', size: 'sixth_bbl', count: Math.floor((knockoutL * 0.5) / KEG_SIZES.sixth_bbl) },
    { kind: 'can', sizeMl: 473, count: Math.floor((knockoutL * 0.35) / 0.473) },
  ];
  const m = meta(at(60 * 24 * 14));
  await appendLogEntry(assistant, batch.id, { kind: 'packaging', lines, final: true }, m, {
    transaction: t,
    onInsert: async (entry, tx) => {
      const packagedL = lines.reduce((sum, line) => sum + lineVolumeL(line), 0);
      await PackagingRun.create(
        {
          breweryId: brewery.id,
          batchId: batch.id,
          logEntryId: Number(entry.id),
          packagedAt: m.capturedAt,
          lines,
          packagedL,
        },
        { transaction: tx },
      );
    },
  });
  await batch.update({ status: 'packaged' }, { transaction: t });
  return batch;
}

export async function seedTaproom(ctx: DemoContext): Promise<void> {
  const { brewery, users, transaction: t } = ctx;
  const recipes = await Recipe.findAll({ where: { breweryId: brewery.id }, order: [['id', 'ASC']], transaction: t });
  for (const beer of BEERS) {
    const batch = await brew(ctx, beer, recipes[beer.recipeIndex % recipes.length]!, t);
    for (const [i, n] of beer.notes.entries()) {
      const u = users[n.who];
      await addTastingNote(
        { id: u.id, breweryId: brewery.id, role: u.role, email: u.email, displayName: u.displayName },
        batch.id,
        { idempotencyKey: `demo-tasting-${batch.id}-${i}`, content: n.content },
        t,
      );
    }
    if (!beer.sheet) continue;
    const { comingSoon, ...sheet } = beer.sheet;
    const released = beer.stage === 'released';
    const c = batch.plan.computed;
    const numbers = await finalNumbers(batch, t);
    await Release.create(
      {
        ...sheet,
        breweryId: brewery.id,
        batchId: batch.id,
        beerName: batch.beerName,
        style: batch.plan.style ?? '',
        photoAttachmentId: null,
        state: released ? 'on_tap' : comingSoon ? 'coming_soon' : 'draft',
        og: released ? numbers.og : null,
        fg: released ? numbers.fg : null,
        abvPct: released ? abv(numbers.og!, numbers.fg!) : null,
        abvMethod: released ? ABV_METHOD_SHOWN : null,
        ibu: released ? c.ibu : null,
        srm: released ? c.srm : null,
        releasedAt: released ? new Date(Date.now() - (beer.brewedDaysAgo - 20) * DAY_MS) : null,
        releasedById: released ? users.head_brewer.id : null,
      },
      { transaction: t },
    );
    if (released) await batch.update({ status: 'released' }, { transaction: t });
  }
}
