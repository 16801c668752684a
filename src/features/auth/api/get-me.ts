import { queryOptions, useSuspenseQuery, type QueryClient } from '@tanstack/react-query';
import { meSchema, type Me } from '../../../../shared/contracts/auth';
import { api, rememberCsrfToken } from '../../../lib/api-client';
import { isApiError } from '../../../lib/api-error';
import { authKeys } from './auth-keys';

/** The signed-in user with their labs and CSRF token, or null when nobody is signed in. */
export async function getMe(): Promise<Me | null> {
  try {
    const me = await api.get('/api/auth/me', meSchema);
    rememberCsrfToken(me.csrfToken);
    return me;
  } catch (error) {
    if (isApiError(error) && error.status === 401) {
      rememberCsrfToken(null);
      return null;
    }
    throw error;
  }
}

export const meQueryOptions = () =>
  queryOptions({
    queryKey: authKeys.me(),
    queryFn: getMe,
  });

export function useMe(): Me | null {
  return useSuspenseQuery(meQueryOptions()).data;
}

/**
 * Replaces the cached user after sign-in, lab switch or invitation acceptance and drops
 * every other cached query, so nothing read for another user or lab survives.
 */
export function storeSignedInUser(queryClient: QueryClient, me: Me | null): void {
  rememberCsrfToken(me?.csrfToken ?? null);
  queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.all[0] });
  queryClient.setQueryData(authKeys.me(), me);
}

/** The signed-in user, for pages inside the signed-in shell (which never renders them without one). */
export function useSignedInMe(): Me {
  const me = useMe();
  if (!me) throw new Error('This page needs a signed-in user; the shell should have sent the visitor to sign-in.');
  return me;
}
