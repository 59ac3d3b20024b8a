import { queryOptions, skipToken, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { batchRoutes } from '../../../../shared/contract/batches';
import type { PlanPreviewQuery } from '../../../../shared/schemas/batches';
import { batchKeys } from './keys';

/** What planning would freeze (recipe, version, brewhouse, volume), before the batch is planned. */
export const planPreviewQuery = (query: Partial<PlanPreviewQuery>) => {
  const { recipeVersionId } = query;
  return queryOptions({
    queryKey: [...batchKeys.all, 'plan-preview', query] as const,
    // Waits until a recipe version is chosen.
    queryFn:
      recipeVersionId === undefined
        ? skipToken
        : () => call(batchRoutes.planPreview, { query: { ...query, recipeVersionId } }),
  });
};
export const usePlanPreview = (query: Partial<PlanPreviewQuery>) => useQuery(planPreviewQuery(query));
