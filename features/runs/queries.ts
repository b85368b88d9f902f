import { useMutation, useQuery, useQueryClient, type UseMutationResult, type UseQueryResult } from '@tanstack/react-query';

import { ACTIVE_RUN_STATUSES, runListSchema, runResponseSchema, type Run, type StartRunBody } from '@/shared/schemas';
import { apiRequest } from '@/features/api/client';
import { STALE } from '@/features/api/queryClient';

export const runsKeys = {
  all: ['runs'] as const,
  list: (studyAreaId: number) => [...runsKeys.all, 'list', studyAreaId] as const,
  detail: (runId: number) => [...runsKeys.all, 'detail', runId] as const,
};

/** How often a screen asks again while a run it shows is queued, running or merging. */
export const ACTIVE_POLL_MS = 2_000;

export const isActive = (run: Run): boolean => ACTIVE_RUN_STATUSES.includes(run.status);

/** The runs of one study area, newest first; polls while any of them is active. */
export function useStudyAreaRuns(studyAreaId: number): UseQueryResult<Run[]> {
  return useQuery({
    queryKey: runsKeys.list(studyAreaId),
    queryFn: async ({ signal }) => (await apiRequest(`/study-areas/${studyAreaId}/runs`, runListSchema, { signal })).runs,
    enabled: Number.isFinite(studyAreaId),
    staleTime: STALE.SECONDS.FIFTEEN,
    refetchInterval: (query) => (query.state.data?.some(isActive) ? ACTIVE_POLL_MS : false),
  });
}

/** One run; polls while it is active. */
export function useRun(runId: number): UseQueryResult<Run> {
  return useQuery({
    queryKey: runsKeys.detail(runId),
    queryFn: async ({ signal }) => (await apiRequest(`/runs/${runId}`, runResponseSchema, { signal })).run,
    enabled: Number.isFinite(runId),
    staleTime: STALE.SECONDS.FIFTEEN,
    refetchInterval: (query) => (query.state.data && isActive(query.state.data) ? ACTIVE_POLL_MS : false),
  });
}

/** Any change to a run refreshes it and its study area's list. */
function useRunChange<V>(send: (variables: V) => Promise<Run>): UseMutationResult<Run, Error, V> {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: (run) => {
      queryClient.setQueryData(runsKeys.detail(run.id), run);
      void queryClient.invalidateQueries({ queryKey: runsKeys.list(run.studyAreaId) });
    },
  });
}

export function useStartRun(scenarioId: number): UseMutationResult<Run, Error, StartRunBody> {
  return useRunChange(async (body: StartRunBody) => (await apiRequest(`/scenarios/${scenarioId}/runs`, runResponseSchema, { method: 'POST', body })).run);
}

export function useCancelRun(runId: number): UseMutationResult<Run, Error, void> {
  return useRunChange(async () => (await apiRequest(`/runs/${runId}/cancel`, runResponseSchema, { method: 'POST' })).run);
}

export function useRetryRun(runId: number): UseMutationResult<Run, Error, void> {
  return useRunChange(async () => (await apiRequest(`/runs/${runId}/retry`, runResponseSchema, { method: 'POST' })).run);
}
