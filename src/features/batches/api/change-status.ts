import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { BatchDetail, ChangeStatusInput } from '../../../../shared/schemas/batches';
import { batchKeys } from './keys';

export function useChangeStatus(batchId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: ChangeStatusInput) => api.post<BatchDetail>(`/api/batches/${batchId}/status`, input),
    onSuccess: () => client.invalidateQueries({ queryKey: batchKeys.all }),
  });
}
