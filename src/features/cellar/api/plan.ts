import { useMutation, useQueryClient } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { cellarRoutes } from '../../../../shared/contract/cellar';
import type { CellarPlanInput } from '../../../../shared/schemas/cellar';
import { cellarKeys } from '../../../lib/cellar-keys';

export function useSavePlan(batchId: number) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: CellarPlanInput) => call(cellarRoutes.savePlan, { params: { batchId }, body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: cellarKeys.all }),
  });
}
