import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { VersionDetail } from '../../../../shared/contract/recipes';
import { recipeKeys } from '../../../lib/recipe-keys';

export const versionQuery = (recipeId: number, versionId: number) =>
  queryOptions({
    queryKey: recipeKeys.version(recipeId, versionId),
    queryFn: () => api.get<VersionDetail>(`/api/recipes/${recipeId}/versions/${versionId}`),
  });
export const useVersion = (recipeId: number, versionId: number) => useQuery(versionQuery(recipeId, versionId));
