import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Difference } from '../../../../shared/schemas/recipes';
import type { VersionDetail } from './get-version';
import { recipeKeys } from './keys';

export interface Comparison {
  recipe: VersionDetail['recipe'];
  a: VersionDetail;
  b: VersionDetail;
  differences: Difference[];
}

export const compareQuery = (recipeId: number, a: number, b: number) =>
  queryOptions({
    queryKey: recipeKeys.compare(recipeId, a, b),
    queryFn: () => api.get<Comparison>(`/api/recipes/${recipeId}/compare?a=${a}&b=${b}`),
  });
export const useComparison = (recipeId: number, a: number, b: number) => useQuery(compareQuery(recipeId, a, b));
