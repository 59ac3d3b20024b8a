import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import type { InviteInput, UpdateMemberInput } from '../../../../shared/schemas/auth';
import { teamRoutes } from '../../../../shared/contract/auth';

export const teamKeys = { all: ['team'] as const };

export const teamQuery = () => queryOptions({ queryKey: teamKeys.all, queryFn: () => call(teamRoutes.list) });
export const useTeam = () => useQuery(teamQuery());

export function useInviteTeammate() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: InviteInput) => call(teamRoutes.invite, { body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: teamKeys.all }),
  });
}

export function useUpdateMember() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...input }: UpdateMemberInput & { id: number }) =>
      call(teamRoutes.updateMember, { params: { userId: id }, body: input }),
    onSuccess: () => client.invalidateQueries({ queryKey: teamKeys.all }),
  });
}
