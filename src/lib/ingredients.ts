import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from './api-client';
import type { IngredientInput } from '../../shared/schemas/recipes';
import type { IngredientRow } from '../../shared/contract/recipes';

export const ingredientKeys = { all: ['ingredients'] as const };

export const ingredientsQuery = () =>
  queryOptions({ queryKey: ingredientKeys.all, queryFn: () => api.get<IngredientRow[]>('/api/ingredients') });
export const useIngredients = () => useQuery(ingredientsQuery());

export function useSaveIngredient() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id?: number; input: IngredientInput }) =>
      id === undefined
        ? api.post<IngredientRow>('/api/ingredients', input)
        : api.put<IngredientRow>(`/api/ingredients/${id}`, input),
    onSuccess: () => client.invalidateQueries({ queryKey: ingredientKeys.all }),
  });
}

export function useRemoveIngredient() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete(`/api/ingredients/${id}`),
    onSuccess: () => client.invalidateQueries({ queryKey: ingredientKeys.all }),
  });
}
