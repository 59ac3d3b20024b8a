import { outbox } from '../../../lib/outbox';
import type { LogEntryInput } from '../../../../shared/schemas/batch-log';
import { batchRoutes } from '../../../../shared/contract/batches';
import { pathOf } from '../../../../shared/contract/route';

export const batchGroup = (batchId: number) => `batch:${batchId}`;
/** Where a batch's log entries (and notes) are posted. */
export const batchLogUrl = (batchId: number) => pathOf(batchRoutes.appendLog.path, { id: batchId });

/** Keeps a log entry in the device's outbox and sends it when it can: works the same offline. */
export function logEntry(batchId: number, body: LogEntryInput, label: string) {
  return outbox().enqueue({ url: batchLogUrl(batchId), body, label, group: batchGroup(batchId) });
}
