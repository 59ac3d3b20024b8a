import { useMutation, useQueryClient } from '@tanstack/react-query';
import { call } from './api-client';
import { authRoutes } from '../../shared/contract/auth';
import { authKeys } from './current-user';

/** Ends the session: every cached answer goes, and the person is known to be signed out. */
export function useSignOut() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => call(authRoutes.signOut),
    onSuccess: () => {
      client.clear();
      client.setQueryData(authKeys.me(), null);
    },
  });
}
