import type { AreaUnit, Role, StudyAreaDetail } from '@/shared/schemas';
import { useStartCover, useStudyArea } from '@/features/studyAreas/queries';
import { useAreaUnit } from '@/features/studyAreas/useAreaUnit';
import { useTeams } from '@/features/teams/queries';

export type StudyAreaContext = {
  studyArea: StudyAreaDetail | undefined;
  /** The study area's start shares per state (area-weighted), null when it has no start cover. */
  startShares: number[] | null;
  role: Role | undefined;
  unit: AreaUnit;
  isPending: boolean;
  error: Error | null;
  refetch: () => void;
};

/** What every scenario and survey screen needs about its study area: states, area, start cover, the person's role and unit. */
export function useStudyAreaContext(studyAreaId: number): StudyAreaContext {
  const studyArea = useStudyArea(studyAreaId);
  const startCover = useStartCover(studyAreaId);
  const teams = useTeams();
  const unit = useAreaUnit();
  const areas = startCover.data?.areaM2;
  const total = areas?.reduce((sum, area) => sum + area, 0) ?? 0;
  return {
    studyArea: studyArea.data,
    startShares: areas && total > 0 ? areas.map((area) => area / total) : null,
    role: teams.data?.find((team) => team.id === studyArea.data?.teamId)?.role,
    unit,
    isPending: studyArea.isPending || teams.isPending,
    error: studyArea.error ?? teams.error,
    refetch: () => void studyArea.refetch(),
  };
}
