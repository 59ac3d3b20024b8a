import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { call } from './api-client';
import type { IngredientInput } from '../../shared/schemas/recipes';
import { ingredientRoutes } from '../../shared/contract/recipes';

export const ingredientKeys = { all: ['ingredients'] as const };

export const ingredientsQuery = () =>
  queryOptions({ queryKey: ingredientKeys.all, queryFn: () => call(ingredientRoutes.list) });
export const useIngredients = () => useQuery(ingredientsQuery());

export function useSaveIngredient() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id?: number; input: IngredientInput }) =>
      id === undefined
        ? call(ingredientRoutes.create, { body: input })
        : call(ingredientRoutes.update, { params: { ingredientId: id }, body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: ingredientKeys.all }),
  });
}

export function useRemoveIngredient() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => call(ingredientRoutes.remove, { params: { ingredientId: id } }),
    onSuccess: () => client.invalidateQueries({ queryKey: ingredientKeys.all }),
  });
}
