/** Equipment profiles: a brewery's brewhouses, as shared/brewing sees them. */
import { validateEquipment } from '../../shared/brewing';
import type { EquipmentInput } from '../../shared/schemas/recipes';
import { EquipmentProfile } from '../models';
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
