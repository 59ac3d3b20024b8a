import { queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { recipeRoutes } from '../../../../shared/contract/recipes';
import { recipeKeys } from '../../../lib/recipe-keys';

export const recipeQuery = (recipeId: number) =>
  queryOptions({
    queryKey: recipeKeys.detail(recipeId),
    queryFn: () => call(recipeRoutes.get, { params: { recipeId } }),
  });
export const useRecipe = (recipeId: number) => useQuery(recipeQuery(recipeId));
