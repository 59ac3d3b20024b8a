/**
 * Packaging runs: each is a signed batch log entry with its `packaging_runs` row in the same
 * transaction. Volumes and losses come from shared/brewing against what went into the tank packaged from
 * (the bright tank's transfer volume, else knockout);
 * the final run empties the vessel and moves the batch to packaged.
 */
import type { Transaction } from 'sequelize';
import { Batch, BatchLogEntry, PackagingRun } from '../models';
import { wrongStage } from '../errors';
import { BATCH_STATUS_LABELS, type BatchStatus } from '../../shared/schemas/batches';
import { appendLogEntry, batchActualsOf, type LogActor } from './batch-log';
import { changeBatchStatus, findBatch, releaseVessel } from './batches';
import {
  lineVolumeL,
  packagingLoss,
  packagingTotals,
  type PackageLine,
  type PackagingSource,
} from '../../shared/brewing';
import type { WriteMeta } from '../../shared/schemas/batch-log';
import type { PackagingEntryInput, PackagingRunView, PackagingSummaryView } from '../../shared/schemas/cellar';

/** Batches that take cellar work (actions and packaging): fermenting or conditioning. */
export const CELLAR_WORK_STATUSES: readonly BatchStatus[] = ['fermenting', 'conditioning'];

/** Statuses after which no beer of the batch is left in a tank: what was not packaged is a loss. */
const PACKAGING_DONE = ['packaged', 'released', 'dumped'];

/** Litres into the fermenter at knockout: measured on the brew day, else planned. */
async function knockoutLitres(batch: Batch, transaction?: Transaction): Promise<number> {
  const actuals = await batchActualsOf(batch, transaction);
  return actuals.knockoutVolumeL.actual ?? actuals.knockoutVolumeL.planned;
}

function toRunView(run: PackagingRun, authorName: string): PackagingRunView {
  return {
    logEntryId: Number(run.logEntryId),
    packagedAt: new Date(run.packagedAt).toISOString(),
    lines: run.lines,
    packagedL: run.packagedL,
    authorName,
  };
}

export async function packagingSummary(batch: Batch, transaction?: Transaction): Promise<PackagingSummaryView> {
  const runs = await PackagingRun.findAll({
    where: { batchId: batch.id },
    order: [['packagedAt', 'ASC']],
    transaction,
  });
  const authors = await BatchLogEntry.findAll({
    where: { id: runs.map((r) => r.logEntryId) },
    attributes: ['id', 'authorName'],
    transaction,
  });
  const knockoutL = await knockoutLitres(batch, transaction);
  const { source, sourceL } = await packagedFrom(batch.id, knockoutL, transaction);
  const packagedL = runs.reduce((sum, r) => sum + r.packagedL, 0);
  // Before the last run the difference is beer still in the tank, not a loss.
  const complete = PACKAGING_DONE.includes(batch.status);
  const loss = packagingLoss(packagedL, sourceL, source);
  return {
    runs: runs.map((r) => toRunView(r, authors.find((a) => Number(a.id) === Number(r.logEntryId))?.authorName ?? '')),
    knockoutL,
    source,
    sourceL,
    packagedL,
    complete,
    notPackagedL: complete ? 0 : loss.lossL,
    lossL: complete ? loss.lossL : null,
    lossFraction: complete ? loss.lossFraction : null,
    lossImplausible: complete && loss.implausible,
  };
}

/**
 * The tank the beer is packaged from and what went into it: the volume of the last transfer into a bright
 * tank, or the knockout volume when it is packaged straight from the fermenter.
 */
async function packagedFrom(
  batchId: number,
  knockoutL: number,
  transaction?: Transaction,
): Promise<{ source: PackagingSource; sourceL: number }> {
  const transfer = await BatchLogEntry.findOne({
    where: { batchId, kind: 'action', stepKey: 'transfer' },
    order: [['sequence', 'DESC']],
    attributes: ['data'],
    transaction,
  });
  const volumeL = transfer?.data.volumeL;
  return typeof volumeL === 'number' && volumeL > 0
    ? { source: 'bright_tank', sourceL: volumeL }
    : { source: 'fermenter', sourceL: knockoutL };
}

/** Records a packaging run; refuses (422) more beer in packages than was knocked out. */
export async function recordPackaging(
  actor: LogActor,
  batchId: number,
  input: PackagingEntryInput,
  meta: WriteMeta,
): Promise<PackagingSummaryView> {
  const lines = input.lines as PackageLine[];
  await appendLogEntry(actor, batchId, { ...input }, meta, {
    onInsert: async (entry, t) => {
      const batch = await findBatch(actor.breweryId, batchId, t);
      if (!CELLAR_WORK_STATUSES.includes(batch.status)) {
        const status = BATCH_STATUS_LABELS[batch.status].toLowerCase();
        throw wrongStage(
          batch.status,
          CELLAR_WORK_STATUSES,
          `Batch ${batch.number} is ${status}: it cannot be packaged now.`,
        );
      }
      const earlier = await PackagingRun.findAll({ where: { batchId }, transaction: t });
      // Refuses more in packages, all runs together, than went into the fermenter.
      packagingTotals([...earlier.flatMap((r) => r.lines), ...lines], await knockoutLitres(batch, t));
      const packagedL = lines.reduce((sum, line, i) => sum + lineVolumeL(line, `lines.${i}`), 0);
      await PackagingRun.create(
        {
          breweryId: actor.breweryId,
          batchId,
          logEntryId: Number(entry.id),
          packagedAt: meta.capturedAt,
          lines,
          packagedL,
        },
        { transaction: t },
      );
      if (input.final) {
        await releaseVessel(actor.breweryId, batchId, t);
        if (batch.status === 'fermenting') await changeBatchStatus(actor, batchId, { status: 'conditioning' }, t);
        await changeBatchStatus(actor, batchId, { status: 'packaged' }, t);
      }
    },
  });
  return packagingSummary(await findBatch(actor.breweryId, batchId));
}
