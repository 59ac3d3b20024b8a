import { queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { recipeRoutes } from '../../../../shared/contract/recipes';
import { recipeKeys } from '../../../lib/recipe-keys';

export const versionQuery = (recipeId: number, versionId: number) =>
  queryOptions({
    queryKey: recipeKeys.version(recipeId, versionId),
    queryFn: () => call(recipeRoutes.getVersion, { params: { recipeId, versionId } }),
  });
export const useVersion = (recipeId: number, versionId: number) => useQuery(versionQuery(recipeId, versionId));
