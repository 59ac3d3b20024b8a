import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from './api-client';
import type { RecipeListRow } from '../../shared/schemas/recipes';
import { recipeKeys } from './recipe-keys';

export const recipeListQuery = () =>
  queryOptions({ queryKey: recipeKeys.list(), queryFn: () => api.get<RecipeListRow[]>('/api/recipes') });
export const useRecipeList = () => useQuery(recipeListQuery());
