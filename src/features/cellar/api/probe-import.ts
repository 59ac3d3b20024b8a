import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { deviceId } from '../../../lib/outbox';
import type { ProbeImportInput, ProbeImportResult } from '../../../../shared/schemas/cellar';
import { cellarKeys } from './keys';

/** Checks every row of a probe file against the batch; writes nothing. */
export function usePreviewImport(batchId: number) {
  return useMutation({
    mutationFn: (input: ProbeImportInput) =>
      api.post<ProbeImportResult>(`/api/cellar/batches/${batchId}/readings/preview`, input),
  });
}

/** Imports the file: all rows in one transaction or none. Online only (the preview needs the server). */
export function useImportReadings(batchId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ input, idempotencyKey }: { input: ProbeImportInput; idempotencyKey: string }) =>
      api.post<ProbeImportResult>(`/api/cellar/batches/${batchId}/readings/import`, input, {
        'Idempotency-Key': idempotencyKey,
        'X-Captured-At': new Date().toISOString(),
        'X-Device-Id': deviceId(),
      }),
    onSuccess: () => client.invalidateQueries({ queryKey: cellarKeys.all }),
  });
}
