import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { ButtonLink } from '@/components/ButtonLink';
import { EmptyState } from '@/components/EmptyState';
import { Heading } from '@/components/Heading';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import { space } from '@/components/theme';
import type { TeamSummary } from '@/shared/schemas';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { DemoNotice } from '@/features/teams/DemoNotice';
import { UnreadNotices } from '@/features/notices/UnreadNotices';
import { RoleBadge } from '@/features/teams/RoleBadge';
import { TeamSwitcher } from '@/features/teams/TeamSwitcher';
import { useCurrentTeam, type CurrentTeam } from '@/features/teams/useCurrentTeam';

import { StudyAreaCard } from './StudyAreaCard';
import { useStudyAreas } from './queries';
import { canEdit } from './roles';
import { useAreaUnit } from './useAreaUnit';

type TeamStudyAreasProps = { team: TeamSummary };

function TeamStudyAreas({ team }: TeamStudyAreasProps): ReactElement {
  const studyAreas = useStudyAreas(team.id);
  const unit = useAreaUnit();
  if (studyAreas.isPending) return <LoadingState label="Loading study areas…" />;
  if (studyAreas.error) return <QueryErrorState what="the study areas" error={studyAreas.error} onRetry={() => void studyAreas.refetch()} />;
  if (studyAreas.data.length === 0) {
    return (
      <EmptyState title="No study areas yet">
        {`Import a boundary (GeoJSON, zipped shapefile or KML), lay an equal-area patch grid over it and define its cover states. Every study area of ${team.name} will be listed on this page.`}
      </EmptyState>
    );
  }
  return (
    <View style={styles.list}>
      {studyAreas.data.map((studyArea) => (
        <StudyAreaCard key={studyArea.id} studyArea={studyArea} unit={unit} />
      ))}
    </View>
  );
}

type StudyAreaListBodyProps = { current: CurrentTeam };

function StudyAreaListBody({ current }: StudyAreaListBodyProps): ReactElement {
  if (current.isPending) return <LoadingState label="Loading your teams…" />;
  if (current.error) return <QueryErrorState what="your teams" error={current.error} onRetry={current.refetch} />;
  const { team } = current;
  if (!team) {
    return (
      <EmptyState title="You are not in a team yet" action={<TextLink href="/team">Create a team</TextLink>}>
        Study areas belong to a team. Create one, or accept an invitation from a colleague.
      </EmptyState>
    );
  }
  return (
    <>
      <View style={styles.teamLine}>
        <Text tone="muted" style={styles.teamName}>
          {team.name}
        </Text>
        <RoleBadge role={team.role} />
      </View>
      <TeamSwitcher current={current} />
      <DemoNotice team={team} />
      <TeamStudyAreas key={team.id} team={team} />
    </>
  );
}

export function StudyAreaListScreen(): ReactElement {
  const current = useCurrentTeam();
  return (
    <Screen title="Study areas">
      <View style={styles.titleLine}>
        <Heading level={1}>Study areas</Heading>
        {canEdit(current.team?.role) ? <ButtonLink href="/study-areas/new" label="New study area" size="sm" /> : null}
      </View>
      <UnreadNotices />
      <StudyAreaListBody current={current} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  titleLine: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', flexWrap: 'wrap', gap: space.sm },
  teamLine: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.sm, marginTop: -space.sm },
  teamName: { flexShrink: 1 },
  list: { gap: space.md },
});
