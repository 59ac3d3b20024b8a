import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ComputedRecipe } from '../../../../shared/brewing';
import type { RecipeStatus, RecipeVersionContent, VersionSummary } from '../../../../shared/schemas/recipes';
import { recipeKeys } from './keys';

export interface VersionDetail {
  recipe: { id: number; name: string; style: string; description: string; status: RecipeStatus };
  version: VersionSummary & { content: RecipeVersionContent };
  computed: ComputedRecipe;
}

export const versionQuery = (recipeId: number, versionId: number) =>
  queryOptions({
    queryKey: recipeKeys.version(recipeId, versionId),
    queryFn: () => api.get<VersionDetail>(`/api/recipes/${recipeId}/versions/${versionId}`),
  });
export const useVersion = (recipeId: number, versionId: number) => useQuery(versionQuery(recipeId, versionId));
