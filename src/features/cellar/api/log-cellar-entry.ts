import { outbox } from '../../../lib/outbox';
import type { ActionEntryInput, PackagingEntryInput, ReadingEntryInput } from '../../../../shared/schemas/cellar';
import { cellarRoutes } from '../../../../shared/contract/cellar';
import { pathOf } from '../../../../shared/contract/route';

const ROUTES = {
  reading: cellarRoutes.recordReading,
  action: cellarRoutes.recordAction,
  packaging: cellarRoutes.recordPackaging,
} as const;
type CellarEntry = ReadingEntryInput | ActionEntryInput | PackagingEntryInput;

/** The outbox group of a batch's cellar writes. */
export const cellarGroup = (batchId: number) => `cellar:${batchId}`;

/**
 * Logs a reading, action or packaging run through the device outbox: kept on the tablet with its
 * idempotency key and captured time, sent in order, retried when the network returns.
 */
export function useLogCellarEntry(batchId: number) {
  return (entry: CellarEntry, label: string) =>
    outbox().enqueue({
      url: pathOf(ROUTES[entry.kind].path, { batchId }),
      body: entry,
      label,
      group: cellarGroup(batchId),
    });
}
