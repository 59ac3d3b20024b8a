import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { BatchDetail, CreateBatchInput } from '../../../../shared/schemas/batches';
import { batchKeys } from './keys';

export function usePlanBatch() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateBatchInput) => api.post<BatchDetail>('/api/batches', input),
    onSuccess: () => client.invalidateQueries({ queryKey: batchKeys.all }),
  });
}
