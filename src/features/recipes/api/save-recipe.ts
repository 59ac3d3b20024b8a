import { useMutation, useQueryClient } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { recipeRoutes } from '../../../../shared/contract/recipes';
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
  useRecipeMutation((input: CreateRecipeInput) => call(recipeRoutes.create, { body: input }));

export const useUpdateRecipe = () =>
  useRecipeMutation(({ recipeId, ...input }: UpdateRecipeInput & { recipeId: number }) =>
    call(recipeRoutes.update, { params: { recipeId }, body: input }),
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
        ? call(recipeRoutes.addVersion, { params: { recipeId }, body: input })
        : call(recipeRoutes.updateVersion, { params: { recipeId, versionId }, body: input }),
  );

export const useSaveScaled = () =>
  useRecipeMutation(({ recipeId, versionId, input }: { recipeId: number; versionId: number; input: SaveScaledInput }) =>
    call(recipeRoutes.saveScaled, { params: { recipeId, versionId }, body: input }),
  );
