import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from '../../../lib/api-client';
import type { Me, SignInInput, SignUpInput, AcceptInviteInput } from '../../../../shared/schemas/auth';
import { authKeys } from '../../../lib/current-user';

/** After any change of who is signed in, drop every cached answer and keep only the new person. */
function useSessionMutation<TInput>(fn: (input: TInput) => Promise<Me>) {
  const client = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: (me) => {
      client.clear();
      client.setQueryData(authKeys.me(), me);
    },
  });
}

export const useSignIn = () => useSessionMutation((input: SignInInput) => api.post<Me>('/api/auth/sign-in', input));
export const useSignUp = () => useSessionMutation((input: SignUpInput) => api.post<Me>('/api/auth/sign-up', input));
export const useAcceptInvite = (token: string) =>
  useSessionMutation((input: AcceptInviteInput) => api.post<Me>(`/api/auth/invites/${token}`, input));
