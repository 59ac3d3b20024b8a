import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { PlanPreview, PlanPreviewQuery } from '../../../../shared/schemas/batches';
import { batchKeys } from './keys';

/** What planning would freeze (recipe, version, brewhouse, volume), before the batch is planned. */
export const planPreviewQuery = (query: Partial<PlanPreviewQuery>) =>
  queryOptions({
    queryKey: [...batchKeys.all, 'plan-preview', query] as const,
    queryFn: () => {
      const params = new URLSearchParams(
        Object.entries(query)
          .filter(([, v]) => v !== undefined)
          .map(([k, v]) => [k, String(v)]),
      );
      return api.get<PlanPreview>(`/api/batches/plan-preview?${params}`);
    },
    enabled: query.recipeVersionId !== undefined,
  });
export const usePlanPreview = (query: Partial<PlanPreviewQuery>) => useQuery(planPreviewQuery(query));
