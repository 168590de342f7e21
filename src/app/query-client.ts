import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';
import { authKeys } from '../api/auth/auth-keys';
import { isApiError } from '../lib/api-client';

/**
 * One client for the app. A 401 from any call means the session ended: forget the user, and
 * RequireAuth sends them to sign in. Client errors (4xx) are answers, so they are not retried.
 */
export function createQueryClient(): QueryClient {
  const queryClient: QueryClient = new QueryClient({
    queryCache: new QueryCache({
      onError: (error, query) => {
        if (isApiError(error) && error.status === 401 && query.queryKey[0] !== authKeys.all[0]) {
          queryClient.setQueryData(authKeys.me(), null);
        }
      },
    }),
    mutationCache: new MutationCache({
      onError: (error, _variables, _context, mutation) => {
        const isLogin = mutation.options.mutationKey?.[0] === authKeys.all[0];
        if (isApiError(error) && error.status === 401 && !isLogin) queryClient.setQueryData(authKeys.me(), null);
      },
    }),
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        // Always ask: with no network the service worker answers from the copy it keeps (see pwa.config.ts).
        networkMode: 'offlineFirst',
        retry: (failureCount, error) => (isApiError(error) && error.status >= 400 && error.status < 500 ? false : failureCount < 2),
        refetchOnWindowFocus: true,
      },
      mutations: { retry: false },
    },
  });
  return queryClient;
}
