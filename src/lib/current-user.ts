import { queryOptions, useQuery, useSuspenseQuery } from '@tanstack/react-query';
import { call, ApiError } from './api-client';
import { authRoutes } from '../../shared/contract/auth';
import { forgetOfflineAnswers } from './service-worker';
import type { Me } from '../../shared/schemas/auth';
import { can, type Action } from '../../shared/policy';

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
        return await call(authRoutes.me);
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

/** Whether anyone is signed in (null data: nobody), for the shell that decides between sign-in and the app. */
export const useMe = () => useQuery(meQuery());

/** The signed-in person, for pages inside the signed-in layout (which has already loaded them). */
export function useCurrentUser(): Me {
  const { data } = useSuspenseQuery(meQuery());
  if (!data) throw new Error('useCurrentUser() used while nobody is signed in');
  return data;
}

/** Whether the signed-in person may do the action (shared/policy.ts decides). */
export function useCan(action: Action): boolean {
  return can(useCurrentUser().role, action);
}

/** The same question for many actions at once, such as a menu's items. */
export function usePermissions(): (action: Action) => boolean {
  const { role } = useCurrentUser();
  return (action) => can(role, action);
}
