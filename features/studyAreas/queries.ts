import { useMutation, useQuery, useQueryClient, type UseMutationResult, type UseQueryResult } from '@tanstack/react-query';
import { z } from 'zod';

import {
  boundaryPreviewSchema,
  coverMapInspectionSchema,
  coverStateSchema,
  patchGridResponseSchema,
  startCoverSummarySchema,
  studyAreaDetailSchema,
  studyAreaListSchema,
  studyAreaSummarySchema,
  type BoundaryPreview,
  type CoverMapInspection,
  type CoverState,
  type PatchGridResponse,
  type ProportionsStartCoverBody,
  type StartCoverSummary,
  type StudyAreaDetail,
  type StudyAreaSummary,
} from '@/shared/schemas';
import { apiRequest, apiSend } from '@/features/api/client';
import { STALE } from '@/features/api/queryClient';

import type { PickedFile } from './pickFile';

export const studyAreasKeys = {
  all: ['studyAreas'] as const,
  list: (teamId: number) => [...studyAreasKeys.all, 'list', teamId] as const,
  detail: (id: number) => [...studyAreasKeys.all, 'detail', id] as const,
  patches: (id: number) => [...studyAreasKeys.all, 'patches', id] as const,
  startCover: (id: number) => [...studyAreasKeys.all, 'startCover', id] as const,
};

const studyAreaResponse = z.object({ studyArea: studyAreaSummarySchema });
const detailResponse = z.object({ studyArea: studyAreaDetailSchema });
const statesResponse = z.object({ states: z.array(coverStateSchema) });
const startCoverResponse = z.object({ startCover: startCoverSummarySchema.nullable() });
const savedStartCoverResponse = z.object({ startCover: startCoverSummarySchema });

/** Multipart body: the file as `file`, then the text fields that have a value. */
function multipart(file: PickedFile, fields: Record<string, string | undefined>): FormData {
  const form = new FormData();
  form.append('file', file.blob, file.name);
  for (const [key, value] of Object.entries(fields)) {
    if (value !== undefined) form.append(key, value);
  }
  return form;
}

/** The study areas of one team, by name. */
export function useStudyAreas(teamId: number | undefined): UseQueryResult<StudyAreaSummary[]> {
  return useQuery({
    queryKey: studyAreasKeys.list(teamId ?? 0),
    queryFn: async ({ signal }) => (await apiRequest(`/teams/${teamId}/study-areas`, studyAreaListSchema, { signal })).studyAreas,
    enabled: teamId !== undefined,
    staleTime: STALE.SECONDS.THIRTY,
  });
}

export function useStudyArea(id: number): UseQueryResult<StudyAreaDetail> {
  return useQuery({
    queryKey: studyAreasKeys.detail(id),
    queryFn: async ({ signal }) => (await apiRequest(`/study-areas/${id}`, detailResponse, { signal })).studyArea,
    staleTime: STALE.SECONDS.THIRTY,
  });
}

/** The patch grid never changes after creation. */
export function usePatchGrid(id: number): UseQueryResult<PatchGridResponse> {
  return useQuery({
    queryKey: studyAreasKeys.patches(id),
    queryFn: ({ signal }) => apiRequest(`/study-areas/${id}/patches`, patchGridResponseSchema, { signal }),
    staleTime: STALE.MINUTES.FIVE,
  });
}

export function useStartCover(id: number): UseQueryResult<StartCoverSummary | null> {
  return useQuery({
    queryKey: studyAreasKeys.startCover(id),
    queryFn: async ({ signal }) => (await apiRequest(`/study-areas/${id}/start-cover`, startCoverResponse, { signal })).startCover,
    staleTime: STALE.SECONDS.THIRTY,
  });
}

export type PreviewRequest = { file: PickedFile; pickProperty?: string; pickValue?: string };

/** Reads and validates a boundary file on the server; nothing is saved. */
export function usePreviewBoundary(teamId: number): UseMutationResult<BoundaryPreview, Error, PreviewRequest> {
  return useMutation({
    mutationFn: ({ file, ...pick }) =>
      apiRequest(`/teams/${teamId}/study-areas/preview`, boundaryPreviewSchema, { method: 'POST', body: multipart(file, pick) }),
  });
}

export type CreateStudyAreaRequest = {
  file: PickedFile;
  name: string;
  description: string;
  cellSize: number;
  minFraction: number;
  pickProperty?: string;
  pickValue?: string;
  states: CoverState[];
};

export function useCreateStudyArea(teamId: number): UseMutationResult<StudyAreaSummary, Error, CreateStudyAreaRequest> {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: async ({ file, cellSize, minFraction, states, ...text }) => {
      const body = multipart(file, { ...text, cellSize: String(cellSize), minFraction: String(minFraction), states: JSON.stringify(states) });
      return (await apiRequest(`/teams/${teamId}/study-areas`, studyAreaResponse, { method: 'POST', body })).studyArea;
    },
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: studyAreasKeys.list(teamId) }),
  });
}

/**
 * Any change to one study area refreshes everything cached about study areas (its detail, its
 * start cover and the team's list all show what changed).
 */
function useStudyAreaChange<V, R>(send: (variables: V) => Promise<R>): UseMutationResult<R, Error, V> {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: () => void queryClient.invalidateQueries({ queryKey: studyAreasKeys.all }),
  });
}

export type RenameStudyAreaBody = { name?: string; description?: string };

export const useRenameStudyArea = (id: number): UseMutationResult<StudyAreaDetail, Error, RenameStudyAreaBody> =>
  useStudyAreaChange(async (body: RenameStudyAreaBody) => (await apiRequest(`/study-areas/${id}`, detailResponse, { method: 'PATCH', body })).studyArea);

export function useDeleteStudyArea(id: number): UseMutationResult<void, Error, void> {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => apiSend(`/study-areas/${id}`, { method: 'DELETE' }),
    onSuccess: () => {
      queryClient.removeQueries({ queryKey: studyAreasKeys.detail(id) });
      void queryClient.invalidateQueries({ queryKey: studyAreasKeys.all });
    },
  });
}

export const useSaveCoverStates = (id: number): UseMutationResult<CoverState[], Error, CoverState[]> =>
  useStudyAreaChange(async (states: CoverState[]) => (await apiRequest(`/study-areas/${id}/states`, statesResponse, { method: 'PUT', body: { states } })).states);

export const useSaveProportions = (id: number): UseMutationResult<StartCoverSummary, Error, ProportionsStartCoverBody> =>
  useStudyAreaChange(
    async (body: ProportionsStartCoverBody) => (await apiRequest(`/study-areas/${id}/start-cover`, savedStartCoverResponse, { method: 'PUT', body })).startCover,
  );

/** Reads a cover map's attribute names and values, for the mapping step; nothing is saved. */
export function useInspectCoverMap(id: number): UseMutationResult<CoverMapInspection, Error, PickedFile> {
  return useMutation({
    mutationFn: (file: PickedFile) =>
      apiRequest(`/study-areas/${id}/start-cover/map/inspect`, coverMapInspectionSchema, { method: 'POST', body: multipart(file, {}) }),
  });
}

export type CoverMapRequest = { file: PickedFile; property: string; mapping: Record<string, string>; fallback?: string };

export const useSaveCoverMap = (id: number): UseMutationResult<StartCoverSummary, Error, CoverMapRequest> =>
  useStudyAreaChange(async ({ file, property, mapping, fallback }: CoverMapRequest) => {
    const body = multipart(file, { property, mapping: JSON.stringify(mapping), fallback });
    return (await apiRequest(`/study-areas/${id}/start-cover/map`, savedStartCoverResponse, { method: 'POST', body })).startCover;
  });
