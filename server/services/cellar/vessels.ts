/** The brewery's vessels: fermenters and bright tanks, their state and what they hold. */
import { Transaction, UniqueConstraintError } from 'sequelize';
import { Vessel } from '../../models';
import { conflict, notFound } from '../../errors';
import { psiToKpa, usBblToL } from '../../../shared/brewing';
import type { VesselInput, VesselView } from '../../../shared/schemas/cellar';

export function toVesselView(v: Vessel): VesselView {
  return {
    id: v.id,
    name: v.name,
    type: v.type,
    capacityL: v.capacityL,
    ratedPressureKpa: v.ratedPressureKpa,
    status: v.status,
    currentBatchId: v.currentBatchId,
  };
}

function vesselFields(input: VesselInput) {
  return {
    name: input.name,
    type: input.type,
    capacityL: input.capacityUnit === 'bbl' ? usBblToL(input.capacity) : input.capacity,
    ratedPressureKpa: input.pressureUnit === 'psi' ? psiToKpa(input.ratedPressure) : input.ratedPressure,
  };
}

export async function findVessel(breweryId: number, id: number, transaction?: Transaction): Promise<Vessel> {
  const vessel = await Vessel.findOne({ where: { id, breweryId }, transaction });
  if (!vessel) throw notFound('This vessel');
  return vessel;
}

async function uniqueName<T>(name: string, write: () => Promise<T>): Promise<T> {
  try {
    return await write();
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw conflict(`There is already a vessel called “${name}”.`);
    throw error;
  }
}

export async function listVessels(breweryId: number): Promise<VesselView[]> {
  const vessels = await Vessel.findAll({
    where: { breweryId },
    order: [
      ['type', 'ASC'],
      ['name', 'ASC'],
    ],
  });
  return vessels.map(toVesselView);
}

export async function createVessel(breweryId: number, input: VesselInput): Promise<VesselView> {
  const vessel = await uniqueName(input.name, () =>
    Vessel.create({ breweryId, ...vesselFields(input), status: 'clean', currentBatchId: null }),
  );
  return toVesselView(vessel);
}

export async function updateVessel(breweryId: number, id: number, input: VesselInput): Promise<VesselView> {
  const vessel = await findVessel(breweryId, id);
  if (vessel.currentBatchId !== null && input.type !== vessel.type)
    throw conflict(`${vessel.name} holds a batch: change its type once it is empty.`);
  await uniqueName(input.name, () => vessel.update(vesselFields(input)));
  return toVesselView(vessel);
}

/** Marks an empty vessel clean (after CIP) so it can be filled again. */
export async function markVesselClean(breweryId: number, id: number): Promise<VesselView> {
  const vessel = await findVessel(breweryId, id);
  if (vessel.currentBatchId !== null) throw conflict(`${vessel.name} holds a batch: it is cleaned once emptied.`);
  await vessel.update({ status: 'clean' });
  return toVesselView(vessel);
}

export async function deleteVessel(breweryId: number, id: number): Promise<void> {
  const vessel = await findVessel(breweryId, id);
  if (vessel.currentBatchId !== null) throw conflict(`${vessel.name} holds a batch: empty it before removing it.`);
  await vessel.destroy();
}

/** The vessel a batch sits in, if any. */
export async function vesselOf(breweryId: number, batchId: number, transaction?: Transaction): Promise<Vessel | null> {
  return Vessel.findOne({ where: { breweryId, currentBatchId: batchId }, transaction });
}
