import { queryOptions, useMutation, useQuery } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { authRoutes } from '../../../../shared/contract/auth';
import type { ResetRequestInput, ResetPasswordInput } from '../../../../shared/schemas/auth';
import { authKeys } from '../../../lib/current-user';

export const inviteQuery = (token: string) =>
  queryOptions({
    queryKey: [...authKeys.all, 'invite', token] as const,
    queryFn: () => call(authRoutes.describeInvite, { params: { token } }),
  });
export const useInvite = (token: string) => useQuery(inviteQuery(token));

export const useRequestReset = () =>
  useMutation({
    mutationFn: (input: ResetRequestInput) => call(authRoutes.requestReset, { body: input }),
  });

/**
 * Whether a reset link can still be used: the server answers 204 when it can, 404 with the reason when it cannot.
 * A query must hold a value, so an open link is `true` rather than the empty answer.
 */
export const useResetLink = (token: string) =>
  useQuery({
    queryKey: [...authKeys.all, 'reset', token] as const,
    queryFn: async () => {
      await call(authRoutes.checkReset, { params: { token } });
      return true;
    },
    retry: false,
  });

export const useResetPassword = (token: string) =>
  useMutation({
    mutationFn: (input: ResetPasswordInput) => call(authRoutes.resetPassword, { params: { token }, body: input }),
  });
