import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import { cellarKeys } from './keys';

/** Marks an emptied vessel clean. */
export function useMarkClean() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.post(`/api/vessels/${id}/clean`),
    onSuccess: () => client.invalidateQueries({ queryKey: cellarKeys.all }),
  });
}

/** Removes an empty vessel. */
export function useDeleteVessel() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => api.delete(`/api/vessels/${id}`),
    onSuccess: () => client.invalidateQueries({ queryKey: cellarKeys.all }),
  });
}
