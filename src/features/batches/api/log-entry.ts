import { useEffect } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { outbox } from '../../../lib/outbox';
import type { LogEntryInput } from '../../../../shared/schemas/batch-log';
import { batchKeys } from './keys';

export const batchGroup = (batchId: number) => `batch:${batchId}`;

/** Keeps a log entry in the device's outbox and sends it when it can: works the same offline. */
export function logEntry(batchId: number, body: LogEntryInput, label: string) {
  return outbox().enqueue({ url: `/api/batches/${batchId}/log`, body, label, group: batchGroup(batchId) });
}

/** Refreshes the batch each time one of its entries reaches the server. */
export function useRefreshOnSent(batchId: number) {
  const client = useQueryClient();
  useEffect(
    () =>
      outbox().onSent((item) => {
        if (item.group === batchGroup(batchId)) void client.invalidateQueries({ queryKey: batchKeys.detail(batchId) });
      }),
    [batchId, client],
  );
}
