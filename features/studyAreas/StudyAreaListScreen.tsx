import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { EmptyState } from '@/components/EmptyState';
import { Heading } from '@/components/Heading';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import { space } from '@/components/theme';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { DemoNotice } from '@/features/teams/DemoNotice';
import { RoleBadge } from '@/features/teams/RoleBadge';
import { TeamSwitcher } from '@/features/teams/TeamSwitcher';
import { useCurrentTeam, type CurrentTeam } from '@/features/teams/useCurrentTeam';

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
        <Text tone="muted">{team.name}</Text>
        <RoleBadge role={team.role} />
      </View>
      <TeamSwitcher current={current} />
      <DemoNotice team={team} />
      <EmptyState title="No study areas yet">
        {`Soon you will import a boundary here (GeoJSON, zipped shapefile or KML), lay an equal-area patch grid over it and define its cover states. Every study area of ${team.name} will be listed on this page.`}
      </EmptyState>
    </>
  );
}

export function StudyAreaListScreen(): ReactElement {
  const current = useCurrentTeam();
  return (
    <Screen title="Study areas">
      <Heading level={1}>Study areas</Heading>
      <StudyAreaListBody current={current} />
    </Screen>
  );
}

const styles = StyleSheet.create({
  teamLine: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.sm, marginTop: -space.sm },
});
