import { useQueries, useQuery, type UseQueryResult } from '@tanstack/react-query';

import { runSummarySchema, type RunSummary } from '@/shared/schemas';
import { ApiError } from '@/features/api/ApiError';
import { apiRequest } from '@/features/api/client';
import { STALE } from '@/features/api/queryClient';

export const reportKeys = {
  all: ['reports'] as const,
  summary: (runId: number) => [...reportKeys.all, 'summary', runId] as const,
  frame: (runId: number, step: number) => [...reportKeys.all, 'frame', runId, step] as const,
};

/** A finished run's summary never changes. */
export function useRunSummary(runId: number, enabled: boolean): UseQueryResult<RunSummary> {
  return useQuery({
    queryKey: reportKeys.summary(runId),
    queryFn: ({ signal }) => apiRequest(`/runs/${runId}/summary`, runSummarySchema, { signal }),
    enabled: enabled && Number.isFinite(runId),
    staleTime: Infinity,
  });
}

/** Patch states (one byte per patch) of the shown replicate at `step`. */
async function fetchFrame(runId: number, step: number, signal: AbortSignal): Promise<Uint8Array> {
  const response = await fetch(`/api/v1/runs/${runId}/frames/${step}`, { credentials: 'same-origin', signal });
  if (!response.ok) throw new ApiError(response.status, 'http_error', `The map of step ${step} could not be loaded (the server answered ${response.status}).`);
  return new Uint8Array(await response.arrayBuffer());
}

export function useRunFrames(runId: number, steps: readonly number[], enabled: boolean): UseQueryResult<Uint8Array>[] {
  return useQueries({
    queries: steps.map((step) => ({
      queryKey: reportKeys.frame(runId, step),
      queryFn: ({ signal }: { signal: AbortSignal }) => fetchFrame(runId, step, signal),
      enabled,
      staleTime: STALE.MINUTES.FIVE,
    })),
  });
}
