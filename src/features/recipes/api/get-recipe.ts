import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { RecipeStatus } from '../../../../shared/schemas/recipes';
import { recipeKeys } from './keys';

export interface VersionSummary {
  id: number;
  number: number;
  changeNote: string;
  authorName: string;
  createdAt: string;
  frozenAt: string | null;
  equipmentProfileId: number;
  batchVolumeL: number;
  og: number;
  fg: number;
  ibu: number;
  srm: number;
  abvPct: number;
}

export interface RecipeDetail {
  id: number;
  name: string;
  style: string;
  description: string;
  status: RecipeStatus;
  versions: VersionSummary[];
}

export const recipeQuery = (recipeId: number) =>
  queryOptions({ queryKey: recipeKeys.detail(recipeId), queryFn: () => api.get<RecipeDetail>(`/api/recipes/${recipeId}`) });
export const useRecipe = (recipeId: number) => useQuery(recipeQuery(recipeId));
