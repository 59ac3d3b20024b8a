import { useMutation, useQueryClient } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { batchRoutes } from '../../../../shared/contract/batches';
import type { CreateBatchInput } from '../../../../shared/schemas/batches';
import { batchKeys } from './keys';

export function usePlanBatch() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateBatchInput) => call(batchRoutes.plan, { body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: batchKeys.all }),
  });
}
