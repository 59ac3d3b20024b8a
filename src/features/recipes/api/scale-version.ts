import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ScaleResult } from '../../../../shared/contract/recipes';
import { recipeKeys } from '../../../lib/recipe-keys';

export interface ScaleTarget {
  equipmentProfileId?: number;
  batchVolumeL?: number;
}

export function scaleSearch(target: ScaleTarget): string {
  const params = new URLSearchParams();
  if (target.equipmentProfileId !== undefined) params.set('equipmentProfileId', String(target.equipmentProfileId));
  if (target.batchVolumeL !== undefined) params.set('batchVolumeL', String(Number(target.batchVolumeL.toFixed(3))));
  return params.toString();
}

export const scaleQuery = (recipeId: number, versionId: number, target: ScaleTarget) =>
  queryOptions({
    queryKey: recipeKeys.scale(recipeId, versionId, target),
    queryFn: () => api.get<ScaleResult>(`/api/recipes/${recipeId}/versions/${versionId}/scale?${scaleSearch(target)}`),
    placeholderData: keepPreviousData,
  });
export const useScale = (recipeId: number, versionId: number, target: ScaleTarget, enabled = true) =>
  useQuery({ ...scaleQuery(recipeId, versionId, target), enabled });
