import { MutationCache, QueryCache, QueryClient, type QueryClientConfig } from '@tanstack/react-query';
import { isApiError } from './api-client';

// Key of the signed-in user query; lives here (not in a feature) because the cache-wide 401 handler needs it.
export const sessionQueryKey = ['auth', 'me'] as const;

function retry(failureCount: number, error: unknown): boolean {
  // A 4xx will not get better by asking again; network and 5xx errors may.
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < 2;
}

/** The app's QueryClient. Tests pass `{ queries: { retry: false } }` through `defaultOptions`. */
export function createQueryClient(config: QueryClientConfig = {}): QueryClient {
  const queryClient: QueryClient = new QueryClient({
    ...config,
    // A 401 from any other call means the session ended server-side: refresh who we are.
    queryCache: new QueryCache({
      onError: (error, query) => {
        if (isApiError(error) && error.status === 401 && query.queryKey[0] !== 'auth') {
          void queryClient.invalidateQueries({ queryKey: sessionQueryKey });
        }
      },
    }),
    mutationCache: new MutationCache({
      onError: (error) => {
        if (isApiError(error) && error.status === 401) {
          void queryClient.invalidateQueries({ queryKey: sessionQueryKey });
        }
      },
    }),
    defaultOptions: {
      ...config.defaultOptions,
      queries: {
        retry,
        staleTime: 60_000,
        refetchOnWindowFocus: false,
        ...config.defaultOptions?.queries,
      },
      mutations: { retry: false, ...config.defaultOptions?.mutations },
    },
  });
  return queryClient;
}
