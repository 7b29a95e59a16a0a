import { QueryClient } from '@tanstack/react-query';
import { ApiError } from './api-client.ts';

/** Retries only what may pass on a second try: no answer, or a server-side failure. */
export function createQueryClient() {
  return new QueryClient({
    defaultOptions: {
      queries: {
        staleTime: 30_000,
        retry: (failureCount, error) =>
          failureCount < 2 &&
          (!(error instanceof ApiError) || error.status === 0 || error.status >= 500),
      },
    },
  });
}
