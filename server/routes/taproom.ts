import { defineRouter } from './define';
import { releaseRoutes, taproomRoutes } from '../../shared/contract/taproom';
import * as taproom from '../services/taproom';
import * as release from '../services/release';
import { recordAudit } from '../services/audit';

/** What every role reads, the taproom manager included: announced and released beers only. */
export const taproomRouter = defineRouter('/api/taproom', taproomRoutes, {
  beers: {
    access: 'taproom.read',
    handler: async ({ user, query, res }) => {
      res.json(await taproom.listBeers(user, query));
    },
  },
  beer: {
    access: 'taproom.read',
    handler: async ({ user, params, res }) => {
      res.json(await taproom.beer(user, params.beerId));
    },
  },
  releases: {
    access: 'release.read',
    handler: async ({ user, res }) => {
      res.json(await release.releaseCandidates(user));
    },
  },
});

/** The head brewer's release of one batch, and taking it off tap when it runs out. */
export const releaseRouter = defineRouter('/api/batches', releaseRoutes, {
  get: {
    access: 'release.read',
    handler: async ({ user, params, res }) => {
      res.json(await release.releaseDetail(user, params.batchId));
    },
  },
  saveSheet: {
    access: 'release.manage',
    handler: async ({ user, params, body, res }) => {
      res.json(await release.saveReleaseSheet(user, params.batchId, body));
    },
  },
  publish: {
    access: 'release.manage',
    handler: async ({ user, params, body, req, res }) => {
      const detail = await release.publishRelease(user, params.batchId, body);
      await recordAudit(req, 'batch.release', { batchId: detail.batch.id, abvPct: detail.numbers.abvPct });
      res.json(detail);
    },
  },
  offTap: {
    access: 'release.manage',
    handler: async ({ user, params, req, res }) => {
      const detail = await release.takeOffTap(user, params.batchId);
      await recordAudit(req, 'batch.off_tap', { batchId: detail.batch.id });
      res.json(detail);
    },
  },
  backOnTap: {
    access: 'release.manage',
    handler: async ({ user, params, req, res }) => {
      const detail = await release.putBackOnTap(user, params.batchId);
      await recordAudit(req, 'batch.back_on_tap', { batchId: detail.batch.id });
      res.json(detail);
    },
  },
});
