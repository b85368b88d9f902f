import { keepPreviousData, useMutation, useQuery, useQueryClient, type UseMutationResult, type UseQueryResult } from '@tanstack/react-query';

import {
  scenarioAnalysisSchema,
  scenarioListSchema,
  scenarioResponseSchema,
  scenarioUncertaintySchema,
  type ScenarioAnalysis,
  type ScenarioBody,
  type ScenarioDetail,
  type ScenarioSummary,
  type ScenarioUncertainty,
} from '@/shared/schemas';
import { apiRequest, apiSend } from '@/features/api/client';
import { STALE } from '@/features/api/queryClient';

export const scenariosKeys = {
  all: ['scenarios'] as const,
  list: (studyAreaId: number) => [...scenariosKeys.all, 'list', studyAreaId] as const,
  detail: (id: number) => [...scenariosKeys.all, 'detail', id] as const,
  analysis: (id: number, steps: number) => [...scenariosKeys.all, 'analysis', id, steps] as const,
  uncertainty: (id: number) => [...scenariosKeys.all, 'uncertainty', id] as const,
};

/** The scenarios of one study area, newest change first as the server orders them. */
export function useScenarios(studyAreaId: number): UseQueryResult<ScenarioSummary[]> {
  return useQuery({
    queryKey: scenariosKeys.list(studyAreaId),
    queryFn: async ({ signal }) => (await apiRequest(`/study-areas/${studyAreaId}/scenarios`, scenarioListSchema, { signal })).scenarios,
    staleTime: STALE.SECONDS.THIRTY,
  });
}

export function useScenario(id: number): UseQueryResult<ScenarioDetail> {
  return useQuery({
    queryKey: scenariosKeys.detail(id),
    queryFn: async ({ signal }) => (await apiRequest(`/scenarios/${id}`, scenarioResponseSchema, { signal })).scenario,
    staleTime: STALE.SECONDS.THIRTY,
  });
}

/** The server's analysis of the saved scenario (the same engine as the live preview). */
export function useScenarioAnalysis(id: number, steps: number, enabled: boolean): UseQueryResult<ScenarioAnalysis> {
  return useQuery({
    queryKey: scenariosKeys.analysis(id, steps),
    queryFn: ({ signal }) => apiRequest(`/scenarios/${id}/analysis?steps=${steps}`, scenarioAnalysisSchema, { signal }),
    enabled,
    staleTime: STALE.MINUTES.ONE,
    placeholderData: keepPreviousData,
  });
}

/** Dirichlet draws of the long-run shares for phases estimated from surveys (fixed seed: stable ranges). */
export function useScenarioUncertainty(id: number, enabled: boolean): UseQueryResult<ScenarioUncertainty> {
  return useQuery({
    queryKey: scenariosKeys.uncertainty(id),
    queryFn: ({ signal }) => apiRequest(`/scenarios/${id}/uncertainty?draws=1000&seed=patchcast`, scenarioUncertaintySchema, { signal }),
    enabled,
    staleTime: STALE.MINUTES.FIVE,
  });
}

/** A change to a scenario refreshes everything cached about scenarios (lists, details, analyses). */
function useScenarioChange<V, R>(send: (variables: V) => Promise<R>): UseMutationResult<R, Error, V> {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: scenariosKeys.all }),
  });
}

export const useCreateScenario = (studyAreaId: number): UseMutationResult<ScenarioDetail, Error, ScenarioBody> =>
  useScenarioChange(
    async (body: ScenarioBody) => (await apiRequest(`/study-areas/${studyAreaId}/scenarios`, scenarioResponseSchema, { method: 'POST', body })).scenario,
  );

export const useSaveScenario = (id: number): UseMutationResult<ScenarioDetail, Error, ScenarioBody> =>
  useScenarioChange(async (body: ScenarioBody) => (await apiRequest(`/scenarios/${id}`, scenarioResponseSchema, { method: 'PUT', body })).scenario);

export const useDuplicateScenario = (): UseMutationResult<ScenarioDetail, Error, number> =>
  useScenarioChange(async (id: number) => (await apiRequest(`/scenarios/${id}/duplicate`, scenarioResponseSchema, { method: 'POST', body: {} })).scenario);

export const useDeleteScenario = (): UseMutationResult<void, Error, number> =>
  useScenarioChange((id: number) => apiSend(`/scenarios/${id}`, { method: 'DELETE' }));

export type UseSurveyRequest = { scenarioId: number; phaseIndex: number; surveyId: number };

/** "Use this estimate": the server copies the survey's matrix into the phase and keeps the link. */
export const useApplySurveyEstimate = (): UseMutationResult<ScenarioDetail, Error, UseSurveyRequest> =>
  useScenarioChange(
    async ({ scenarioId, phaseIndex, surveyId }: UseSurveyRequest) =>
      (await apiRequest(`/scenarios/${scenarioId}/phases/${phaseIndex}/use-survey`, scenarioResponseSchema, { method: 'POST', body: { surveyId } })).scenario,
  );
