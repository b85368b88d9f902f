import { useMutation, useQuery, useQueryClient, type UseMutationResult, type UseQueryResult } from '@tanstack/react-query';
import { z } from 'zod';

import { noticeListSchema, noticeResponseSchema, type Notice } from '@/shared/schemas';
import { apiRequest } from '@/features/api/client';
import { STALE } from '@/features/api/queryClient';

export const noticesKeys = {
  all: ['notices'] as const,
  list: () => [...noticesKeys.all, 'list'] as const,
};

export type NoticeList = z.infer<typeof noticeListSchema>;

/** The signed-in person's notices (runs that finished or failed), checked every half minute. */
export function useNotices(): UseQueryResult<NoticeList> {
  return useQuery({
    queryKey: noticesKeys.list(),
    queryFn: ({ signal }) => apiRequest('/notices', noticeListSchema, { signal }),
    staleTime: STALE.SECONDS.THIRTY,
    refetchInterval: 30_000,
  });
}

export function useMarkNoticeRead(): UseMutationResult<Notice, Error, number> {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (noticeId) => (await apiRequest(`/notices/${noticeId}/read`, noticeResponseSchema, { method: 'POST' })).notice,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: noticesKeys.all }),
  });
}
