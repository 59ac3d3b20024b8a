/** Query keys for recipes, general to specific, so a save invalidates by prefix. */
export const recipeKeys = {
  all: ['recipes'] as const,
  list: () => [...recipeKeys.all, 'list'] as const,
  detail: (recipeId: number) => [...recipeKeys.all, 'detail', recipeId] as const,
  version: (recipeId: number, versionId: number) => [...recipeKeys.detail(recipeId), 'version', versionId] as const,
  compare: (recipeId: number, a: number, b: number) => [...recipeKeys.detail(recipeId), 'compare', a, b] as const,
  scale: (recipeId: number, versionId: number, target: { equipmentProfileId?: number; batchVolumeL?: number }) =>
    [...recipeKeys.version(recipeId, versionId), 'scale', target] as const,
};
