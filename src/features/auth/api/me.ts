import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, ApiError } from '../../../lib/api-client';
import { forgetOfflineAnswers } from '../../../lib/service-worker';
import type { Me } from '../../../../shared/schemas/auth';

export const authKeys = {
  all: ['auth'] as const,
  me: () => [...authKeys.all, 'me'] as const,
};

/** The signed-in person, or null when signed out. */
export const meQuery = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: async (): Promise<Me | null> => {
      try {
        return await api.get<Me>('/api/auth/me');
      } catch (error) {
        if (error instanceof ApiError && error.status === 401) {
          // Signed out by expiry or by a head brewer: nothing of that person's stays on a shared tablet.
          await forgetOfflineAnswers();
          return null;
        }
        throw error;
      }
    },
    staleTime: 5 * 60_000,
  });

export const useMe = () => useQuery(meQuery());
