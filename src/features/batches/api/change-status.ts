import { useMutation, useQueryClient } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { batchRoutes } from '../../../../shared/contract/batches';
import type { ChangeStatusInput } from '../../../../shared/schemas/batches';
import { batchKeys } from './keys';

export function useChangeStatus(batchId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: ChangeStatusInput) => call(batchRoutes.changeStatus, { params: { id: batchId }, body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: batchKeys.all }),
  });
}
