import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Comparison } from '../../../../shared/contract/recipes';
import { recipeKeys } from '../../../lib/recipe-keys';

export const compareQuery = (recipeId: number, a: number, b: number) =>
  queryOptions({
    queryKey: recipeKeys.compare(recipeId, a, b),
    queryFn: () => api.get<Comparison>(`/api/recipes/${recipeId}/compare?a=${a}&b=${b}`),
  });
export const useComparison = (recipeId: number, a: number, b: number) => useQuery(compareQuery(recipeId, a, b));
