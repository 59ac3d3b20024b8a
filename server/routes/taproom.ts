import { z } from 'zod';
import { defineRouter, actor } from './define';
import { idParam, publishReleaseSchema, releaseSheetSchema, taproomListQuery } from '../../shared/schemas/taproom';
import * as taproom from '../services/taproom';
import * as release from '../services/release';
import { recordAudit } from '../services/audit';

const batchParams = z.strictObject({ batchId: idParam });
const beerParams = z.strictObject({ beerId: idParam });

/** What every role reads, the taproom manager included: announced and released beers only. */
export const taproomRouter = defineRouter('/api/taproom', [
  {
    method: 'get',
    path: '/beers',
    access: 'taproom.read',
    query: taproomListQuery,
    handler: async (req, res) => {
      res.json(await taproom.listBeers(actor(req), req.query as z.infer<typeof taproomListQuery>));
    },
  },
  {
    method: 'get',
    path: '/beers/:beerId',
    access: 'taproom.read',
    params: beerParams,
    handler: async (req, res) => {
      res.json(await taproom.beer(actor(req), Number(req.params.beerId)));
    },
  },
  {
    method: 'get',
    path: '/releases',
    access: 'release.read',
    handler: async (req, res) => {
      res.json(await release.releaseCandidates(actor(req)));
    },
  },
]);

/** The head brewer's release of one batch, and taking it off tap when it runs out. */
export const releaseRouter = defineRouter('/api/batches', [
  {
    method: 'get',
    path: '/:batchId/release',
    access: 'release.read',
    params: batchParams,
    handler: async (req, res) => {
      res.json(await release.releaseDetail(actor(req), Number(req.params.batchId)));
    },
  },
  {
    method: 'put',
    path: '/:batchId/release',
    access: 'release.manage',
    params: batchParams,
    body: releaseSheetSchema,
    handler: async (req, res) => {
      res.json(await release.saveReleaseSheet(actor(req), Number(req.params.batchId), req.body));
    },
  },
  {
    method: 'post',
    path: '/:batchId/release/publish',
    access: 'release.manage',
    params: batchParams,
    body: publishReleaseSchema,
    handler: async (req, res) => {
      const detail = await release.publishRelease(actor(req), Number(req.params.batchId), req.body);
      await recordAudit(req, 'batch.release', { batchId: detail.batch.id, abvPct: detail.numbers.abvPct });
      res.json(detail);
    },
  },
  {
    method: 'post',
    path: '/:batchId/release/off-tap',
    access: 'release.manage',
    params: batchParams,
    handler: async (req, res) => {
      const detail = await release.takeOffTap(actor(req), Number(req.params.batchId));
      await recordAudit(req, 'batch.off_tap', { batchId: detail.batch.id });
      res.json(detail);
    },
  },
  {
    method: 'post',
    path: '/:batchId/release/back-on-tap',
    access: 'release.manage',
    params: batchParams,
    handler: async (req, res) => {
      const detail = await release.putBackOnTap(actor(req), Number(req.params.batchId));
      await recordAudit(req, 'batch.back_on_tap', { batchId: detail.batch.id });
      res.json(detail);
    },
  },
]);
