import { useMutation, useQueryClient } from '@tanstack/react-query';
import { call } from '../../../lib/api-client';
import { authRoutes } from '../../../../shared/contract/auth';
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

export const useSignIn = () => useSessionMutation((input: SignInInput) => call(authRoutes.signIn, { body: input }));
export const useSignUp = () => useSessionMutation((input: SignUpInput) => call(authRoutes.signUp, { body: input }));
export const useAcceptInvite = (token: string) =>
  useSessionMutation((input: AcceptInviteInput) => call(authRoutes.acceptInvite, { params: { token }, body: input }));
