import { useQuery, type UseQueryResult } from '@tanstack/react-query';

import { outboxResponseSchema, type CaughtMail } from '@/shared/schemas';
import { isApiError } from '@/features/api/ApiError';
import { apiRequest } from '@/features/api/client';
import { STALE } from '@/features/api/queryClient';

export const outboxKeys = {
  all: ['outbox'] as const,
  messages: () => [...outboxKeys.all, 'messages'] as const,
};

/** Mail caught by the development SMTP catcher, newest first; null when the server has no outbox (404). */
export function useOutbox({ poll = false }: { poll?: boolean } = {}): UseQueryResult<CaughtMail[] | null> {
  return useQuery({
    queryKey: outboxKeys.messages(),
    queryFn: async ({ signal }) => {
      try {
        const { messages } = await apiRequest('/dev/outbox', outboxResponseSchema, { signal });
        return [...messages].sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
      } catch (error) {
        if (isApiError(error, 404)) return null;
        throw error;
      }
    },
    staleTime: STALE.SECONDS.FIFTEEN,
    refetchInterval: poll ? STALE.SECONDS.FIFTEEN / 3 : false,
  });
}

/** Whether to offer the Outbox in the navigation: only once the server has shown it has one. */
export function useOutboxAvailable(): boolean {
  const outbox = useOutbox();
  return Array.isArray(outbox.data);
}
