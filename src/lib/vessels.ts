import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { call } from './api-client';
import { vesselRoutes } from '../../shared/contract/cellar';
import type { VesselInput } from '../../shared/schemas/cellar';
import { cellarKeys } from './cellar-keys';

export const vesselsQuery = () =>
  queryOptions({ queryKey: cellarKeys.vessels(), queryFn: () => call(vesselRoutes.list) });
export const useVessels = () => useQuery(vesselsQuery());

/** Creates a vessel, or saves an existing one when `id` is given. */
export function useSaveVessel() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id?: number; input: VesselInput }) =>
      id
        ? call(vesselRoutes.update, { params: { vesselId: id }, body: input })
        : call(vesselRoutes.create, { body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: cellarKeys.all }),
  });
}
