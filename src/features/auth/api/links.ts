import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { ResetRequestInput, ResetPasswordInput } from '../../../../shared/schemas/auth';
import { authKeys } from '../../../lib/current-user';

export const inviteQuery = (token: string) =>
  queryOptions({
    queryKey: [...authKeys.all, 'invite', token] as const,
    queryFn: () => api.get<{ email: string; breweryName: string; role: string }>(`/api/auth/invites/${token}`),
  });
export const useInvite = (token: string) => useQuery(inviteQuery(token));

export const useRequestReset = () =>
  useMutation({
    mutationFn: (input: ResetRequestInput) => api.post<{ message: string }>('/api/auth/reset-request', input),
  });

/**
 * Whether a reset link can still be used: the server answers 204 when it can, 404 with the reason when it cannot.
 * A query must hold a value, so an open link is `true` rather than the empty answer.
 */
export const useResetLink = (token: string) =>
  useQuery({
    queryKey: [...authKeys.all, 'reset', token] as const,
    queryFn: async () => {
      await api.get<void>(`/api/auth/reset/${token}`);
      return true;
    },
    retry: false,
  });

export const useResetPassword = (token: string) =>
  useMutation({ mutationFn: (input: ResetPasswordInput) => api.post<void>(`/api/auth/reset/${token}`, input) });
