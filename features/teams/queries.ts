import { useMutation, useQuery, useQueryClient, type UseMutationResult, type UseQueryResult } from '@tanstack/react-query';
import { z } from 'zod';

import {
  auditLogSchema,
  type AuditEventView,
  invitationSchema,
  memberSchema,
  teamDetailSchema,
  teamListSchema,
  teamSummarySchema,
  type Invitation,
  type InviteBody,
  type Member,
  type MemberChangeBody,
  type TeamBody,
  type TeamDetail,
  type TeamSummary,
} from '@/shared/schemas';
import { apiRequest, apiSend } from '@/features/api/client';
import { STALE } from '@/features/api/queryClient';
import { useUiStore } from '@/features/ui/store';

export const teamsKeys = {
  all: ['teams'] as const,
  list: () => [...teamsKeys.all, 'list'] as const,
  detail: (teamId: number) => [...teamsKeys.all, 'detail', teamId] as const,
  audit: (teamId: number) => [...teamsKeys.all, 'audit', teamId] as const,
};

const teamResponse = z.object({ team: teamSummarySchema });
const invitationResponse = z.object({ invitation: invitationSchema });
const memberResponse = z.object({ member: memberSchema });

/** The teams the signed-in person belongs to, with their role in each. */
export function useTeams(): UseQueryResult<TeamSummary[]> {
  return useQuery({
    queryKey: teamsKeys.list(),
    queryFn: async ({ signal }) => (await apiRequest('/teams', teamListSchema, { signal })).teams,
    staleTime: STALE.MINUTES.ONE,
  });
}

/** Members and (for owners) pending invitations of one team. */
export function useTeam(teamId: number | undefined): UseQueryResult<TeamDetail> {
  return useQuery({
    queryKey: teamsKeys.detail(teamId ?? 0),
    queryFn: ({ signal }) => apiRequest(`/teams/${teamId}`, teamDetailSchema, { signal }),
    enabled: teamId !== undefined,
    staleTime: STALE.SECONDS.THIRTY,
  });
}

/** Owners only: membership, role and deletion events, newest first. */
export function useAuditLog(teamId: number, enabled: boolean): UseQueryResult<AuditEventView[]> {
  return useQuery({
    queryKey: teamsKeys.audit(teamId),
    queryFn: async ({ signal }) => (await apiRequest(`/teams/${teamId}/audit`, auditLogSchema, { signal })).events,
    enabled,
    staleTime: STALE.SECONDS.THIRTY,
  });
}

export function useCreateTeam(): UseMutationResult<TeamSummary, Error, TeamBody> {
  const queryClient = useQueryClient();
  const selectTeam = useUiStore((state) => state.selectTeam);
  return useMutation({
    mutationFn: async (body) => (await apiRequest('/teams', teamResponse, { method: 'POST', body })).team,
    onSuccess: (team) => {
      selectTeam(team.id);
      void queryClient.invalidateQueries({ queryKey: teamsKeys.all });
    },
  });
}

/** Any change inside one team refreshes that team and the list (names and roles show in both). */
function useTeamChange<V, R>(send: (variables: V) => Promise<R>, after?: (result: R) => void): UseMutationResult<R, Error, V> {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: send,
    onSuccess: (result) => {
      after?.(result);
      void queryClient.invalidateQueries({ queryKey: teamsKeys.all });
    },
  });
}

export const useRenameTeam = (teamId: number): UseMutationResult<TeamSummary, Error, TeamBody> =>
  useTeamChange(async (body: TeamBody) => (await apiRequest(`/teams/${teamId}`, teamResponse, { method: 'PATCH', body })).team);

export const useInvite = (teamId: number): UseMutationResult<Invitation, Error, InviteBody> =>
  useTeamChange(
    async (body: InviteBody) => (await apiRequest(`/teams/${teamId}/invitations`, invitationResponse, { method: 'POST', body })).invitation,
  );

export const useCancelInvitation = (teamId: number): UseMutationResult<void, Error, number> =>
  useTeamChange((invitationId: number) => apiSend(`/teams/${teamId}/invitations/${invitationId}`, { method: 'DELETE' }));

export type MemberChange = { userId: number; change: MemberChangeBody };

export const useChangeMember = (teamId: number): UseMutationResult<Member, Error, MemberChange> =>
  useTeamChange(
    async ({ userId, change }: MemberChange) =>
      (await apiRequest(`/teams/${teamId}/members/${userId}`, memberResponse, { method: 'PATCH', body: change })).member,
  );

/** Removes a member, or yourself (leaving); after leaving, the current team falls back to the first. */
export function useRemoveMember(teamId: number, selfId: number): UseMutationResult<number, Error, number> {
  const queryClient = useQueryClient();
  const selectTeam = useUiStore((state) => state.selectTeam);
  return useTeamChange(
    async (userId: number) => {
      await apiSend(`/teams/${teamId}/members/${userId}`, { method: 'DELETE' });
      return userId;
    },
    (userId) => {
      if (userId !== selfId) return;
      selectTeam(null);
      queryClient.removeQueries({ queryKey: teamsKeys.detail(teamId) });
    },
  );
}
