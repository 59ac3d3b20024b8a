import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type {
  CreateRecipeInput,
  SaveScaledInput,
  SaveVersionInput,
  UpdateRecipeInput,
} from '../../../../shared/schemas/recipes';
import { recipeKeys } from '../../../lib/recipe-keys';

/** Every recipe write invalidates the whole recipes prefix: list figures, details and versions all move together. */
function useRecipeMutation<I, O>(fn: (input: I) => Promise<O>) {
  const client = useQueryClient();
  return useMutation({ mutationFn: fn, onSuccess: () => client.invalidateQueries({ queryKey: recipeKeys.all }) });
}

export const useCreateRecipe = () =>
  useRecipeMutation((input: CreateRecipeInput) =>
    api.post<{ id: number; versionId: number; versionNumber: number }>('/api/recipes', input),
  );

export const useUpdateRecipe = () =>
  useRecipeMutation(({ recipeId, ...input }: UpdateRecipeInput & { recipeId: number }) =>
    api.patch(`/api/recipes/${recipeId}`, input),
  );

/** In place (unfrozen versions) or as the next version. */
export const useSaveVersion = () =>
  useRecipeMutation(
    ({
      recipeId,
      versionId,
      asNew,
      input,
    }: {
      recipeId: number;
      versionId: number;
      asNew: boolean;
      input: SaveVersionInput;
    }) =>
      asNew
        ? api.post<{ id: number; number: number }>(`/api/recipes/${recipeId}/versions`, input)
        : api.patch<{ id: number; number: number }>(`/api/recipes/${recipeId}/versions/${versionId}`, input),
  );

export const useSaveScaled = () =>
  useRecipeMutation(({ recipeId, versionId, input }: { recipeId: number; versionId: number; input: SaveScaledInput }) =>
    api.post<{ id: number; number: number }>(`/api/recipes/${recipeId}/versions/${versionId}/scaled`, input),
  );
