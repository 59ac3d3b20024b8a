import { useMutation, useQueryClient } from '@tanstack/react-query';
import { api } from './api-client';
import { authKeys } from './current-user';

/** Ends the session: every cached answer goes, and the person is known to be signed out. */
export function useSignOut() {
  const client = useQueryClient();
  return useMutation({
    mutationFn: () => api.post<void>('/api/auth/sign-out'),
    onSuccess: () => {
      client.clear();
      client.setQueryData(authKeys.me(), null);
    },
  });
}
