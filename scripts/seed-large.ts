// npm run seed:large: ten years of a busy brewery — 3,000 batches, 300,000 gravity readings, 100,000 brew-day log
// entries (plus one signed log entry behind every reading and packaging run, as the app writes them) — in its own
// invented brewery ("Saltmarsh Brewing"), with bulk inserts. Log hashes are chained exactly as the app chains them.
// Runs against the app instance (.data/) unless DATABASE_URL is already set (the benchmark sets it).
import { randomUUID } from 'node:crypto';
import { pathToFileURL } from 'node:url';
import * as mariadb from 'mariadb';
import { ensureInstance } from './lib/mariadb-instance';
import { APP_DATA } from './lib/paths';
import { sessionSecret } from './lib/session-secret';
import { connectionParts } from './backup';
import { migrateDatabase } from './restore';
import type { CreateRecipeInput } from '../shared/schemas/recipes';

export const LARGE_PASSWORD = 'harbour-copper-kettle-72';
export const LARGE_PEOPLE = {
  head_brewer: { email: 'head@saltmarsh.example', displayName: 'Tove Lindqvist' },
  assistant_brewer: { email: 'assistant@saltmarsh.example', displayName: 'Jonas Arendt' },
  taproom_manager: { email: 'taproom@saltmarsh.example', displayName: 'Ada Mwangi' },
} as const;

export interface LargeSeed {
  breweryId: number;
  recipes: { recipeId: number; versionId: number }[];
  batchIds: number[];
  counts: { batches: number; readings: number; brewDayEntries: number; allLogEntries: number; packagingRuns: number };
  seconds: number;
}

const RECIPE_NAMES = [
  'Breakwater Pale',
  'Foghorn Stout',
  'Tidepool Saison',
  'Lantern Amber',
  'Gull Rock IPA',
  'Slipway Lager',
];

/** The large brewery when it is already seeded (the benchmark reuses it), else null. */
export async function findLargeSeed(): Promise<LargeSeed | null> {
  const { Batch, Recipe, RecipeVersion, User } = await import('../server/models');
  const head = await User.findOne({ where: { email: LARGE_PEOPLE.head_brewer.email } });
  if (!head) return null;
  const recipes = await Recipe.findAll({ where: { breweryId: head.breweryId }, order: [['id', 'ASC']] });
  const versions = await RecipeVersion.findAll({
    where: { recipeId: recipes.map((r) => r.id) },
    order: [['id', 'ASC']],
  });
  const batches = await Batch.findAll({
    where: { breweryId: head.breweryId },
    attributes: ['id'],
    order: [['id', 'ASC']],
  });
  return {
    breweryId: head.breweryId,
    recipes: recipes.map((r) => ({ recipeId: r.id, versionId: versions.find((v) => v.recipeId === r.id)!.id })),
    batchIds: batches.map((b) => b.id),
    counts: { batches: batches.length, readings: 0, brewDayEntries: 0, allLogEntries: 0, packagingRuns: 0 },
    seconds: 0,
  };
}

/** Seeds the large brewery into the database DATABASE_URL points at (owner URL for the bulk inserts). */
export async function seedLarge(
  ownerUrl: string,
  size = { batches: 3000, readingsPerBatch: 100, brewDayEntriesPerBatch: 33 },
): Promise<LargeSeed> {
  const started = Date.now();
  const { User } = await import('../server/models');
  const { createBrewery } = await import('../server/services/auth');
  const { hashPassword } = await import('../server/services/passwords');
  const { createEquipment } = await import('../server/services/equipment');
  const { createRecipe } = await import('../server/services/recipes');
  const { planForBatch, freezeRecipeVersion } = await import('../server/services/recipe-plans');
  const { entryHash, GENESIS_HASH } = await import('../server/services/batch-log');
  const { DEMO_EQUIPMENT, SEASONAL_CONTENT } = await import('../server/seed/recipe-data');
  const { lineVolumeL } = await import('../shared/brewing');

  const existing = await User.findOne({ where: { email: LARGE_PEOPLE.head_brewer.email } });
  if (existing) throw new Error(`The large brewery is already seeded (brewery ${existing.breweryId}).`);

  const passwordHash = await hashPassword(LARGE_PASSWORD);
  const brewery = await createBrewery({
    name: 'Saltmarsh Brewing (ten-year sample)',
    unitSystem: 'us',
    timeZone: 'America/Halifax',
  });
  const users: Record<string, InstanceType<typeof User>> = {};
  for (const [role, p] of Object.entries(LARGE_PEOPLE)) {
    users[role] = await User.create({
      breweryId: brewery.id,
      ...p,
      role: role as 'head_brewer',
      passwordHash,
      disabledAt: null,
    });
  }
  const head = {
    id: users.head_brewer!.id,
    breweryId: brewery.id,
    role: 'head_brewer' as const,
    displayName: LARGE_PEOPLE.head_brewer.displayName,
    email: LARGE_PEOPLE.head_brewer.email,
  };
  // Recipes are written on the pilot kit and brewed on the 10 bbl brewhouse (scaled by the same planning code).
  const pilot = await createEquipment(brewery.id, DEMO_EQUIPMENT.pilot);
  const equipment = await createEquipment(brewery.id, DEMO_EQUIPMENT.big);
  const recipes: LargeSeed['recipes'] = [];
  const plans: unknown[] = [];
  for (const name of RECIPE_NAMES) {
    const input: CreateRecipeInput = {
      name,
      style: 'House beer',
      description: '',
      status: 'active',
      changeNote: 'First version',
      equipmentProfileId: pilot.id,
      content: SEASONAL_CONTENT,
    };
    const r = await createRecipe(head, input);
    recipes.push({ recipeId: r.id, versionId: r.versionId });
    plans.push(await planForBatch(brewery.id, { recipeVersionId: r.versionId, equipmentProfileId: equipment.id }));
    await freezeRecipeVersion(brewery.id, r.versionId);
  }

  const c = connectionParts(ownerUrl);
  const conn = await mariadb.createConnection({
    host: c.host,
    port: Number(c.port),
    user: c.user,
    password: c.password,
    database: c.database,
    bigIntAsNumber: true,
  });
  const counts = { batches: 0, readings: 0, brewDayEntries: 0, allLogEntries: 0, packagingRuns: 0 };
  try {
    // An aggregate always answers one row.
    const [batchMax] = await conn.query<{ nextBatch: number }[]>(
      'SELECT COALESCE(MAX(id), 0) + 1 AS nextBatch FROM batches',
    );
    const [entryMax] = await conn.query<{ nextEntry: number }[]>(
      'SELECT COALESCE(MAX(id), 0) + 1 AS nextEntry FROM batch_log_entries',
    );
    if (!batchMax || !entryMax) throw new Error('MAX(id) answered no row');
    const { nextBatch } = batchMax;
    const { nextEntry } = entryMax;
    let batchId = nextBatch;
    let entryId = nextEntry;
    const assistant = users.assistant_brewer!;
    const batchIds: number[] = [];
    const days = 3650;
    const end = Date.UTC(2026, 10, 1);
    const perYear = new Map<number, number>();

    // Chunks of 50 batches: each chunk's rows go in with a handful of multi-row inserts.
    for (let start = 0; start < size.batches; start += 50) {
      const batchRows: unknown[][] = [];
      const entryRows: unknown[][] = [];
      const readingRows: unknown[][] = [];
      const packagingRows: unknown[][] = [];
      for (let b = start; b < Math.min(size.batches, start + 50); b++) {
        const brewAt = new Date(end - (days - Math.floor((b * days) / size.batches)) * 86_400_000 + 7 * 3_600_000);
        const year = brewAt.getUTCFullYear();
        const sequence = (perYear.get(year) ?? 0) + 1;
        perYear.set(year, sequence);
        const ri = b % plans.length;
        const plan = plans[ri] as {
          recipeName: string;
          equipment: { batchVolumeL: number };
          computed: { og: number; volumes: { knockoutL: number } };
        };
        const recent = b >= size.batches - 8;
        const dumped = !recent && b % 97 === 13;
        const status = recent
          ? b % 2
            ? 'fermenting'
            : 'conditioning'
          : dumped
            ? 'dumped'
            : b % 5 === 0
              ? 'packaged'
              : 'released';
        const id = batchId++;
        batchIds.push(id);
        batchRows.push([
          id,
          brewery.id,
          `${year}-${String(sequence).padStart(3, '0')}`,
          year,
          sequence,
          plan.recipeName,
          recipes[ri]!.recipeId,
          recipes[ri]!.versionId,
          JSON.stringify(plan),
          plan.equipment.batchVolumeL,
          plan.computed.og,
          brewAt.toISOString().slice(0, 10),
          status,
          dumped ? 'Infected: sour off-flavour at day 6' : null,
          dumped ? brewAt : null,
          head.id,
          brewAt,
          brewAt,
        ]);
        // The log: brew-day entries (one of them knockout, with OG and volume), then readings, then packaging.
        let prevHash = GENESIS_HASH;
        let seq = 0;
        const og = plan.computed.og + (((b * 7919) % 11) - 5) / 1000;
        const knockoutL = plan.computed.volumes.knockoutL * (0.97 + ((b * 31) % 7) / 100);
        const push = (kind: string, stepKey: string | null, data: Record<string, unknown>, at: Date) => {
          seq += 1;
          const fields = {
            breweryId: brewery.id,
            batchId: id,
            sequence: seq,
            kind,
            stepKey,
            data,
            correctsEntryId: null,
            reason: null,
            authorId: assistant.id,
            authorRole: 'assistant_brewer' as const,
            authorName: LARGE_PEOPLE.assistant_brewer.displayName,
            meaning: 'performed' as const,
            capturedAt: at,
            receivedAt: at,
            deviceId: 'tablet-saltmarsh',
            late: false,
            idempotencyKey: randomUUID(),
          };
          const hash = entryHash(prevHash, fields);
          const eid = entryId++;
          entryRows.push([
            eid,
            brewery.id,
            id,
            seq,
            kind,
            stepKey,
            JSON.stringify(data),
            null,
            null,
            assistant.id,
            'assistant_brewer',
            fields.authorName,
            'performed',
            at,
            at,
            fields.deviceId,
            0,
            fields.idempotencyKey,
            hash,
            prevHash,
            hash,
          ]);
          prevHash = hash;
          return eid;
        };
        for (let i = 0; i < size.brewDayEntriesPerBatch; i++) {
          const at = new Date(brewAt.getTime() + i * 12 * 60_000);
          if (i === size.brewDayEntriesPerBatch - 1) {
            push(
              'step',
              'knockout-end',
              { label: 'Knockout end', measurements: { gravitySg: og, volumeL: knockoutL } },
              at,
            );
          } else {
            push('note', null, { text: `Brew-day note ${i + 1}`, deviation: false }, at);
          }
          counts.brewDayEntries += 1;
        }
        const fg = og - (og - 1) * 0.78;
        for (let i = 0; i < size.readingsPerBatch; i++) {
          const at = new Date(brewAt.getTime() + 86_400_000 + i * 3 * 3_600_000);
          const sg = fg + (og - fg) * Math.exp(-i / 18);
          const data = { method: 'probe', gravity: sg, gravityUnit: 'sg', temp: 19, tempUnit: 'c' };
          const eid = push('reading', null, data, at);
          readingRows.push([
            brewery.id,
            id,
            eid,
            eid,
            at,
            sg,
            sg,
            'sg',
            19,
            null,
            'probe',
            LARGE_PEOPLE.assistant_brewer.displayName,
            at,
          ]);
          counts.readings += 1;
        }
        if (!recent && !dumped) {
          const at = new Date(brewAt.getTime() + (18 + (b % 9)) * 86_400_000);
          const lines = [
            { kind: 'keg' as const, size: 'half_bbl' as const, count: Math.floor((knockoutL * 0.55) / 58.67) },
            { kind: 'keg' as const, size: 'sixth_bbl' as const, count: 6 },
            { kind: 'can' as const, sizeMl: 473, count: Math.floor((knockoutL * 0.2) / 0.473) },
          ];
          const packagedL = lines.reduce((s, l) => s + lineVolumeL(l), 0);
          const eid = push('packaging', null, { lines, final: true }, at);
          packagingRows.push([brewery.id, id, eid, at, JSON.stringify(lines), packagedL, at]);
          counts.packagingRuns += 1;
        }
      }
      await conn.beginTransaction();
      await conn.batch(
        `INSERT INTO batches (id, brewery_id, number, year, sequence, beer_name, recipe_id, recipe_version_id, plan, planned_volume_l,
           planned_og, brew_date, status, dumped_reason, dumped_at, created_by_id, created_at, updated_at) VALUES (?,?,?,?,?,?,?,?,?,?,?,?,?,?,?,?,?,?)`,
        batchRows,
      );
      await conn.batch(
        `INSERT INTO batch_log_entries (id, brewery_id, batch_id, sequence, kind, step_key, data, corrects_entry_id, reason, author_id,
           author_role, author_name, meaning, captured_at, received_at, device_id, late, idempotency_key, request_hash, prev_hash, hash)
         VALUES (?,?,?,?,?,?,?,?,?,?,?,?,?,?,?,?,?,?,?,?,?)`,
        entryRows, // the table's trigger writes each entry's idempotency record and audit row
      );
      await conn.batch(
        `INSERT INTO gravity_readings (brewery_id, batch_id, log_entry_id, reading_entry_id, taken_at, sg, entered_value, entered_unit, temp_c,
           ph, method, author_name, created_at) VALUES (?,?,?,?,?,?,?,?,?,?,?,?,?)`,
        readingRows,
      );
      if (packagingRows.length) {
        await conn.batch(
          'INSERT INTO packaging_runs (brewery_id, batch_id, log_entry_id, packaged_at, `lines`, packaged_l, created_at) VALUES (?,?,?,?,?,?,?)',
          packagingRows,
        );
      }
      await conn.commit();
      counts.batches += batchRows.length;
      counts.allLogEntries += entryRows.length;
    }
    await conn.query('ANALYZE TABLE batches, batch_log_entries, gravity_readings, packaging_runs, idempotency_keys');
    return { breweryId: brewery.id, recipes, batchIds, counts, seconds: (Date.now() - started) / 1000 };
  } finally {
    await conn.end();
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  (async () => {
    const instance = await ensureInstance(APP_DATA);
    migrateDatabase(instance.ownerUrl, instance.credentials.appUser);
    Object.assign(process.env, {
      DATABASE_URL: instance.appUrl,
      SESSION_SECRET: sessionSecret(APP_DATA.dataDir),
      SMTP_URL: process.env.SMTP_URL ?? 'smtp://127.0.0.1:2525',
      PUBLIC_URL: process.env.PUBLIC_URL ?? 'http://127.0.0.1:3000',
      LOG_LEVEL: 'warn',
    });
    const seeded = await seedLarge(instance.ownerUrl);
    const { sequelize } = await import('../server/config/database');
    await sequelize.close();
    console.log(`Seeded Saltmarsh Brewing in ${seeded.seconds.toFixed(1)} s: ${JSON.stringify(seeded.counts)}`);
    console.log(`Sign in as ${LARGE_PEOPLE.head_brewer.email} (password ${LARGE_PASSWORD}).`);
  })().catch((err) => {
    console.error(err instanceof Error ? err.stack : err);
    process.exit(1);
  });
}
