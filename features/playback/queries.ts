import { keepPreviousData, useQueries, useQuery, useQueryClient, type QueryClient, type UseQueryResult } from '@tanstack/react-query';
import { useEffect } from 'react';

import { runSummarySchema, type RunSummary } from '@/shared/schemas';
import { apiRequest } from '@/features/api/client';
import { ApiError } from '@/features/api/ApiError';

export const playbackKeys = {
  all: ['playback'] as const,
  summary: (runId: number) => [...playbackKeys.all, 'summary', runId] as const,
  frame: (runId: number, step: number) => [...playbackKeys.all, 'frame', runId, step] as const,
};

/** Frames on either side of the current step kept loaded ahead of playback. */
export const PREFETCH_STEPS = 5;

/** A finished run's results never change. */
const FOREVER = Number.POSITIVE_INFINITY;

/** A finished run's per-step summary over replicates (for useQuery or useQueries). */
export const summaryQuery = (runId: number) =>
  ({
    queryKey: playbackKeys.summary(runId),
    queryFn: ({ signal }: { signal?: AbortSignal }) => apiRequest(`/runs/${runId}/summary`, runSummarySchema, { signal }),
    staleTime: FOREVER,
  }) as const;

export function useRunSummary(runId: number): UseQueryResult<RunSummary> {
  return useQuery({ ...summaryQuery(runId), enabled: Number.isFinite(runId) });
}

/** The shown replicate's patch states at one step: one byte (state index) per patch. */
async function fetchFrame(runId: number, step: number, signal?: AbortSignal): Promise<Uint8Array> {
  const response = await fetch(`/api/v1/runs/${runId}/frames/${step}`, { credentials: 'same-origin', signal });
  if (!response.ok) throw new ApiError(response.status, 'http_error', `The map for step ${step} could not be loaded (${response.status}).`);
  return new Uint8Array(await response.arrayBuffer());
}

const frameQuery = (runId: number, step: number) =>
  ({ queryKey: playbackKeys.frame(runId, step), queryFn: ({ signal }: { signal?: AbortSignal }) => fetchFrame(runId, step, signal), staleTime: FOREVER }) as const;

/** The frame at `step`; while it loads, the previous one stays on screen. */
export function useFrame(runId: number, step: number, enabled: boolean): UseQueryResult<Uint8Array> {
  return useQuery({ ...frameQuery(runId, step), enabled, placeholderData: keepPreviousData });
}

function prefetchAround(client: QueryClient, runId: number, step: number, lastStep: number): void {
  for (let s = Math.max(0, step - PREFETCH_STEPS); s <= Math.min(lastStep, step + PREFETCH_STEPS); s++) {
    void client.prefetchQuery(frameQuery(runId, s));
  }
}

/** Keeps the frames within ±PREFETCH_STEPS of the current step loading. */
export function usePrefetchFrames(runId: number, step: number, lastStep: number, enabled: boolean): void {
  const client = useQueryClient();
  useEffect(() => {
    if (enabled) prefetchAround(client, runId, step, lastStep);
  }, [client, runId, step, lastStep, enabled]);
}

/** Frames a patch's history may load at once: steps × patches bytes. */
const HISTORY_BYTES_LIMIT = 64 * 1024 * 1024;

/**
 * Every frame of the run, for a selected patch's history; the cached ones at once, the rest
 * fetched on demand (only when the whole history is small enough to hold).
 */
export function useAllFrames(runId: number, lastStep: number, patchCount: number, enabled: boolean): (step: number) => Uint8Array | undefined {
  const client = useQueryClient();
  const loadAll = enabled && (lastStep + 1) * patchCount <= HISTORY_BYTES_LIMIT;
  const results = useQueries({
    queries: Array.from({ length: loadAll ? lastStep + 1 : 0 }, (_, step) => frameQuery(runId, step)),
  });
  return (step) => results[step]?.data ?? client.getQueryData<Uint8Array>(playbackKeys.frame(runId, step));
}
