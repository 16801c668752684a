import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-error';

/** A 4xx answer will not change by asking again; network trouble and 5xx get two more tries. */
export function shouldRetryQuery(failureCount: number, error: unknown): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

type QueryClientHooks = {
  /** Called when any request answers 401, i.e. the session has ended while the page was open. */
  onUnauthenticated: (queryClient: QueryClient) => void;
};

export function createQueryClient({ onUnauthenticated }: QueryClientHooks): QueryClient {
  const reportSessionEnd = (error: unknown) => {
    if (isApiError(error) && error.status === 401 && error.code === 'unauthenticated') onUnauthenticated(queryClient);
  };
  const queryClient = new QueryClient({
    queryCache: new QueryCache({ onError: reportSessionEnd }),
    mutationCache: new MutationCache({ onError: reportSessionEnd }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: shouldRetryQuery,
      },
      mutations: { retry: false },
    },
  });
  return queryClient;
}
