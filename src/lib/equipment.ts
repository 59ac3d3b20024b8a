import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { call } from './api-client';
import type { EquipmentInput } from '../../shared/schemas/recipes';
import { equipmentRoutes } from '../../shared/contract/recipes';

export const equipmentKeys = { all: ['equipment'] as const };

export const equipmentQuery = () =>
  queryOptions({ queryKey: equipmentKeys.all, queryFn: () => call(equipmentRoutes.list) });
export const useEquipment = () => useQuery(equipmentQuery());

export function useSaveEquipment() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id?: number; input: EquipmentInput }) =>
      id === undefined
        ? call(equipmentRoutes.create, { body: input })
        : call(equipmentRoutes.update, { params: { equipmentId: id }, body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: equipmentKeys.all }),
  });
}

/** Removes a profile; one a recipe version was written for answers 409 with the reason. */
export function useRemoveEquipment() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => call(equipmentRoutes.remove, { params: { equipmentId: id } }),
    onSuccess: () => client.invalidateQueries({ queryKey: equipmentKeys.all }),
  });
}
