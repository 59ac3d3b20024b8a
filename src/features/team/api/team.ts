import { queryOptions, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { InviteInput, UpdateMemberInput } from '../../../../shared/schemas/auth';
import type { Team } from '../../../../shared/contract/auth';

export const teamKeys = { all: ['team'] as const };

export const teamQuery = () => queryOptions({ queryKey: teamKeys.all, queryFn: () => api.get<Team>('/api/team') });
export const useTeam = () => useQuery(teamQuery());

export function useInviteTeammate() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: (input: InviteInput) => api.post<{ id: number; email: string }>('/api/team/invites', input),
    onSuccess: () => client.invalidateQueries({ queryKey: teamKeys.all }),
  });
}

export function useUpdateMember() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...input }: UpdateMemberInput & { id: number }) => api.patch(`/api/team/${id}`, input),
    onSuccess: () => client.invalidateQueries({ queryKey: teamKeys.all }),
  });
}
