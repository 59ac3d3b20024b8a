/** Equipment profiles: a brewery's brewhouses, as shared/brewing sees them. */
import type { Transaction } from 'sequelize';
import { validateEquipment } from '../../shared/brewing';
import type { EquipmentInput } from '../../shared/schemas/recipes';
import { EquipmentProfile, RecipeVersion } from '../models';
import { conflict } from '../errors';
import { equipmentFromRow, findEquipment } from './recipe-plans';

function json(row: EquipmentProfile) {
  return { id: row.id, ...equipmentFromRow(row) };
}
export type EquipmentJson = ReturnType<typeof json>;

export async function listEquipment(breweryId: number): Promise<EquipmentJson[]> {
  const rows = await EquipmentProfile.findAll({ where: { breweryId }, order: [['batchVolumeL', 'ASC']] });
  return rows.map(json);
}

export async function createEquipment(breweryId: number, input: EquipmentInput): Promise<EquipmentJson> {
  validateEquipment(input);
  return json(await EquipmentProfile.create({ breweryId, ...input }));
}

export async function updateEquipment(breweryId: number, id: number, input: EquipmentInput): Promise<EquipmentJson> {
  validateEquipment(input);
  const row = await findEquipment(breweryId, id);
  await row.update(input);
  return json(row);
}

/** Removes a profile no recipe version was written for; one that was stays, as part of those versions' record (409). */
export async function deleteEquipment(breweryId: number, id: number, transaction?: Transaction): Promise<void> {
  const row = await findEquipment(breweryId, id, transaction);
  const versions = await RecipeVersion.count({ where: { equipmentProfileId: id }, transaction });
  if (versions > 0) {
    throw conflict(
      `${row.name} is what ${versions === 1 ? 'a recipe version was' : `${versions} recipe versions were`} written for, so it stays. Rename it if it is no longer in use.`,
    );
  }
  await row.destroy({ transaction });
}
