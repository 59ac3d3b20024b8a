import { queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { recipeRoutes } from '../../../../shared/contract/recipes';
import { recipeKeys } from '../../../lib/recipe-keys';

export const compareQuery = (recipeId: number, a: number, b: number) =>
  queryOptions({
    queryKey: recipeKeys.compare(recipeId, a, b),
    queryFn: () => call(recipeRoutes.compare, { params: { recipeId }, query: { a, b } }),
  });
export const useComparison = (recipeId: number, a: number, b: number) => useQuery(compareQuery(recipeId, a, b));
