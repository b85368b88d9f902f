import { MutationCache, QueryCache, QueryClient } from '@tanstack/react-query';

import { ApiError, isApiError } from './ApiError';

/** Shared staleness constants: pick one per query instead of inventing numbers. */
export const STALE = {
  SECONDS: { FIFTEEN: 15_000, THIRTY: 30_000 },
  MINUTES: { ONE: 60_000, FIVE: 5 * 60_000 },
} as const;

/** Retry network trouble and 5xx twice; a 4xx answer will not change by asking again. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status < 500) return false;
  return failureCount < 2;
}

export type QueryClientOptions = {
  /** Called when any request answers 401: the session has ended (expired, signed out elsewhere). */
  onUnauthorized?: (client: QueryClient) => void;
};

export function createQueryClient({ onUnauthorized }: QueryClientOptions = {}): QueryClient {
  const onError = (error: unknown): void => {
    if (isApiError(error, 401)) onUnauthorized?.(client);
  };
  const client: QueryClient = new QueryClient({
    queryCache: new QueryCache({ onError }),
    mutationCache: new MutationCache({ onError }),
    defaultOptions: {
      queries: { staleTime: STALE.SECONDS.THIRTY, retry: shouldRetry },
      mutations: { retry: false },
    },
  });
  return client;
}
