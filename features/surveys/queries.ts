import { useMutation, useQuery, useQueryClient, type UseMutationResult, type UseQueryResult } from '@tanstack/react-query';

import {
  mapPairInspectionSchema,
  surveyInspectionSchema,
  surveyListSchema,
  surveyResponseSchema,
  type MapPairInspection,
  type StateMapping,
  type SurveyDetail,
  type SurveyInspection,
  type SurveySummary,
} from '@/shared/schemas';
import { apiRequest } from '@/features/api/client';
import { STALE } from '@/features/api/queryClient';

import type { PickedFile } from '@/features/studyAreas/pickFile';

import type { PickedTextFile } from '../scenarios/pickTextFile';

export const surveysKeys = {
  all: ['surveys'] as const,
  list: (studyAreaId: number) => [...surveysKeys.all, 'list', studyAreaId] as const,
  detail: (id: number) => [...surveysKeys.all, 'detail', id] as const,
};

function multipartForm(files: Record<string, PickedFile>, fields: Record<string, string>): FormData {
  const form = new FormData();
  for (const [key, file] of Object.entries(files)) form.append(key, file.blob, file.name);
  for (const [key, value] of Object.entries(fields)) form.append(key, value);
  return form;
}

const csvForm = (file: PickedTextFile, fields: Record<string, string>): FormData =>
  multipartForm({ file: { name: file.name, size: file.text.length, blob: new Blob([file.text], { type: 'text/csv' }) } }, fields);

/** The two dated cover maps of a map-pair survey, as the server names the form fields. */
export type MapPairFiles = { earlier: PickedFile; later: PickedFile };

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

/** POSTs a survey upload and refreshes the survey lists. */
function useSurveyUpload<T>(path: string, toForm: (request: T) => FormData): UseMutationResult<SurveyDetail, Error, T> {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async (request) => (await apiRequest(path, surveyResponseSchema, { method: 'POST', body: toForm(request) })).survey,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: surveysKeys.all }),
  });
}

export function useCreateSurvey(studyAreaId: number): UseMutationResult<SurveyDetail, Error, CreateSurveyRequest> {
  return useSurveyUpload(`/study-areas/${studyAreaId}/surveys`, ({ file, name, columns, mapping, timeStep }) =>
    csvForm(file, {
        name,
        plotColumn: columns.plot,
        timeColumn: columns.time,
        stateColumn: columns.state,
      mapping: JSON.stringify(mapping),
      timeStep,
    }),
  );
}

/** Reads both maps' attributes and values for the mapping step; nothing is saved. */
export function useInspectMapPair(studyAreaId: number): UseMutationResult<MapPairInspection, Error, MapPairFiles> {
  return useMutation({
    mutationFn: (files) =>
      apiRequest(`/study-areas/${studyAreaId}/surveys/map-pair/inspect`, mapPairInspectionSchema, { method: 'POST', body: multipartForm(files, {}) }),
  });
}

export type CreateMapPairRequest = {
  files: MapPairFiles;
  name: string;
  property: string;
  mapping: StateMapping;
  earlierDate: string;
  laterDate: string;
};

export function useCreateMapPairSurvey(studyAreaId: number): UseMutationResult<SurveyDetail, Error, CreateMapPairRequest> {
  return useSurveyUpload(`/study-areas/${studyAreaId}/surveys/map-pair`, ({ files, name, property, mapping, earlierDate, laterDate }) =>
    multipartForm(files, { name, property, mapping: JSON.stringify(mapping), earlierDate, laterDate }),
  );
}
