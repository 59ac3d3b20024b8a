import { z } from 'zod';
import { idParam } from '../../shared/schemas/auth';
import {
  actionEntrySchema,
  carbonationQuerySchema,
  cellarPlanSchema,
  packagingEntrySchema,
  probeImportSchema,
  readingEntrySchema,
  vesselInputSchema,
} from '../../shared/schemas/cellar';
import { defineRouter, actor } from './define';
import * as cellar from '../services/cellar';
import { importProbeCsv, recordReading } from '../services/readings';
import { recordPackaging } from '../services/packaging';
import { listAlerts, markAlertRead } from '../services/alerts';
import { writeMetaFromHeaders } from '../services/batch-log';

const vesselParams = z.strictObject({ vesselId: idParam });
const batchParams = z.strictObject({ batchId: idParam });
const alertParams = z.strictObject({ alertId: idParam });
const vesselId = (req: { params: Record<string, unknown> }) => Number(req.params.vesselId);
const batchId = (req: { params: Record<string, unknown> }) => Number(req.params.batchId);
const meta = (req: { get: (name: string) => string | undefined }) => writeMetaFromHeaders((name) => req.get(name));

export const vesselsRouter = defineRouter('/api/vessels', [
  {
    method: 'get',
    path: '/',
    access: 'vessel.read',
    handler: async (req, res) => {
      res.json(await cellar.listVessels(actor(req).breweryId));
    },
  },
  {
    method: 'post',
    path: '/',
    access: 'vessel.edit',
    body: vesselInputSchema,
    handler: async (req, res) => {
      res.status(201).json(await cellar.createVessel(actor(req).breweryId, req.body));
    },
  },
  {
    method: 'put',
    path: '/:vesselId',
    access: 'vessel.edit',
    params: vesselParams,
    body: vesselInputSchema,
    handler: async (req, res) => {
      res.json(await cellar.updateVessel(actor(req).breweryId, vesselId(req), req.body));
    },
  },
  {
    method: 'post',
    path: '/:vesselId/clean',
    access: 'vessel.clean',
    params: vesselParams,
    handler: async (req, res) => {
      res.json(await cellar.markVesselClean(actor(req).breweryId, vesselId(req)));
    },
  },
  {
    method: 'delete',
    path: '/:vesselId',
    access: 'vessel.edit',
    params: vesselParams,
    handler: async (req, res) => {
      await cellar.deleteVessel(actor(req).breweryId, vesselId(req));
      res.status(204).end();
    },
  },
]);

export const cellarRouter = defineRouter('/api/cellar', [
  {
    method: 'get',
    path: '/board',
    access: 'cellar.read',
    handler: async (req, res) => {
      res.json(await cellar.vesselBoard(actor(req).breweryId));
    },
  },
  {
    method: 'get',
    path: '/carbonation',
    access: 'cellar.read',
    query: carbonationQuerySchema,
    handler: async (req, res) => {
      res.json(
        await cellar.carbonationFor(
          actor(req).breweryId,
          req.query as unknown as z.infer<typeof carbonationQuerySchema>,
        ),
      );
    },
  },
  {
    method: 'get',
    path: '/batches/:batchId',
    access: 'cellar.read',
    params: batchParams,
    handler: async (req, res) => {
      res.json(await cellar.batchCellar(actor(req).breweryId, batchId(req)));
    },
  },
  {
    method: 'put',
    path: '/batches/:batchId/plan',
    access: 'cellar.plan',
    params: batchParams,
    body: cellarPlanSchema,
    handler: async (req, res) => {
      res.json(await cellar.saveCellarPlan(actor(req).breweryId, batchId(req), req.body));
    },
  },
  {
    method: 'post',
    path: '/batches/:batchId/readings',
    access: 'cellar.logReading',
    params: batchParams,
    body: readingEntrySchema,
    handler: async (req, res) => {
      res.status(201).json(await recordReading(actor(req), batchId(req), req.body, meta(req)));
    },
  },
  {
    method: 'post',
    path: '/batches/:batchId/readings/preview',
    access: 'cellar.logReading',
    params: batchParams,
    body: probeImportSchema,
    handler: async (req, res) => {
      res.json(await importProbeCsv(actor(req), batchId(req), req.body, null));
    },
  },
  {
    method: 'post',
    path: '/batches/:batchId/readings/import',
    access: 'cellar.logReading',
    params: batchParams,
    body: probeImportSchema,
    handler: async (req, res) => {
      res.status(201).json(await importProbeCsv(actor(req), batchId(req), req.body, meta(req)));
    },
  },
  {
    method: 'post',
    path: '/batches/:batchId/actions',
    access: 'cellar.logAction',
    params: batchParams,
    body: actionEntrySchema,
    handler: async (req, res) => {
      res.status(201).json(await cellar.recordAction(actor(req), batchId(req), req.body, meta(req)));
    },
  },
  {
    method: 'post',
    path: '/batches/:batchId/packaging',
    access: 'cellar.logPackaging',
    params: batchParams,
    body: packagingEntrySchema,
    handler: async (req, res) => {
      res.status(201).json(await recordPackaging(actor(req), batchId(req), req.body, meta(req)));
    },
  },
  {
    method: 'get',
    path: '/alerts',
    access: 'cellar.alerts',
    handler: async (req, res) => {
      res.json(await listAlerts(actor(req).breweryId));
    },
  },
  {
    method: 'post',
    path: '/alerts/:alertId/read',
    access: 'cellar.alerts',
    params: alertParams,
    handler: async (req, res) => {
      await markAlertRead(actor(req).breweryId, Number(req.params.alertId));
      res.status(204).end();
    },
  },
]);
