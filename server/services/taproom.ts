/**
 * The taproom's view: announced and released beers only, public-facing facts only. Nothing here reads
 * recipes, batch logs or unannounced batches; the taproom manager's routes call only this.
 */
import { Op, type WhereOptions } from 'sequelize';
import { Batch, Release } from '../models';
import { notFound } from '../errors';
import { packageSizes } from './release';
import { tastingSummaries } from './tasting';
import { strengthOf, type TaproomBeer, type TaproomListQuery } from '../../shared/schemas/taproom';

/** On the tap list: announced or pouring. */
const SHOWN = { [Op.in]: ['coming_soon', 'on_tap'] };
/** A briefing sheet still opens once the beer is off tap, as a record of what was poured. */
const READABLE = { [Op.in]: ['coming_soon', 'on_tap', 'off_tap'] };

async function toBeers(brewery: Express.User['brewery'], releases: Release[]): Promise<TaproomBeer[]> {
  const breweryId = brewery.id;
  const batchIds = releases.map((r) => r.batchId);
  const [batches, summaries, sizes] = await Promise.all([
    Batch.findAll({ where: { breweryId, id: { [Op.in]: batchIds } }, attributes: ['id', 'number', 'plan'] }),
    tastingSummaries(breweryId, batchIds),
    packageSizes(brewery, batchIds),
  ]);
  const byId = new Map(batches.map((b) => [b.id, b]));
  return releases.map((r) => {
    const batch = byId.get(r.batchId)!;
    const planned = batch.plan.computed;
    const state = r.state === 'draft' ? 'coming_soon' : r.state;
    const released = state !== 'coming_soon' && r.abvPct !== null;
    return {
      id: r.id,
      state,
      batchNumber: batch.number,
      beerName: r.beerName,
      style: r.style,
      description: r.description,
      abvPct: released ? r.abvPct! : planned.abvPct,
      abvIsPlanned: !released,
      ibu: r.ibu ?? planned.ibu,
      srm: r.srm ?? planned.srm,
      glass: r.glass,
      servingTempC: r.servingTempC,
      servingNotes: r.servingNotes,
      allergens: r.allergens,
      packageSizes: sizes.get(r.batchId) ?? [],
      tasting: summaries.get(r.batchId)!,
      photo: r.photoAttachmentId
        ? {
            id: r.photoAttachmentId,
            url: `/api/attachments/${r.photoAttachmentId}/file`,
            thumbnailUrl: `/api/attachments/${r.photoAttachmentId}/thumbnail`,
          }
        : null,
      releasedAt: r.releasedAt?.toISOString() ?? null,
      offTapAt: r.offTapAt?.toISOString() ?? null,
    };
  });
}

/** Beers on tap (newest release first), then coming soon; filtered by words, style and strength. */
export async function listBeers(
  actor: Express.User,
  query: TaproomListQuery,
): Promise<{ beers: TaproomBeer[]; styles: string[] }> {
  const base = { breweryId: actor.breweryId, state: SHOWN };
  const shownStyles = await Release.findAll({ where: base, attributes: ['style'], group: ['style'] });
  const words = query.q ? `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%` : null;
  const where: WhereOptions<Release> = {
    ...base,
    ...(query.style ? { style: query.style } : {}),
    ...(words
      ? {
          [Op.or]: [
            { beerName: { [Op.like]: words } },
            { style: { [Op.like]: words } },
            { description: { [Op.like]: words } },
          ],
        }
      : {}),
  };
  const matching = await Release.findAll({
    where,
    order: [
      ['state', 'DESC'],
      ['releasedAt', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  const beers = await toBeers(actor.brewery, matching);
  return {
    beers: query.strength ? beers.filter((b) => strengthOf(b.abvPct) === query.strength) : beers,
    styles: shownStyles.map((r) => r.style).sort((a, b) => a.localeCompare(b)),
  };
}

/** One announced or released beer, on tap or off tap since; a draft or another brewery's answers 404. */
export async function beer(actor: Express.User, releaseId: number): Promise<TaproomBeer> {
  const release = await Release.findOne({ where: { id: releaseId, breweryId: actor.breweryId, state: READABLE } });
  if (!release) throw notFound('This beer');
  return (await toBeers(actor.brewery, [release]))[0]!;
}
