import { z } from 'zod';
import { idParam } from '../schemas/auth';
import {
  actionEntrySchema,
  carbonationQuerySchema,
  cellarPlanSchema,
  packagingEntrySchema,
  probeImportSchema,
  readingEntrySchema,
  vesselInputSchema,
  type ActionView,
  type AlertView,
  type BatchCellarView,
  type BoardVessel,
  type CellarPlanView,
  type PackagingSummaryView,
  type ProbeImportResult,
  type ReadingView,
  type VesselView,
} from '../schemas/cellar';
import type { CarbonationSetting } from '../brewing/carbonation';
import { route } from './route';

/** The head pressure for a carbonation target, in kPa and psi, beside the vessel's rating (kPa). */
export interface CarbonationAnswer extends CarbonationSetting {
  pressurePsi: number;
}

const vesselParams = z.strictObject({ vesselId: idParam });
const batchParams = z.strictObject({ batchId: idParam });
const alertParams = z.strictObject({ alertId: idParam });

export const vesselRoutes = {
  list: route<VesselView[]>()({ method: 'get', path: '/api/vessels' }),
  create: route<VesselView>()({ method: 'post', path: '/api/vessels', body: vesselInputSchema }),
  update: route<VesselView>()({
    method: 'put',
    path: '/api/vessels/:vesselId',
    params: vesselParams,
    body: vesselInputSchema,
  }),
  markClean: route<VesselView>()({ method: 'post', path: '/api/vessels/:vesselId/clean', params: vesselParams }),
  remove: route()({ method: 'delete', path: '/api/vessels/:vesselId', params: vesselParams }),
};

export const cellarRoutes = {
  board: route<BoardVessel[]>()({ method: 'get', path: '/api/cellar/board' }),
  carbonation: route<CarbonationAnswer>()({
    method: 'get',
    path: '/api/cellar/carbonation',
    query: carbonationQuerySchema,
  }),
  batch: route<BatchCellarView>()({ method: 'get', path: '/api/cellar/batches/:batchId', params: batchParams }),
  savePlan: route<CellarPlanView>()({
    method: 'put',
    path: '/api/cellar/batches/:batchId/plan',
    params: batchParams,
    body: cellarPlanSchema,
  }),
  recordReading: route<ReadingView>()({
    method: 'post',
    path: '/api/cellar/batches/:batchId/readings',
    params: batchParams,
    body: readingEntrySchema,
  }),
  previewImport: route<ProbeImportResult>()({
    method: 'post',
    path: '/api/cellar/batches/:batchId/readings/preview',
    params: batchParams,
    body: probeImportSchema,
  }),
  importReadings: route<ProbeImportResult>()({
    method: 'post',
    path: '/api/cellar/batches/:batchId/readings/import',
    params: batchParams,
    body: probeImportSchema,
  }),
  recordAction: route<ActionView>()({
    method: 'post',
    path: '/api/cellar/batches/:batchId/actions',
    params: batchParams,
    body: actionEntrySchema,
  }),
  recordPackaging: route<PackagingSummaryView>()({
    method: 'post',
    path: '/api/cellar/batches/:batchId/packaging',
    params: batchParams,
    body: packagingEntrySchema,
  }),
  alerts: route<AlertView[]>()({ method: 'get', path: '/api/cellar/alerts' }),
  markAlertRead: route()({ method: 'post', path: '/api/cellar/alerts/:alertId/read', params: alertParams }),
};
