import type { TeamSummary } from '@/shared/schemas';
import { useUiStore } from '@/features/ui/store';

import { useTeams } from './queries';

export type CurrentTeam = {
  teams: TeamSummary[];
  /** The chosen team, else the first one; null when the person is in no team. */
  team: TeamSummary | null;
  isPending: boolean;
  error: Error | null;
  refetch: () => void;
  selectTeam: (teamId: number) => void;
};

/** The team the app is showing, from the persisted choice and the teams the person belongs to. */
export function useCurrentTeam(): CurrentTeam {
  const teamsQuery = useTeams();
  const currentTeamId = useUiStore((state) => state.currentTeamId);
  const selectTeam = useUiStore((state) => state.selectTeam);
  const teams = teamsQuery.data ?? [];
  const team = teams.find((candidate) => candidate.id === currentTeamId) ?? teams[0] ?? null;
  return {
    teams,
    team,
    isPending: teamsQuery.isPending,
    error: teamsQuery.error,
    refetch: () => void teamsQuery.refetch(),
    selectTeam,
  };
}
