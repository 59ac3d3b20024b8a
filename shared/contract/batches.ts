import { z } from 'zod';
import {
  batchIdParams,
  batchListQuery,
  changeStatusSchema,
  createBatchSchema,
  planPreviewQuery,
  type BatchDetail,
  type BatchList,
  type PlanPreview,
} from '../schemas/batches';
import {
  logEntryInputSchema,
  signOffSchema,
  type ChainCheck,
  type LogEntry,
  type Signature,
} from '../schemas/batch-log';
import { route } from './route';

const id = batchIdParams.shape.id;
const entryParams = z.strictObject({ id, entryId: id });

/** The fermenter a batch moved into. */
export interface MovedTo {
  id: number;
  name: string;
  currentBatchId: number | null;
}

export const batchRoutes = {
  list: route<BatchList>()({ method: 'get', path: '/api/batches', query: batchListQuery }),
  plan: route<BatchDetail>()({ method: 'post', path: '/api/batches', body: createBatchSchema }),
  planPreview: route<PlanPreview>()({ method: 'get', path: '/api/batches/plan-preview', query: planPreviewQuery }),
  get: route<BatchDetail>()({ method: 'get', path: '/api/batches/:id', params: batchIdParams }),
  changeStatus: route<BatchDetail>()({
    method: 'post',
    path: '/api/batches/:id/status',
    params: batchIdParams,
    body: changeStatusSchema,
  }),
  moveToVessel: route<MovedTo>()({
    method: 'put',
    path: '/api/batches/:id/vessel',
    params: batchIdParams,
    body: z.strictObject({ vesselId: id }),
  }),
  log: route<LogEntry[]>()({ method: 'get', path: '/api/batches/:id/log', params: batchIdParams }),
  appendLog: route<LogEntry>()({
    method: 'post',
    path: '/api/batches/:id/log',
    params: batchIdParams,
    body: logEntryInputSchema,
  }),
  // Entries are append-only: these three always refuse (405), after the usual 404 for another brewery's batch.
  patchEntry: route<never>()({ method: 'patch', path: '/api/batches/:id/log/:entryId', params: entryParams }),
  putEntry: route<never>()({ method: 'put', path: '/api/batches/:id/log/:entryId', params: entryParams }),
  deleteEntry: route<never>()({ method: 'delete', path: '/api/batches/:id/log/:entryId', params: entryParams }),
  verifyLog: route<ChainCheck>()({ method: 'get', path: '/api/batches/:id/log/verify', params: batchIdParams }),
  signOff: route<Signature>()({
    method: 'post',
    path: '/api/batches/:id/sign-off',
    params: batchIdParams,
    body: signOffSchema,
  }),
};
