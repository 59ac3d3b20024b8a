/**
 * Logged cellar actions (signed batch log entries) and the carbonation setting capped by the vessel's rating.
 */
import { BatchLogEntry } from '../../models';
import { conflict, unprocessable, wrongStage } from '../../errors';
import { appendLogEntry, type LogActor } from '../batch-log';
import { assignVessel, changeBatchStatus, findBatch } from '../batches';
import { CELLAR_WORK_STATUSES } from '../packaging';
import { BATCH_STATUS_LABELS } from '../../../shared/schemas/batches';
import { findVessel, vesselOf } from './vessels';
import { screenUnits, toC } from './units';
import { carbonationSetting, formatGaugePressure, kpaToPsi, usBblToL } from '../../../shared/brewing';
import type { WriteMeta } from '../../../shared/schemas/batch-log';
import type { ActionEntryInput, ActionView, CarbonationQuery, CellarAction } from '../../../shared/schemas/cellar';
import type { CarbonationAnswer } from '../../../shared/contract/cellar';

export function toActionView(e: BatchLogEntry): ActionView {
  const d = e.data;
  const n = (key: string) => (typeof d[key] === 'number' ? d[key] : null);
  const s = (key: string) => (typeof d[key] === 'string' ? d[key] : null);
  return {
    logEntryId: Number(e.id),
    action: d.action as CellarAction,
    at: new Date(e.capturedAt).toISOString(),
    tempC: n('tempC'),
    volumeL: n('volumeL'),
    detail: s('detail'),
    co2Volumes: n('co2Volumes'),
    pressureKpa: n('pressureKpa'),
    toVesselId: n('toVesselId'),
    note: s('note'),
    authorName: e.authorName,
  };
}

/** The head pressure for a target on a vessel; refused (422) above the vessel's rated working pressure. */
export async function carbonationFor(breweryId: number, query: CarbonationQuery): Promise<CarbonationAnswer> {
  const vessel = await findVessel(breweryId, query.vesselId);
  const setting = carbonationSetting(
    toC(query.temp, query.tempUnit),
    query.co2Volumes,
    vessel.ratedPressureKpa,
    screenUnits(query.tempUnit),
  );
  return { ...setting, pressurePsi: kpaToPsi(setting.pressureKpa) };
}

/**
 * Logs a cellar action as a signed entry. A transfer puts the batch into the bright tank (409 if it
 * holds another batch) and starts conditioning; a carbonation stores the head pressure, refused above
 * the vessel's rating — all in the entry's transaction.
 */
export async function recordAction(
  actor: LogActor,
  batchId: number,
  input: ActionEntryInput,
  meta: WriteMeta,
): Promise<ActionView> {
  const tempC = 'temp' in input ? toC(input.temp, input.tempUnit) : undefined;
  const volumeL =
    input.action !== 'transfer' ? undefined : input.volumeUnit === 'bbl' ? usBblToL(input.volume) : input.volume;
  let pressureKpa: number | undefined;
  if (input.action === 'carbonation') {
    const vessel = await vesselOf(actor.breweryId, batchId);
    if (!vessel) throw conflict('This batch is in no vessel: a head pressure is set on the vessel that holds it.');
    const units = screenUnits(input.tempUnit);
    const setting = carbonationSetting(tempC!, input.co2Volumes, vessel.ratedPressureKpa, units);
    if (input.pressureKpa !== undefined && input.pressureKpa > vessel.ratedPressureKpa) {
      throw unprocessable(
        `${formatGaugePressure(input.pressureKpa, units)} is above ${vessel.name}'s rated working pressure of ${formatGaugePressure(vessel.ratedPressureKpa, units)}.`,
      );
    }
    pressureKpa = input.pressureKpa ?? setting.pressureKpa;
  }
  const entry = await appendLogEntry(
    actor,
    batchId,
    { ...input, stepKey: input.action, tempC, volumeL, pressureKpa },
    meta,
    {
      onInsert: async (_e, t) => {
        const batch = await findBatch(actor.breweryId, batchId, t);
        if (!CELLAR_WORK_STATUSES.includes(batch.status)) {
          throw wrongStage(
            batch.status,
            CELLAR_WORK_STATUSES,
            `Batch ${batch.number} is ${BATCH_STATUS_LABELS[batch.status].toLowerCase()}: cellar work is logged while it ferments or conditions.`,
          );
        }
        if (input.action === 'transfer') {
          const tank = await findVessel(actor.breweryId, input.toVesselId, t);
          if (tank.type !== 'bright_tank')
            throw unprocessable(`${tank.name} is a fermenter: transfer into a bright tank.`);
          if (tank.currentBatchId === null && tank.status !== 'clean')
            throw conflict(`${tank.name} needs cleaning before it is filled.`);
          if (volumeL! > tank.capacityL)
            throw unprocessable(`${tank.name} holds ${tank.capacityL.toFixed(0)} L, less than the volume moved.`);
          await assignVessel(actor.breweryId, batchId, tank.id, t);
          if (batch.status === 'fermenting') await changeBatchStatus(actor, batchId, { status: 'conditioning' }, t);
        }
      },
    },
  );
  return toActionView(entry);
}
