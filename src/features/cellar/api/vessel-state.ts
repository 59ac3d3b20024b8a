import { useMutation, useQueryClient } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { vesselRoutes } from '../../../../shared/contract/cellar';
import { cellarKeys } from '../../../lib/cellar-keys';

/** Marks an emptied vessel clean. */
export function useMarkClean() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => call(vesselRoutes.markClean, { params: { vesselId: id } }),
    onSuccess: () => client.invalidateQueries({ queryKey: cellarKeys.all }),
  });
}

/** Removes an empty vessel. */
export function useDeleteVessel() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (id: number) => call(vesselRoutes.remove, { params: { vesselId: id } }),
    onSuccess: () => client.invalidateQueries({ queryKey: cellarKeys.all }),
  });
}
