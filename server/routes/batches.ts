import type { Response } from 'express';
import { defineRouter, type HandlerContext } from './define';
import { batchRoutes } from '../../shared/contract/batches';
import * as batches from '../services/batches';
import { batchLogJson, refuseEntryChange, toLogEntry, verifyChain, writeMetaFromHeaders } from '../services/batch-log';
import { appendBatchLogEntry } from '../services/readings';
import { signOffBrewDay } from '../services/signatures';
import { signInLimiter } from '../middlewares/rate-limit';

type EntryChange = HandlerContext<typeof batchRoutes.patchEntry>;
/** Entries are append-only: a change or delete answers 405 (after the usual 404 for another brewery's batch). */
const refuseChange = ({ user, params }: Pick<EntryChange, 'user' | 'params'>) =>
  refuseEntryChange(user.breweryId, params.id, params.entryId);

/** Batches and their logs: the brewing side only (the taproom manager reads released beers elsewhere). */
export const batchesRouter = defineRouter('/api/batches', batchRoutes, {
  list: {
    access: 'batch.read',
    handler: async ({ user, query, res }) => {
      res.json(await batches.listBatches(user.breweryId, query));
    },
  },
  plan: {
    access: 'batch.plan',
    handler: async ({ user, body, res }) => {
      const batch = await batches.planBatch(user, body);
      res.status(201).json(await batches.batchDetail(batch.breweryId, batch.id));
    },
  },
  planPreview: {
    access: 'batch.plan',
    handler: async ({ user, query, res }) => {
      res.json(await batches.previewPlan(user.breweryId, query));
    },
  },
  get: {
    access: 'batch.read',
    handler: async ({ user, params, res }) => {
      res.json(await batches.batchDetail(user.breweryId, params.id));
    },
  },
  changeStatus: {
    access: 'batch.changeStatus',
    handler: async ({ user, params, body, res }) => {
      await batches.requestStatusChange(user, params.id, body);
      res.json(await batches.batchDetail(user.breweryId, params.id));
    },
  },
  moveToVessel: {
    access: 'batch.moveToVessel',
    handler: async ({ user, params, body, res }) => {
      const vessel = await batches.moveToVessel(user, params.id, body.vesselId);
      res.json({ id: vessel.id, name: vessel.name, currentBatchId: vessel.currentBatchId });
    },
  },
  log: {
    access: 'batch.read',
    handler: async ({ user, params, res }) => {
      const { body, head } = await batchLogJson(user.breweryId, params.id);
      // The head names the whole log (entries are append-only), so it tags the answer without hashing 60 KB of JSON.
      if (head) res.set('ETag', `W/"${params.id}-${head.sequence}-${head.hash.slice(0, 16)}"`);
      // The body is the LogEntry[] already serialised (and cached as bytes).
      const raw: Response = res;
      raw.type('json').send(body);
    },
  },
  appendLog: {
    access: 'batch.logEntry',
    handler: async ({ user, params, body, req, res }) => {
      const meta = writeMetaFromHeaders((name) => req.get(name));
      const entry = await appendBatchLogEntry(user, params.id, body, meta);
      res.status(201).json(toLogEntry(entry));
    },
  },
  patchEntry: { access: 'batch.logEntry', handler: refuseChange },
  putEntry: { access: 'batch.logEntry', handler: refuseChange },
  deleteEntry: { access: 'batch.logEntry', handler: refuseChange },
  verifyLog: {
    access: 'batch.read',
    handler: async ({ user, params, res }) => {
      await batches.findBatch(user.breweryId, params.id);
      res.json(await verifyChain(params.id));
    },
  },
  signOff: {
    access: 'batch.signOff',
    before: [signInLimiter],
    handler: async ({ user, params, body, req, res }) => {
      const meta = writeMetaFromHeaders((name) => req.get(name));
      res.status(201).json(await signOffBrewDay(user, params.id, body.password, meta));
    },
  },
});
