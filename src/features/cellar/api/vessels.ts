import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { VesselInput, VesselView } from '../../../../shared/schemas/cellar';
import { cellarKeys } from './keys';

export const vesselsQuery = () =>
  queryOptions({ queryKey: cellarKeys.vessels(), queryFn: () => api.get<VesselView[]>('/api/vessels') });
export const useVessels = () => useQuery(vesselsQuery());

/** Creates a vessel, or saves an existing one when `id` is given. */
export function useSaveVessel() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id?: number; input: VesselInput }) =>
      id ? api.put<VesselView>(`/api/vessels/${id}`, input) : api.post<VesselView>('/api/vessels', input),
    onSuccess: () => client.invalidateQueries({ queryKey: cellarKeys.all }),
  });
}
