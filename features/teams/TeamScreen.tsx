import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Heading } from '@/components/Heading';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { Section } from '@/components/Section';
import { Text } from '@/components/Text';
import { space } from '@/components/theme';
import type { User } from '@/shared/schemas';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { useMe } from '@/features/auth/queries';

import { CreateTeamForm } from './CreateTeamForm';
import { DemoNotice } from './DemoNotice';
import { RoleBadge } from './RoleBadge';
import { TeamDetails } from './TeamDetails';
import { TeamSwitcher } from './TeamSwitcher';
import { useCurrentTeam } from './useCurrentTeam';

type CurrentTeamPanelProps = { user: User };

function CurrentTeamPanel({ user }: CurrentTeamPanelProps): ReactElement {
  const current = useCurrentTeam();
  if (current.isPending) return <LoadingState label="Loading your teams…" />;
  if (current.error) return <QueryErrorState what="your teams" error={current.error} onRetry={current.refetch} />;
  if (!current.team) {
    return <Text tone="muted">You are not in a team yet. Create one below, or accept an invitation from a colleague.</Text>;
  }
  return (
    <>
      <TeamSwitcher current={current} />
      <View style={styles.teamLine}>
        <Heading level={2}>{current.team.name}</Heading>
        <RoleBadge role={current.team.role} />
      </View>
      <DemoNotice team={current.team} />
      <TeamDetails key={current.team.id} team={current.team} user={user} />
    </>
  );
}

export function TeamScreen(): ReactElement {
  const me = useMe();
  return (
    <Screen title="Team">
      <Heading level={1}>Team</Heading>
      {me.data ? <CurrentTeamPanel user={me.data} /> : null}
      <Section title="Create a new team" description="You will be its owner; invite people once it exists.">
        <CreateTeamForm />
      </Section>
    </Screen>
  );
}

const styles = StyleSheet.create({
  teamLine: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.sm },
});
