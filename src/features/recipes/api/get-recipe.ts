import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { RecipeStatus, VersionSummary } from '../../../../shared/schemas/recipes';
import { recipeKeys } from './keys';

export interface RecipeDetail {
  id: number;
  name: string;
  style: string;
  description: string;
  status: RecipeStatus;
  versions: VersionSummary[];
}

export const recipeQuery = (recipeId: number) =>
  queryOptions({
    queryKey: recipeKeys.detail(recipeId),
    queryFn: () => api.get<RecipeDetail>(`/api/recipes/${recipeId}`),
  });
export const useRecipe = (recipeId: number) => useQuery(recipeQuery(recipeId));
