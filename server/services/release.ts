/**
 * Release to the taproom: the head brewer writes the public sheet, confirms the measured numbers and releases;
 * the batch moves to released. ABV comes from the measured OG (brew-day log) and FG (latest gravity reading in force).
 * When the beer runs out the head brewer takes it off tap: the release stays, with its sheet and numbers.
 */
import type { UnitSystem } from '../../shared/quantities';
import { Op, type Transaction } from 'sequelize';
import { sequelize } from '../config/database';
import { Attachment, Batch, GravityReading, IN_FORCE, PackagingRun, Release, User } from '../models';
import { conflict, unprocessable } from '../errors';
import { changeBatchStatus, findBatch } from './batches';
import { batchActualsOf } from './batch-log';
import { abv, ABV_METHOD_SHOWN, type PackageLine } from '../../shared/brewing';
import { packageName } from '../../shared/schemas/cellar';
import {
  wasReleased,
  type FinalNumbers,
  type PackageSize,
  type PublishReleaseInput,
  type ReleaseDetail,
  type ReleaseSheet,
} from '../../shared/schemas/taproom';

/** Statuses a batch can be in while its release sheet is written: there is beer in the tank or in packages. */
const SHEET_STATUSES = ['fermenting', 'conditioning', 'packaged', 'released'];
/** Confirmed gravities must match the log to this much (a rounding of the third decimal). */
const GRAVITY_MATCH = 0.0005;

/** Measured OG and FG and what follows from them; IBU and SRM from the batch's frozen plan. */
export async function finalNumbers(batch: Batch, transaction?: Transaction): Promise<FinalNumbers> {
  const [actuals, lastReading] = await Promise.all([
    batchActualsOf(batch, transaction),
    GravityReading.findOne({
      where: { batchId: batch.id, [Op.and]: [IN_FORCE] },
      order: [
        ['takenAt', 'DESC'],
        ['id', 'DESC'],
      ],
      transaction,
    }),
  ]);
  const og = actuals.og.actual;
  const fg = lastReading?.sg ?? null;
  const computed = batch.plan.computed;
  return {
    og,
    fg,
    abvPct: og !== null && fg !== null && fg <= og ? abv(og, fg) : null,
    abvMethod: ABV_METHOD_SHOWN,
    plannedAbvPct: computed.abvPct,
    ibu: computed.ibu,
    srm: computed.srm,
  };
}

const lineLabel = (system: UnitSystem, line: PackageLine) =>
  packageName(system, line.kind, line.kind === 'keg' ? line.size : line.sizeMl);

/** What the batch was packaged into, by size in the brewery's units, summed over its packaging runs. */
export async function packageSizes(
  brewery: { id: number; unitSystem: UnitSystem },
  batchIds: number[],
): Promise<Map<number, PackageSize[]>> {
  const breweryId = brewery.id;
  const runs = batchIds.length
    ? await PackagingRun.findAll({
        where: { breweryId, batchId: { [Op.in]: batchIds } },
        order: [['packagedAt', 'ASC']],
      })
    : [];
  const out = new Map<number, PackageSize[]>(batchIds.map((id) => [id, []]));
  for (const run of runs) {
    const sizes = out.get(run.batchId)!;
    for (const line of run.lines) {
      const label = lineLabel(brewery.unitSystem, line);
      const existing = sizes.find((s) => s.label === label);
      if (existing) existing.count += line.count;
      else sizes.push({ label, count: line.count });
    }
  }
  return out;
}

/** The numbers confirmed at release, as they were then. */
function frozenNumbers(r: Release, batch: Batch): FinalNumbers {
  return {
    og: r.og,
    fg: r.fg,
    abvPct: r.abvPct,
    abvMethod: r.abvMethod ?? ABV_METHOD_SHOWN,
    plannedAbvPct: batch.plan.computed.abvPct,
    ibu: r.ibu ?? batch.plan.computed.ibu,
    srm: r.srm ?? batch.plan.computed.srm,
  };
}

function sheetOf(r: Release): ReleaseSheet {
  return {
    beerName: r.beerName,
    style: r.style,
    description: r.description,
    glass: r.glass,
    servingTempC: r.servingTempC,
    servingNotes: r.servingNotes,
    allergens: r.allergens,
    photoAttachmentId: r.photoAttachmentId,
    comingSoon: r.state !== 'draft',
  };
}

export async function releaseDetail(actor: Express.User, batchId: number): Promise<ReleaseDetail> {
  const batch = await findBatch(actor.breweryId, batchId);
  const release = await Release.findOne({ where: { batchId: batch.id, breweryId: actor.breweryId } });
  const peopleIds = [release?.releasedById, release?.offTapById].filter((id) => id != null);
  const people = peopleIds.length
    ? await User.findAll({ where: { id: { [Op.in]: peopleIds } }, attributes: ['id', 'displayName'] })
    : [];
  const nameOf = (id: number | null | undefined) => people.find((p) => p.id === id)?.displayName ?? null;
  return {
    batch: {
      id: batch.id,
      number: batch.number,
      beerName: batch.beerName,
      status: batch.status,
      style: batch.plan.style ?? '',
    },
    state: release?.state ?? null,
    sheet: release ? sheetOf(release) : null,
    numbers: release && wasReleased(release.state) ? frozenNumbers(release, batch) : await finalNumbers(batch),
    packageSizes: (await packageSizes(actor.brewery, [batch.id])).get(batch.id)!,
    releasedAt: release?.releasedAt?.toISOString() ?? null,
    releasedBy: nameOf(release?.releasedById),
    offTapAt: release?.offTapAt?.toISOString() ?? null,
    offTapBy: nameOf(release?.offTapById),
  };
}

/** Saves the release sheet. Before release, `comingSoon` shows the beer to the taproom as coming soon; after it, the state stays. */
export async function saveReleaseSheet(
  actor: Express.User,
  batchId: number,
  sheet: ReleaseSheet,
): Promise<ReleaseDetail> {
  await sequelize.transaction(async (transaction) => {
    const batch = await findBatch(actor.breweryId, batchId, transaction, true);
    if (!SHEET_STATUSES.includes(batch.status)) {
      throw conflict(`A ${batch.status} batch has no beer to release yet.`);
    }
    if (sheet.photoAttachmentId !== null) {
      const photo = await Attachment.findOne({
        where: { id: sheet.photoAttachmentId, batchId: batch.id, breweryId: actor.breweryId, kind: 'photo' },
        transaction,
      });
      if (!photo) throw unprocessable('Choose a photo attached to this batch.');
    }
    const { comingSoon, ...fields } = sheet;
    const existing = await Release.findOne({ where: { batchId: batch.id }, transaction });
    const state = existing && wasReleased(existing.state) ? existing.state : comingSoon ? 'coming_soon' : 'draft';
    if (existing) await existing.update({ ...fields, state }, { transaction });
    else
      await Release.create(
        {
          ...fields,
          state,
          breweryId: actor.breweryId,
          batchId: batch.id,
          og: null,
          fg: null,
          abvPct: null,
          abvMethod: null,
          ibu: null,
          srm: null,
          releasedAt: null,
          releasedById: null,
        },
        { transaction },
      );
  });
  return releaseDetail(actor, batchId);
}

const gravityText = (sg: number) => sg.toFixed(3);

/**
 * Releases the batch: the head brewer confirms the OG and FG they saw; if the log says otherwise now, 409.
 * ABV is computed here from the logged numbers, frozen on the release with IBU and SRM, and the batch moves to released.
 */
export async function publishRelease(
  actor: Express.User,
  batchId: number,
  input: PublishReleaseInput,
): Promise<ReleaseDetail> {
  await sequelize.transaction(async (transaction) => {
    const batch = await findBatch(actor.breweryId, batchId, transaction, true);
    const release = await Release.findOne({ where: { batchId: batch.id }, transaction });
    if (!release) throw conflict('Write the release sheet (description and serving notes) before releasing.');
    if (release.state === 'on_tap') throw conflict('This beer is already released.');
    if (release.state === 'off_tap')
      throw conflict('This beer was released and has been taken off tap: put it back on tap instead.');
    if (batch.status !== 'packaged') throw conflict('Only a packaged batch can be released: log its packaging first.');
    const numbers = await finalNumbers(batch, transaction);
    if (numbers.og === null)
      throw conflict('The measured OG is not in the brew-day log yet: log it at knockout before releasing.');
    if (numbers.fg === null)
      throw conflict('There is no gravity reading for this batch: log the final gravity before releasing.');
    if (numbers.abvPct === null)
      throw conflict(
        `The last reading (${gravityText(numbers.fg)}) is above the OG (${gravityText(numbers.og)}): check the log.`,
      );
    if (
      Math.abs(input.confirmedOg - numbers.og) > GRAVITY_MATCH ||
      Math.abs(input.confirmedFg - numbers.fg) > GRAVITY_MATCH
    ) {
      throw conflict(
        `The log now says OG ${gravityText(numbers.og)} and FG ${gravityText(numbers.fg)}, not what was confirmed. Review the numbers and release again.`,
      );
    }
    await release.update(
      {
        state: 'on_tap',
        og: numbers.og,
        fg: numbers.fg,
        abvPct: numbers.abvPct,
        abvMethod: numbers.abvMethod,
        ibu: numbers.ibu,
        srm: numbers.srm,
        releasedAt: new Date(),
        releasedById: actor.id,
      },
      { transaction },
    );
    await changeBatchStatus(actor, batch.id, { status: 'released' }, transaction);
  });
  return releaseDetail(actor, batchId);
}

/**
 * Takes a released beer off tap when it runs out: it leaves the taproom's tap list and the bar screen. The release
 * keeps its sheet and frozen numbers, and the batch stays released; the tasting notes are not touched.
 */
export async function takeOffTap(actor: Express.User, batchId: number): Promise<ReleaseDetail> {
  await sequelize.transaction(async (transaction) => {
    const release = await releaseToChange(actor, batchId, transaction);
    if (release.state === 'off_tap') throw conflict('This beer is already off tap.');
    if (release.state !== 'on_tap') throw conflict('Only a beer on tap can be taken off tap: release it first.');
    await release.update({ state: 'off_tap', offTapAt: new Date(), offTapById: actor.id }, { transaction });
  });
  return releaseDetail(actor, batchId);
}

/** Puts a beer taken off tap back on (taken off by mistake, or another keg turned up). */
export async function putBackOnTap(actor: Express.User, batchId: number): Promise<ReleaseDetail> {
  await sequelize.transaction(async (transaction) => {
    const release = await releaseToChange(actor, batchId, transaction);
    if (release.state !== 'off_tap') throw conflict('Only a beer taken off tap can be put back on.');
    await release.update({ state: 'on_tap', offTapAt: null, offTapById: null }, { transaction });
  });
  return releaseDetail(actor, batchId);
}

/** The batch's release, its batch row locked so two changes to it run one after the other. */
async function releaseToChange(actor: Express.User, batchId: number, transaction: Transaction): Promise<Release> {
  const batch = await findBatch(actor.breweryId, batchId, transaction, true);
  const release = await Release.findOne({ where: { batchId: batch.id }, transaction });
  if (!release) throw conflict('This batch has no release sheet yet.');
  return release;
}

export interface ReleaseCandidate {
  batchId: number;
  number: string;
  beerName: string;
  status: string;
  state: ReleaseDetail['state'];
}

/** Batches with beer to release, newest first, with where their release stands. */
export async function releaseCandidates(actor: Express.User): Promise<ReleaseCandidate[]> {
  const batches = await Batch.findAll({
    where: { breweryId: actor.breweryId, status: { [Op.in]: SHEET_STATUSES } },
    order: [
      ['brewDate', 'DESC'],
      ['id', 'DESC'],
    ],
    attributes: ['id', 'number', 'beerName', 'status'],
  });
  const releases = await Release.findAll({
    where: { breweryId: actor.breweryId, batchId: { [Op.in]: batches.map((b) => b.id) } },
  });
  const states = new Map(releases.map((r) => [r.batchId, r.state]));
  return batches.map((b) => ({
    batchId: b.id,
    number: b.number,
    beerName: b.beerName,
    status: b.status,
    state: states.get(b.id) ?? null,
  }));
}
