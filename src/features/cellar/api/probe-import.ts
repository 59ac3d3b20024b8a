import { useMutation, useQueryClient } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { cellarRoutes } from '../../../../shared/contract/cellar';
import { deviceId } from '../../../lib/outbox';
import type { ProbeImportInput } from '../../../../shared/schemas/cellar';
import { cellarKeys } from '../../../lib/cellar-keys';

/** Checks every row of a probe file against the batch; writes nothing. */
export function usePreviewImport(batchId: number) {
  return useMutation({
    mutationFn: (input: ProbeImportInput) => call(cellarRoutes.previewImport, { params: { batchId }, body: input }),
  });
}

/** Imports the file: all rows in one transaction or none. Online only (the preview needs the server). */
export function useImportReadings(batchId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ input, idempotencyKey }: { input: ProbeImportInput; idempotencyKey: string }) =>
      call(cellarRoutes.importReadings, {
        params: { batchId },
        body: input,
        headers: {
          'Idempotency-Key': idempotencyKey,
          'X-Captured-At': new Date().toISOString(),
          'X-Device-Id': deviceId(),
        },
      }),
    onSuccess: () => client.invalidateQueries({ queryKey: cellarKeys.all }),
  });
}
