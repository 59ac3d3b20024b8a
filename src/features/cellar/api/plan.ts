import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { CellarPlanInput, CellarPlanView } from '../../../../shared/schemas/cellar';
import { cellarKeys } from './keys';

export function useSavePlan(batchId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: CellarPlanInput) => api.put<CellarPlanView>(`/api/cellar/batches/${batchId}/plan`, input),
    onSuccess: () => client.invalidateQueries({ queryKey: cellarKeys.all }),
  });
}
