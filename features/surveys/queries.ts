import { useMutation, useQuery, useQueryClient, type UseMutationResult, type UseQueryResult } from '@tanstack/react-query';

import {
  surveyInspectionSchema,
  surveyListSchema,
  surveyResponseSchema,
  type StateMapping,
  type SurveyDetail,
  type SurveyInspection,
  type SurveySummary,
} from '@/shared/schemas';
import { apiRequest } from '@/features/api/client';
import { STALE } from '@/features/api/queryClient';

import type { PickedTextFile } from '../scenarios/pickTextFile';

export const surveysKeys = {
  all: ['surveys'] as const,
  list: (studyAreaId: number) => [...surveysKeys.all, 'list', studyAreaId] as const,
  detail: (id: number) => [...surveysKeys.all, 'detail', id] as const,
};

function csvForm(file: PickedTextFile, fields: Record<string, string>): FormData {
  const form = new FormData();
  form.append('file', new Blob([file.text], { type: 'text/csv' }), file.name);
  for (const [key, value] of Object.entries(fields)) form.append(key, value);
  return form;
}

export function useSurveys(studyAreaId: number): UseQueryResult<SurveySummary[]> {
  return useQuery({
    queryKey: surveysKeys.list(studyAreaId),
    queryFn: async ({ signal }) => (await apiRequest(`/study-areas/${studyAreaId}/surveys`, surveyListSchema, { signal })).surveys,
    staleTime: STALE.SECONDS.THIRTY,
  });
}

export function useSurvey(id: number): UseQueryResult<SurveyDetail> {
  return useQuery({
    queryKey: surveysKeys.detail(id),
    queryFn: async ({ signal }) => (await apiRequest(`/surveys/${id}`, surveyResponseSchema, { signal })).survey,
    staleTime: STALE.MINUTES.ONE,
  });
}

/** Reads the file's columns and labels for the mapping steps; nothing is saved. */
export function useInspectSurvey(studyAreaId: number): UseMutationResult<SurveyInspection, Error, PickedTextFile> {
  return useMutation({
    mutationFn: (file) => apiRequest(`/study-areas/${studyAreaId}/surveys/inspect`, surveyInspectionSchema, { method: 'POST', body: csvForm(file, {}) }),
  });
}

export type CreateSurveyRequest = {
  file: PickedTextFile;
  name: string;
  columns: { plot: string; time: string; state: string };
  mapping: StateMapping;
  timeStep: string;
};

export function useCreateSurvey(studyAreaId: number): UseMutationResult<SurveyDetail, Error, CreateSurveyRequest> {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ file, name, columns, mapping, timeStep }) => {
      const body = csvForm(file, {
        name,
        plotColumn: columns.plot,
        timeColumn: columns.time,
        stateColumn: columns.state,
        mapping: JSON.stringify(mapping),
        timeStep,
      });
      return (await apiRequest(`/study-areas/${studyAreaId}/surveys`, surveyResponseSchema, { method: 'POST', body })).survey;
    },
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: surveysKeys.all }),
  });
}
