import { queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { reportRoutes } from '../../../../shared/contract/reports';
import { reportKeys } from './keys';

export const historyQuery = (recipeId: number) =>
  queryOptions({
    queryKey: reportKeys.history(recipeId),
    queryFn: () => call(reportRoutes.history, { query: { recipeId } }),
  });
export const useBatchHistory = (recipeId: number | null) =>
  useQuery({ ...historyQuery(recipeId ?? 0), enabled: recipeId !== null });
