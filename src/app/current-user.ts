import { createContext, useContext } from 'react';
import type { Me } from '../../shared/schemas/auth';

/** The signed-in person, provided by the app layout once the session is known. */
export const CurrentUserContext = createContext<Me | null>(null);

export function useCurrentUser(): Me {
  const me = useContext(CurrentUserContext);
  if (!me) throw new Error('useCurrentUser() used outside the signed-in layout');
  return me;
}
