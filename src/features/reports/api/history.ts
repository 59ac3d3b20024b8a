import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { BatchHistory } from '../../../../shared/schemas/reports';
import { reportKeys } from './keys';

export const historyQuery = (recipeId: number) =>
  queryOptions({
    queryKey: reportKeys.history(recipeId),
    queryFn: () => api.get<BatchHistory>(`/api/reports/history?recipeId=${recipeId}`),
  });
export const useBatchHistory = (recipeId: number | null) =>
  useQuery({ ...historyQuery(recipeId ?? 0), enabled: recipeId !== null });
