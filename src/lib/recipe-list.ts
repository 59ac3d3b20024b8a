import { queryOptions, useQuery } from '@tanstack/react-query';
import { call } from './api-client';
import { recipeRoutes } from '../../shared/contract/recipes';
import { recipeKeys } from './recipe-keys';

export const recipeListQuery = () =>
  queryOptions({ queryKey: recipeKeys.list(), queryFn: () => call(recipeRoutes.list) });
export const useRecipeList = () => useQuery(recipeListQuery());
