import { QueryClient } from '@tanstack/react-query';

import { ApiError } from './ApiError';

/** Shared staleness constants: pick one per query instead of inventing numbers. */
export const STALE = {
  SECONDS: { FIFTEEN: 15_000, THIRTY: 30_000 },
  MINUTES: { ONE: 60_000, FIVE: 5 * 60_000 },
  INFINITY: Infinity,
} as const;

/** Retry network trouble and 5xx twice; a 4xx answer will not change by asking again. */
function shouldRetry(failureCount: number, error: unknown): boolean {
  if (error instanceof ApiError && error.status < 500) return false;
  return failureCount < 2;
}

export function createQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: {
      queries: { staleTime: STALE.SECONDS.THIRTY, retry: shouldRetry },
      mutations: { retry: false },
    },
  });
}
