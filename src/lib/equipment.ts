import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from './api-client';
import type { EquipmentInput } from '../../shared/schemas/recipes';
import type { EquipmentRow } from '../../shared/contract/recipes';

export const equipmentKeys = { all: ['equipment'] as const };

export const equipmentQuery = () =>
  queryOptions({ queryKey: equipmentKeys.all, queryFn: () => api.get<EquipmentRow[]>('/api/equipment') });
export const useEquipment = () => useQuery(equipmentQuery());

export function useSaveEquipment() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id?: number; input: EquipmentInput }) =>
      id === undefined
        ? api.post<EquipmentRow>('/api/equipment', input)
        : api.put<EquipmentRow>(`/api/equipment/${id}`, input),
    onSuccess: () => client.invalidateQueries({ queryKey: equipmentKeys.all }),
  });
}

/** Removes a profile; one a recipe version was written for answers 409 with the reason. */
export function useRemoveEquipment() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete(`/api/equipment/${id}`),
    onSuccess: () => client.invalidateQueries({ queryKey: equipmentKeys.all }),
  });
}
