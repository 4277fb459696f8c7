import { QueryClient } from '@tanstack/react-query';
import { isApiError } from './api-client';

/** Builds the app's query client: no retries for answers that will not change on retry (4xx). */
export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: {
        // Run the request even when the browser says it is offline: kept lists answer from the device
        // (offline-reads.ts) and everything else fails at once with a clear message instead of waiting.
        networkMode: 'always',
        staleTime: 30_000,
        refetchOnWindowFocus: false,
        retry: (failureCount, error) => {
          if (isApiError(error) && error.statusCode >= 400 && error.statusCode < 500) return false;
          return failureCount < 2;
        },
      },
      mutations: { retry: false, networkMode: 'always' },
    },
  });
}
