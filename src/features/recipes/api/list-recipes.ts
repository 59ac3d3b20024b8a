import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { RecipeStatus } from '../../../../shared/schemas/recipes';
import { recipeKeys } from './keys';

export interface RecipeListRow {
  id: number;
  name: string;
  style: string;
  status: RecipeStatus;
  latestVersionId: number;
  latestVersion: number;
  og: number;
  fg: number;
  ibu: number;
  srm: number;
  abvPct: number;
  lastBrewedAt: string | null;
  updatedAt: string;
}

export const recipeListQuery = () => queryOptions({ queryKey: recipeKeys.list(), queryFn: () => api.get<RecipeListRow[]>('/api/recipes') });
export const useRecipeList = () => useQuery(recipeListQuery());
