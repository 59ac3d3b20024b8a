import type { Request } from 'express';
import { cellarRoutes, vesselRoutes } from '../../shared/contract/cellar';
import { defineRouter } from './define';
import * as cellar from '../services/cellar';
import { importProbeCsv, recordReading } from '../services/readings';
import { recordPackaging } from '../services/packaging';
import { listAlerts, markAlertRead } from '../services/alerts';
import { writeMetaFromHeaders } from '../services/batch-log';

const meta = (req: Request) => writeMetaFromHeaders((name) => req.get(name));

export const vesselsRouter = defineRouter('/api/vessels', vesselRoutes, {
  list: {
    access: 'vessel.read',
    handler: async ({ user, res }) => {
      res.json(await cellar.listVessels(user.breweryId));
    },
  },
  create: {
    access: 'vessel.edit',
    handler: async ({ user, body, res }) => {
      res.status(201).json(await cellar.createVessel(user.breweryId, body));
    },
  },
  update: {
    access: 'vessel.edit',
    handler: async ({ user, params, body, res }) => {
      res.json(await cellar.updateVessel(user.breweryId, params.vesselId, body));
    },
  },
  markClean: {
    access: 'vessel.clean',
    handler: async ({ user, params, res }) => {
      res.json(await cellar.markVesselClean(user.breweryId, params.vesselId));
    },
  },
  remove: {
    access: 'vessel.edit',
    handler: async ({ user, params, res }) => {
      await cellar.deleteVessel(user.breweryId, params.vesselId);
      res.status(204).end();
    },
  },
});

export const cellarRouter = defineRouter('/api/cellar', cellarRoutes, {
  board: {
    access: 'cellar.read',
    handler: async ({ user, res }) => {
      res.json(await cellar.vesselBoard(user.breweryId));
    },
  },
  carbonation: {
    access: 'cellar.read',
    handler: async ({ user, query, res }) => {
      res.json(await cellar.carbonationFor(user.breweryId, query));
    },
  },
  batch: {
    access: 'cellar.read',
    handler: async ({ user, params, res }) => {
      res.json(await cellar.batchCellar(user.breweryId, params.batchId));
    },
  },
  savePlan: {
    access: 'cellar.plan',
    handler: async ({ user, params, body, res }) => {
      res.json(await cellar.saveCellarPlan(user.breweryId, params.batchId, body));
    },
  },
  recordReading: {
    access: 'cellar.logReading',
    handler: async ({ user, params, body, req, res }) => {
      res.status(201).json(await recordReading(user, params.batchId, body, meta(req)));
    },
  },
  previewImport: {
    access: 'cellar.logReading',
    handler: async ({ user, params, body, res }) => {
      res.json(await importProbeCsv(user, params.batchId, body, null));
    },
  },
  importReadings: {
    access: 'cellar.logReading',
    handler: async ({ user, params, body, req, res }) => {
      res.status(201).json(await importProbeCsv(user, params.batchId, body, meta(req)));
    },
  },
  recordAction: {
    access: 'cellar.logAction',
    handler: async ({ user, params, body, req, res }) => {
      res.status(201).json(await cellar.recordAction(user, params.batchId, body, meta(req)));
    },
  },
  recordPackaging: {
    access: 'cellar.logPackaging',
    handler: async ({ user, params, body, req, res }) => {
      res.status(201).json(await recordPackaging(user, params.batchId, body, meta(req)));
    },
  },
  alerts: {
    access: 'cellar.alerts',
    handler: async ({ user, res }) => {
      res.json(await listAlerts(user.breweryId));
    },
  },
  markAlertRead: {
    access: 'cellar.alerts',
    handler: async ({ user, params, res }) => {
      await markAlertRead(user.breweryId, params.alertId);
      res.status(204).end();
    },
  },
});
