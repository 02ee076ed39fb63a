import { MutationCache, QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-error';

/**
 * One QueryClient for the app. Queries show their own error state in the view; failed mutations
 * are toasted by the API client, so the cache adds nothing there. A 4xx is never retried: the
 * answer will not change.
 */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        retry: (failureCount, error) =>
          !(error instanceof ApiError && error.statusCode < 500) && failureCount < 2,
      },
      mutations: { retry: false },
    },
    mutationCache: new MutationCache(),
  });
}

export const queryClient = createQueryClient();
