import { z } from 'zod';
import { defineRouter, actor } from './define';
import {
  batchIdParams,
  batchListQuery,
  changeStatusSchema,
  createBatchSchema,
  planPreviewQuery,
  type PlanPreviewQuery,
} from '../../shared/schemas/batches';
import { logEntryInputSchema, signOffSchema } from '../../shared/schemas/batch-log';
import * as batches from '../services/batches';
import { batchLogJson, toLogEntry, verifyChain, writeMetaFromHeaders } from '../services/batch-log';
import { appendBatchLogEntry } from '../services/readings';
import { signOffBrewDay } from '../services/signatures';
import type { Request } from 'express';
import { BatchLogEntry } from '../models';
import { methodNotAllowed, notFound } from '../errors';
import { signInLimiter } from '../middlewares/rate-limit';

const id = batchIdParams.shape.id;
const entryParams = z.strictObject({ id, entryId: id });
/** Entries are append-only: a change or delete answers 405 (after the usual 404 for another brewery's batch). */
const refuseChange = async (req: Request) => {
  const entry = await BatchLogEntry.findOne({
    where: { id: Number(req.params.entryId), batchId: Number(req.params.id), breweryId: actor(req).breweryId },
  });
  if (!entry) throw notFound('This log entry');
  throw methodNotAllowed(
    'Log entries are never changed or deleted. Add a correction that points at the entry instead.',
  );
};

/** Batches and their logs: the brewing side only (the taproom manager reads released beers elsewhere). */
export const batchesRouter = defineRouter('/api/batches', [
  {
    method: 'get',
    path: '/',
    access: 'batch.read',
    query: batchListQuery,
    handler: async (req, res) => {
      res.json(await batches.listBatches(actor(req).breweryId, req.query as unknown as z.infer<typeof batchListQuery>));
    },
  },
  {
    method: 'post',
    path: '/',
    access: 'batch.plan',
    body: createBatchSchema,
    handler: async (req, res) => {
      const batch = await batches.planBatch(actor(req), req.body);
      res.status(201).json(await batches.batchDetail(batch.breweryId, batch.id));
    },
  },
  {
    method: 'get',
    path: '/plan-preview',
    access: 'batch.plan',
    query: planPreviewQuery,
    handler: async (req, res) => {
      res.json(await batches.previewPlan(actor(req).breweryId, req.query as unknown as PlanPreviewQuery));
    },
  },
  {
    method: 'get',
    path: '/:id',
    access: 'batch.read',
    params: batchIdParams,
    handler: async (req, res) => {
      res.json(await batches.batchDetail(actor(req).breweryId, Number(req.params.id)));
    },
  },
  {
    method: 'post',
    path: '/:id/status',
    access: 'batch.changeStatus',
    params: batchIdParams,
    body: changeStatusSchema,
    handler: async (req, res) => {
      await batches.requestStatusChange(actor(req), Number(req.params.id), req.body);
      res.json(await batches.batchDetail(actor(req).breweryId, Number(req.params.id)));
    },
  },
  {
    method: 'put',
    path: '/:id/vessel',
    access: 'batch.moveToVessel',
    params: batchIdParams,
    body: z.strictObject({ vesselId: id }),
    handler: async (req, res) => {
      const vessel = await batches.moveToVessel(actor(req), Number(req.params.id), req.body.vesselId);
      res.json({ id: vessel.id, name: vessel.name, currentBatchId: vessel.currentBatchId });
    },
  },
  {
    method: 'get',
    path: '/:id/log',
    access: 'batch.read',
    params: batchIdParams,
    handler: async (req, res) => {
      const { body, head } = await batchLogJson(actor(req).breweryId, Number(req.params.id));
      // The head names the whole log (entries are append-only), so it tags the answer without hashing 60 KB of JSON.
      if (head) res.set('ETag', `W/"${req.params.id}-${head.sequence}-${head.hash.slice(0, 16)}"`);
      res.type('json').send(body);
    },
  },
  {
    method: 'post',
    path: '/:id/log',
    access: 'batch.logEntry',
    params: batchIdParams,
    body: logEntryInputSchema,
    handler: async (req, res) => {
      const meta = writeMetaFromHeaders((name) => req.get(name));
      const entry = await appendBatchLogEntry(actor(req), Number(req.params.id), req.body, meta);
      res.status(201).json(toLogEntry(entry));
    },
  },
  { method: 'patch', path: '/:id/log/:entryId', access: 'batch.logEntry', params: entryParams, handler: refuseChange },
  { method: 'put', path: '/:id/log/:entryId', access: 'batch.logEntry', params: entryParams, handler: refuseChange },
  { method: 'delete', path: '/:id/log/:entryId', access: 'batch.logEntry', params: entryParams, handler: refuseChange },
  {
    method: 'get',
    path: '/:id/log/verify',
    access: 'batch.read',
    params: batchIdParams,
    handler: async (req, res) => {
      await batches.findBatch(actor(req).breweryId, Number(req.params.id));
      res.json(await verifyChain(Number(req.params.id)));
    },
  },
  {
    method: 'post',
    path: '/:id/sign-off',
    access: 'batch.signOff',
    before: [signInLimiter],
    params: batchIdParams,
    body: signOffSchema,
    handler: async (req, res) => {
      const meta = writeMetaFromHeaders((name) => req.get(name));
      res.status(201).json(await signOffBrewDay(actor(req), Number(req.params.id), req.body.password, meta));
    },
  },
]);
