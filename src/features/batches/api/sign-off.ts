import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { deviceId } from '../../../lib/outbox';
import type { Signature, SignOffInput } from '../../../../shared/schemas/batch-log';
import { batchKeys } from './keys';

/** Signs the brew day off. Never queued: a signature needs the server (session + password) at that moment. */
export function useSignOff(batchId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: SignOffInput) =>
      api.post<Signature>(`/api/batches/${batchId}/sign-off`, input, {
        'Idempotency-Key': crypto.randomUUID(),
        'X-Captured-At': new Date().toISOString(),
        'X-Device-Id': deviceId(),
      }),
    onSuccess: () => client.invalidateQueries({ queryKey: batchKeys.detail(batchId) }),
  });
}
