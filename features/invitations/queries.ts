import { useMutation, useQuery, useQueryClient, type UseMutationResult, type UseQueryResult } from '@tanstack/react-query';

import { acceptInvitationResponseSchema, invitationPreviewSchema, type InvitationPreview, type TeamSummary } from '@/shared/schemas';
import { apiRequest } from '@/features/api/client';
import { STALE } from '@/features/api/queryClient';
import { teamsKeys } from '@/features/teams/queries';
import { useUiStore } from '@/features/ui/store';

export const invitationKeys = {
  all: ['invitations'] as const,
  preview: (token: string) => [...invitationKeys.all, 'preview', token] as const,
};

const tokenPath = (token: string): string => `/invitations/${encodeURIComponent(token)}`;

/** What an invitation link offers; needs no sign-in. */
export function useInvitationPreview(token: string | undefined): UseQueryResult<InvitationPreview> {
  return useQuery({
    queryKey: invitationKeys.preview(token ?? ''),
    queryFn: ({ signal }) => apiRequest(tokenPath(token ?? ''), invitationPreviewSchema, { signal }),
    enabled: Boolean(token),
    staleTime: STALE.MINUTES.FIVE,
  });
}

/** Joins the team; it becomes the current team. */
export function useAcceptInvitation(token: string): UseMutationResult<TeamSummary, Error, void> {
  const queryClient = useQueryClient();
  const selectTeam = useUiStore((state) => state.selectTeam);
  return useMutation({
    mutationFn: async () =>
      (await apiRequest(`${tokenPath(token)}/accept`, acceptInvitationResponseSchema, { method: 'POST' })).team,
    onSuccess: (team) => {
      selectTeam(team.id);
      void queryClient.invalidateQueries({ queryKey: teamsKeys.all });
    },
  });
}
