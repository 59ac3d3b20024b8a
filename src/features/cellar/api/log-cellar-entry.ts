import { useEffect } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { outbox } from '../../../lib/outbox';
import type { ActionEntryInput, PackagingEntryInput, ReadingEntryInput } from '../../../../shared/schemas/cellar';
import { cellarKeys } from './keys';

const PATHS = { reading: 'readings', action: 'actions', packaging: 'packaging' } as const;
type CellarEntry = ReadingEntryInput | ActionEntryInput | PackagingEntryInput;

/** The outbox group of a batch's cellar writes. */
export const cellarGroup = (batchId: number) => `cellar:${batchId}`;

/** Refreshes what the cellar screens show each time the outbox delivers a write. Use once per page. */
export function useRefreshOnSent() {
  const client = useQueryClient();
  useEffect(() => outbox().onSent(() => void client.invalidateQueries({ queryKey: cellarKeys.all })), [client]);
}

/**
 * Logs a reading, action or packaging run through the device outbox: kept on the tablet with its
 * idempotency key and captured time, sent in order, retried when the network returns.
 */
export function useLogCellarEntry(batchId: number) {
  return (entry: CellarEntry, label: string) =>
    outbox().enqueue({ url: `/api/cellar/batches/${batchId}/${PATHS[entry.kind]}`, body: entry, label, group: cellarGroup(batchId) });
}
