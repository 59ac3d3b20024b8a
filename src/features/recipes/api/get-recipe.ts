import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { RecipeDetail } from '../../../../shared/contract/recipes';
import { recipeKeys } from '../../../lib/recipe-keys';

export const recipeQuery = (recipeId: number) =>
  queryOptions({
    queryKey: recipeKeys.detail(recipeId),
    queryFn: () => api.get<RecipeDetail>(`/api/recipes/${recipeId}`),
  });
export const useRecipe = (recipeId: number) => useQuery(recipeQuery(recipeId));
