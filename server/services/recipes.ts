/** Recipes and their versions: save (computing the list figures with shared/brewing), version, freeze rules, compare. */
import { QueryTypes, type Transaction } from 'sequelize';
import { computeRecipe, type ComputedRecipe } from '../../shared/brewing';
import {
  equipmentAtVolume,
  resolveHopShares,
  toRecipeInput,
  type CreateRecipeInput,
  type RecipeVersionContent,
  type SaveScaledInput,
  type SaveVersionInput,
  type UpdateRecipeInput,
  type RecipeListRow,
  type VersionSummary,
  type Difference,
  type EquipmentInput,
} from '../../shared/schemas/recipes';
import { sequelize } from '../config/database';
import { conflict, notFound } from '../errors';
import { EquipmentProfile, Recipe, RecipeVersion, User } from '../models';
import { equipmentFromRow, findEquipment, findVersion, scaleVersion } from './recipe-plans';
import { LRUCache } from 'lru-cache';

interface Actor {
  id: number;
  breweryId: number;
}

/**
 * The recipe list with each recipe's latest version. "Last brewed" is the brew date of the
 * latest batch whose brew day has started: any status past planned, or dumped once its brew
 * day had log entries. Planning a batch (which freezes the version) is not brewing it.
 */
export async function listRecipes(breweryId: number): Promise<RecipeListRow[]> {
  const rows = await sequelize.query<RecipeListRow & { lastBrewedAt: string | null; updatedAt: Date }>(
    `SELECT r.id, r.name, r.style, r.status, v.id AS latestVersionId, v.number AS latestVersion,
            v.og, v.fg, v.ibu, v.srm, v.abv_pct AS abvPct, r.updated_at AS updatedAt,
            (SELECT DATE_FORMAT(MAX(b.brew_date), '%Y-%m-%d') FROM batches b
              WHERE b.brewery_id = r.brewery_id AND b.recipe_id = r.id
                AND (b.status NOT IN ('planned', 'dumped')
                     OR (b.status = 'dumped' AND EXISTS (SELECT 1 FROM batch_log_entries e WHERE e.batch_id = b.id)))) AS lastBrewedAt
       FROM recipes r
       JOIN recipe_versions v ON v.recipe_id = r.id
        AND v.number = (SELECT MAX(m.number) FROM recipe_versions m WHERE m.recipe_id = r.id)
      WHERE r.brewery_id = ?
      ORDER BY r.name`,
    { replacements: [breweryId], type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    ...r,
    lastBrewedAt: r.lastBrewedAt ?? null,
    updatedAt: new Date(r.updatedAt).toISOString(),
  }));
}

async function findRecipe(breweryId: number, id: number, transaction?: Transaction): Promise<Recipe> {
  const recipe = await Recipe.findOne({ where: { id, breweryId }, transaction });
  if (!recipe) throw notFound('This recipe');
  return recipe;
}

const iso = (d: Date | string) => new Date(d).toISOString();

type VersionFields = Omit<VersionSummary, 'authorName' | 'createdAt' | 'frozenAt'> & {
  createdAt: Date | string;
  frozenAt: Date | string | null;
};

function versionSummary(v: VersionFields, authorName: string | null | undefined): VersionSummary {
  return {
    id: v.id,
    number: v.number,
    changeNote: v.changeNote,
    authorName: authorName ?? 'Former teammate',
    createdAt: iso(v.createdAt),
    frozenAt: v.frozenAt === null ? null : iso(v.frozenAt),
    equipmentProfileId: v.equipmentProfileId,
    batchVolumeL: v.batchVolumeL,
    og: v.og,
    fg: v.fg,
    ibu: v.ibu,
    srm: v.srm,
    abvPct: v.abvPct,
  };
}

async function summaries(versions: RecipeVersion[]): Promise<VersionSummary[]> {
  const authors = await User.findAll({
    where: { id: [...new Set(versions.map((v) => v.authorId))] },
    attributes: ['id', 'displayName'],
  });
  const byId = new Map(authors.map((a) => [a.id, a.displayName]));
  return versions.map((v) => versionSummary(v, byId.get(v.authorId)));
}

function recipeJson(recipe: Recipe) {
  return {
    id: recipe.id,
    name: recipe.name,
    style: recipe.style,
    description: recipe.description,
    status: recipe.status,
  };
}

export async function getRecipe(breweryId: number, id: number) {
  const recipe = await findRecipe(breweryId, id);
  const versions = await RecipeVersion.findAll({ where: { recipeId: id, breweryId }, order: [['number', 'DESC']] });
  return { ...recipeJson(recipe), versions: await summaries(versions) };
}

/** Every number for a version's content on its brewhouse at its batch volume; hops written as IBU shares get their solved weights. */
async function compute(
  breweryId: number,
  recipeName: string,
  equipmentProfileId: number,
  written: RecipeVersionContent,
  transaction?: Transaction,
) {
  const row = await findEquipment(breweryId, equipmentProfileId, transaction);
  const equipment = equipmentAtVolume(equipmentFromRow(row), written.targets.batchVolumeL);
  const content = resolveHopShares(recipeName, written, equipment);
  return { content, computed: computeRecipe(toRecipeInput(recipeName, content), equipment) };
}

function figures(computed: ComputedRecipe, content: RecipeVersionContent) {
  return {
    og: computed.og,
    fg: computed.fg,
    ibu: computed.ibu,
    srm: computed.srm,
    abvPct: computed.abvPct,
    batchVolumeL: content.targets.batchVolumeL,
  };
}

async function writeVersion(
  actor: Actor,
  recipe: Recipe,
  input: SaveVersionInput,
  transaction: Transaction,
): Promise<RecipeVersion> {
  const { content, computed } = await compute(
    actor.breweryId,
    recipe.name,
    input.equipmentProfileId,
    input.content,
    transaction,
  );
  const last =
    (await RecipeVersion.max<number, RecipeVersion>('number', { where: { recipeId: recipe.id }, transaction })) ?? 0;
  const version = await RecipeVersion.create(
    {
      breweryId: actor.breweryId,
      recipeId: recipe.id,
      number: last + 1,
      changeNote: input.changeNote,
      authorId: actor.id,
      equipmentProfileId: input.equipmentProfileId,
      content,
      ...figures(computed, content),
      frozenAt: null,
    },
    { transaction },
  );
  recipe.changed('updatedAt', true);
  await recipe.save({ transaction });
  return version;
}

export async function createRecipe(actor: Actor, input: CreateRecipeInput) {
  return sequelize.transaction(async (transaction) => {
    const { name, style, description, status, ...first } = input;
    const recipe = await Recipe.create(
      { breweryId: actor.breweryId, name, style, description, status },
      { transaction },
    );
    const version = await writeVersion(actor, recipe, first, transaction);
    return { ...recipeJson(recipe), versionId: version.id, versionNumber: version.number };
  });
}

export async function updateRecipe(breweryId: number, id: number, input: UpdateRecipeInput) {
  const recipe = await findRecipe(breweryId, id);
  await recipe.update(input);
  return recipeJson(recipe);
}

async function versionOf(
  breweryId: number,
  recipeId: number,
  versionId: number,
  transaction?: Transaction,
  lock = false,
) {
  const found = await findVersion(breweryId, versionId, transaction, lock);
  if (found.recipe.id !== recipeId) throw notFound('This recipe version');
  return found;
}

/** A version with its recipe, author and brewhouse, as getVersion's one statement returns it (the brewhouse under its own names). */
interface VersionRow extends VersionFields, EquipmentInput {
  recipeId: number;
  versionBatchVolumeL: number;
  authorName: string | null;
  /** The stored text (cast, so the driver does not parse it): the cache key, parsed only on a miss. */
  content: string;
  recipeName: string;
  style: string;
  description: string;
  status: Recipe['status'];
}

/**
 * A version's computed numbers depend only on the recipe's name, the version's content and its brewhouse.
 * The key is all three exactly as stored, so an edited version, a renamed recipe or a changed equipment
 * profile makes a different key: a cached answer can never be stale. Values are shared: never mutate them.
 */
const computedCache = new LRUCache<string, { content: RecipeVersionContent; computed: ComputedRecipe }>({ max: 500 });

function computedFor(recipeName: string, contentText: string, profile: EquipmentInput) {
  const key = JSON.stringify([recipeName, profile, contentText]);
  const hit = computedCache.get(key);
  if (hit) return hit;
  const content = JSON.parse(contentText) as RecipeVersionContent;
  const equipment = equipmentAtVolume(profile, content.targets.batchVolumeL);
  const value = {
    content,
    computed: computeRecipe(toRecipeInput(recipeName, resolveHopShares(recipeName, content, equipment)), equipment),
  };
  computedCache.set(key, value);
  return value;
}

/** A version with its recipe and computed numbers, read in one statement (version, recipe, author, brewhouse). */
export async function getVersion(breweryId: number, recipeId: number, versionId: number) {
  const [row] = await sequelize.query<VersionRow>(
    `SELECT v.id, v.recipe_id AS recipeId, v.number, v.change_note AS changeNote, u.display_name AS authorName,
            v.created_at AS createdAt, v.frozen_at AS frozenAt, v.equipment_profile_id AS equipmentProfileId,
            v.batch_volume_l AS versionBatchVolumeL, v.og, v.fg, v.ibu, v.srm, v.abv_pct AS abvPct,
            CAST(v.content AS CHAR) AS content,
            r.name AS recipeName, r.style, r.description, r.status,
            e.name, e.batch_volume_l AS batchVolumeL,
            e.brewhouse_efficiency AS brewhouseEfficiency, e.boil_off_l_per_hour AS boilOffLPerHour, e.boil_minutes AS boilMinutes,
            e.mash_tun_dead_space_l AS mashTunDeadSpaceL, e.kettle_dead_space_l AS kettleDeadSpaceL,
            e.trub_chiller_loss_l AS trubChillerLossL, e.fermenter_loss_l AS fermenterLossL,
            e.grain_absorption_l_per_kg AS grainAbsorptionLPerKg, e.max_mash_tun_volume_l AS maxMashTunVolumeL,
            e.max_kettle_volume_l AS maxKettleVolumeL, e.mash_thickness_l_per_kg AS mashThicknessLPerKg
       FROM recipe_versions v
       JOIN recipes r ON r.id = v.recipe_id AND r.brewery_id = v.brewery_id
       LEFT JOIN users u ON u.id = v.author_id
       LEFT JOIN equipment_profiles e ON e.id = v.equipment_profile_id AND e.brewery_id = v.brewery_id
      WHERE v.id = ? AND v.brewery_id = ? AND v.recipe_id = ?`,
    { type: QueryTypes.SELECT, replacements: [versionId, breweryId, recipeId] },
  );
  if (!row) throw notFound('This recipe version');
  if (row.name === null) throw notFound('This equipment profile');
  const { content, computed } = computedFor(row.recipeName, row.content, equipmentFromRow(row));
  return {
    recipe: {
      id: row.recipeId,
      name: row.recipeName,
      style: row.style,
      description: row.description,
      status: row.status,
    },
    version: { ...versionSummary({ ...row, batchVolumeL: row.versionBatchVolumeL }, row.authorName), content },
    computed,
  };
}

/** Saves the next version of a recipe (from the editor's content, whatever version it started from). */
export async function addVersion(actor: Actor, recipeId: number, input: SaveVersionInput) {
  return sequelize.transaction(async (transaction) => {
    const recipe = await findRecipe(actor.breweryId, recipeId, transaction);
    const version = await writeVersion(actor, recipe, input, transaction);
    return { id: version.id, number: version.number };
  });
}

/** Edits a version in place; a version a batch has used is frozen (409: save it as the next version). */
export async function updateVersion(actor: Actor, recipeId: number, versionId: number, input: SaveVersionInput) {
  return sequelize.transaction(async (transaction) => {
    const { version, recipe } = await versionOf(actor.breweryId, recipeId, versionId, transaction, true);
    if (version.frozenAt)
      throw conflict(
        `Version ${version.number} has been used by a batch and cannot change. Save your edits as the next version.`,
      );
    const { content, computed } = await compute(
      actor.breweryId,
      recipe.name,
      input.equipmentProfileId,
      input.content,
      transaction,
    );
    await version.update(
      {
        changeNote: input.changeNote,
        equipmentProfileId: input.equipmentProfileId,
        content,
        authorId: actor.id,
        ...figures(computed, content),
      },
      { transaction },
    );
    return { id: version.id, number: version.number };
  });
}

/** Saves a version scaled to another brewhouse or volume as the recipe's next version. */
export async function saveScaledVersion(actor: Actor, recipeId: number, versionId: number, input: SaveScaledInput) {
  return sequelize.transaction(async (transaction) => {
    await versionOf(actor.breweryId, recipeId, versionId, transaction);
    const s = await scaleVersion(actor.breweryId, versionId, input, transaction);
    const { grainBill, hops, water } = s.scaled.recipe;
    const old = s.version.content;
    const content: RecipeVersionContent = {
      ...old,
      grainBill,
      // The scaled hops keep their order: only the weight is the maths'; form and IBU share stay the brewer's.
      hops: old.hops.map((h, i) => ({ ...h, weightG: hops[i]!.weightG })),
      ...(water ? { water } : {}),
      targets: { ...old.targets, batchVolumeL: s.target.batchVolumeL },
    };
    const version = await writeVersion(
      actor,
      s.recipe,
      { changeNote: input.changeNote, equipmentProfileId: s.targetEquipmentId, content },
      transaction,
    );
    return { id: version.id, number: version.number };
  });
}

type Leaf = string | number | boolean | null;

function flatten(value: unknown, prefix: string, out: Map<string, Leaf>): void {
  if (value !== null && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) flatten(v, prefix ? `${prefix}.${k}` : k, out);
  } else if (value !== undefined) {
    out.set(prefix, value as Leaf);
  }
}

/** Every leaf of two documents that differs, by dotted path (a missing side is null). */
export function differences(a: unknown, b: unknown): Difference[] {
  const fa = new Map<string, Leaf>();
  const fb = new Map<string, Leaf>();
  flatten(a, '', fa);
  flatten(b, '', fb);
  const paths = [...new Set([...fa.keys(), ...fb.keys()])];
  return paths
    .filter((p) => fa.get(p) !== fb.get(p))
    .map((p) => ({ path: p, a: fa.get(p) ?? null, b: fb.get(p) ?? null }));
}

const round = (x: number, decimals: number) => Number(x.toFixed(decimals));

/** Two versions side by side: both contents and computed figures, and what changed. */
export async function compareVersions(breweryId: number, recipeId: number, a: number, b: number) {
  const [left, right] = await Promise.all([getVersion(breweryId, recipeId, a), getVersion(breweryId, recipeId, b)]);
  const names = new Map(
    (
      await EquipmentProfile.findAll({
        where: { breweryId, id: [left.version.equipmentProfileId, right.version.equipmentProfileId] },
        attributes: ['id', 'name'],
      })
    ).map((e) => [e.id, e.name]),
  );
  const pick = (v: typeof left) => ({
    equipment: names.get(v.version.equipmentProfileId) ?? null,
    changeNote: v.version.changeNote,
    content: v.version.content,
    // Rounded as the screens show them, so calculation noise is not reported as a change.
    computed: {
      og: round(v.computed.og, 3),
      fg: round(v.computed.fg, 3),
      abvPct: round(v.computed.abvPct, 1),
      ibu: round(v.computed.ibu, 1),
      srm: round(v.computed.srm, 1),
      buGu: round(v.computed.buGu, 2),
      strikeTempC: round(v.computed.strikeTempC, 1),
    },
  });
  return { recipe: left.recipe, a: left, b: right, differences: differences(pick(left), pick(right)) };
}
