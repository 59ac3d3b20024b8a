/**
 * A recipe version restated for a brewhouse and batch size: the scale screen, the brew sheet
 * and batch planning all read it from here. Every number comes from shared/brewing.
 */
import type { Transaction } from 'sequelize';
import {
  scaleRecipe,
  type ComputedRecipe,
  type EquipmentProfile,
  type RecipeInput,
  type ScaleChange,
  type ScaledRecipe,
} from '../../shared/brewing';
import {
  equipmentAtVolume,
  toRecipeInput,
  type EquipmentInput,
  type RecipeVersionContent,
  type ScaleTarget,
} from '../../shared/schemas/recipes';
import { EquipmentProfile as EquipmentRow, Recipe, RecipeVersion } from '../models';
import { notFound } from '../errors';

/** The calculation view of a stored equipment profile (a model row, or a raw row with the same names). */
export function equipmentFromRow(row: EquipmentInput): EquipmentProfile {
  return {
    name: row.name,
    batchVolumeL: row.batchVolumeL,
    brewhouseEfficiency: row.brewhouseEfficiency,
    boilOffLPerHour: row.boilOffLPerHour,
    boilMinutes: row.boilMinutes,
    mashTunDeadSpaceL: row.mashTunDeadSpaceL,
    kettleDeadSpaceL: row.kettleDeadSpaceL,
    trubChillerLossL: row.trubChillerLossL,
    fermenterLossL: row.fermenterLossL,
    grainAbsorptionLPerKg: row.grainAbsorptionLPerKg,
    maxMashTunVolumeL: row.maxMashTunVolumeL,
    maxKettleVolumeL: row.maxKettleVolumeL,
    mashThicknessLPerKg: row.mashThicknessLPerKg,
  };
}

export async function findEquipment(breweryId: number, id: number, transaction?: Transaction): Promise<EquipmentRow> {
  const row = await EquipmentRow.findOne({ where: { id, breweryId }, transaction });
  if (!row) throw notFound('This equipment profile');
  return row;
}

export async function findVersion(
  breweryId: number,
  id: number,
  transaction?: Transaction,
  lock = false,
): Promise<{ version: RecipeVersion; recipe: Recipe }> {
  const version = await RecipeVersion.findOne({
    where: { id, breweryId },
    transaction,
    ...(lock && transaction ? { lock: transaction.LOCK.UPDATE } : {}),
  });
  const recipe = version && (await Recipe.findOne({ where: { id: version.recipeId, breweryId }, transaction }));
  if (!version || !recipe) throw notFound('This recipe version');
  return { version, recipe };
}

/** The brewhouse a version was written for, at the version's own batch volume. */
export async function versionEquipment(
  version: RecipeVersion,
  transaction?: Transaction,
): Promise<{ row: EquipmentRow; equipment: EquipmentProfile }> {
  const row = await findEquipment(version.breweryId, version.equipmentProfileId, transaction);
  return { row, equipment: equipmentAtVolume(equipmentFromRow(row), version.content.targets.batchVolumeL) };
}

export interface VersionScale {
  recipe: Recipe;
  version: RecipeVersion;
  sourceEquipmentId: number;
  source: EquipmentProfile;
  targetEquipmentId: number;
  target: EquipmentProfile;
  scaled: ScaledRecipe;
}

/**
 * Scales a version to another profile and/or a typed batch volume. Without a profile the
 * version's own brewhouse is used; without a volume, the profile's (or, with neither, the version's).
 */
export async function scaleVersion(
  breweryId: number,
  recipeVersionId: number,
  to: Partial<ScaleTarget>,
  transaction?: Transaction,
): Promise<VersionScale> {
  const { version, recipe } = await findVersion(breweryId, recipeVersionId, transaction);
  const { row: sourceRow, equipment: source } = await versionEquipment(version, transaction);
  const targetRow =
    to.equipmentProfileId === undefined
      ? sourceRow
      : await findEquipment(breweryId, to.equipmentProfileId, transaction);
  const base = equipmentFromRow(targetRow);
  const volumeL = to.batchVolumeL ?? (to.equipmentProfileId === undefined ? source.batchVolumeL : base.batchVolumeL);
  const target = equipmentAtVolume(base, volumeL);
  const scaled = scaleRecipe(toRecipeInput(recipe.name, version.content), source, target);
  return { recipe, version, sourceEquipmentId: sourceRow.id, source, targetEquipmentId: targetRow.id, target, scaled };
}

/** What a batch is brewed from: a recipe version restated for the batch's brewhouse and volume. */
export interface BatchPlan {
  recipeId: number;
  recipeVersionId: number;
  versionNumber: number;
  recipeName: string;
  style: string;
  equipmentProfileId: number;
  equipmentName: string;
  /** The target brewhouse at the batch volume. */
  equipment: EquipmentProfile;
  /** The recipe as scaled to the target (weights re-solved). */
  recipe: RecipeInput;
  /** Every number on the target: OG, FG, IBU, volumes, strike temperature, adjunct and spice amounts... */
  computed: ComputedRecipe;
  /** Every quantity before and after, with the non-linear ones flagged. */
  changes: ScaleChange[];
  /**
   * The version's content as written (prep steps, spices, yeast, fermentation plan, mash steps,
   * targets). Its weights are for the version's own brewhouse: use `recipe`/`computed` for amounts.
   * `computed.adjuncts` lists `content.adjuncts` first, then `content.spices`, in order.
   */
  content: RecipeVersionContent;
}

/** Plans a batch of a version on a brewhouse (default: the version's own) at a volume (default: the profile's). 404 if not this brewery's. */
export async function planForBatch(
  breweryId: number,
  input: { recipeVersionId: number; equipmentProfileId?: number; batchVolumeL?: number },
  transaction?: Transaction,
): Promise<BatchPlan> {
  const s = await scaleVersion(breweryId, input.recipeVersionId, input, transaction);
  return {
    recipeId: s.recipe.id,
    recipeVersionId: s.version.id,
    versionNumber: s.version.number,
    recipeName: s.recipe.name,
    style: s.recipe.style,
    equipmentProfileId: s.targetEquipmentId,
    equipmentName: s.target.name,
    equipment: s.target,
    recipe: s.scaled.recipe,
    computed: s.scaled.after,
    changes: s.scaled.changes,
    content: s.version.content,
  };
}

/**
 * Marks a version as used by a batch: it can no longer be edited in place (saving makes the next
 * version). Idempotent. 404 if not this brewery's.
 */
export async function freezeRecipeVersion(
  breweryId: number,
  recipeVersionId: number,
  transaction?: Transaction,
): Promise<void> {
  const { version } = await findVersion(breweryId, recipeVersionId, transaction, true);
  if (!version.frozenAt) await version.update({ frozenAt: new Date() }, { transaction });
}
