import { useMutation, useQueryClient } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { batchRoutes } from '../../../../shared/contract/batches';
import { deviceId } from '../../../lib/outbox';
import type { SignOffInput } from '../../../../shared/schemas/batch-log';
import { batchKeys } from './keys';

/** Signs the brew day off. Never queued: a signature needs the server (session + password) at that moment. */
export function useSignOff(batchId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: SignOffInput) =>
      call(batchRoutes.signOff, {
        params: { id: batchId },
        body: input,
        headers: {
          'Idempotency-Key': crypto.randomUUID(),
          'X-Captured-At': new Date().toISOString(),
          'X-Device-Id': deviceId(),
        },
      }),
    onSuccess: () => client.invalidateQueries({ queryKey: batchKeys.detail(batchId) }),
  });
}
