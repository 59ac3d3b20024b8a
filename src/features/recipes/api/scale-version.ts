import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { recipeRoutes } from '../../../../shared/contract/recipes';
import type { ScaleTarget } from '../../../../shared/schemas/recipes';
import { recipeKeys } from '../../../lib/recipe-keys';

/** The target as sent: a volume to the millilitre, so a volume converted from gallons keys one answer. */
const sent = ({ equipmentProfileId, batchVolumeL }: ScaleTarget): ScaleTarget => ({
  equipmentProfileId,
  batchVolumeL: batchVolumeL === undefined ? undefined : Number(batchVolumeL.toFixed(3)),
});

/** The target as the scale page's own address keeps it. */
export function scaleSearch(target: ScaleTarget): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(sent(target))) if (value !== undefined) params.set(key, String(value));
  return params.toString();
}

export const scaleQuery = (recipeId: number, versionId: number, target: ScaleTarget) =>
  queryOptions({
    queryKey: recipeKeys.scale(recipeId, versionId, target),
    queryFn: () => call(recipeRoutes.scale, { params: { recipeId, versionId }, query: sent(target) }),
    placeholderData: keepPreviousData,
  });
export const useScale = (recipeId: number, versionId: number, target: ScaleTarget, enabled = true) =>
  useQuery({ ...scaleQuery(recipeId, versionId, target), enabled });
