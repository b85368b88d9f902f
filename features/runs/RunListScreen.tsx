import type { ReactElement } from 'react';
import { View } from 'react-native';

import { Card } from '@/components/Card';
import { EmptyState } from '@/components/EmptyState';
import { Heading } from '@/components/Heading';
import { SectionNav } from '@/features/studyAreas/SectionNav';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import type { StudyAreaDetail } from '@/shared/schemas';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { useNumericParam } from '@/features/scenarios/routeParams';
import { StudyAreaGate } from '@/features/scenarios/StudyAreaGate';
import { useStudyAreaContext } from '@/features/scenarios/useStudyAreaContext';
import { canEdit } from '@/features/studyAreas/roles';

import { useStudyAreaRuns } from './queries';
import { RunRow } from './RunRow';
import { StartRunPanel } from './StartRunPanel';

type RunListProps = { studyArea: StudyAreaDetail };

function RunList({ studyArea }: RunListProps): ReactElement {
  const runs = useStudyAreaRuns(studyArea.id);
  if (runs.isPending) return <LoadingState label="Loading runs…" />;
  if (runs.error) return <QueryErrorState what="the runs" error={runs.error} onRetry={() => void runs.refetch()} />;
  if (runs.data.length === 0) {
    return (
      <EmptyState title="No runs yet">
        A run simulates a scenario: choose steps, years per step, replicates and a seed.
      </EmptyState>
    );
  }
  return (
    <Card>
      <View role="list" aria-label="Runs">
        {runs.data.map((run) => (
          <RunRow key={run.id} run={run} />
        ))}
      </View>
    </Card>
  );
}

/** The runs of one study area with their progress; the list refreshes itself while any run is active. */
export function RunListScreen(): ReactElement {
  const studyAreaId = useNumericParam('studyAreaId');
  const context = useStudyAreaContext(studyAreaId);
  return (
    <Screen title="Runs">
      <StudyAreaGate context={context}>
        {(studyArea) => (
          <>
            <TextLink href={`/study-areas/${studyArea.id}`}>{`← ${studyArea.name}`}</TextLink>
            <Heading level={1}>Runs</Heading>
            <SectionNav studyAreaId={studyArea.id} current="runs" />
            <Text tone="muted">{`Simulations of the scenarios of ${studyArea.name}. Runs go on in the background; the team is told by e-mail when one finishes or fails.`}</Text>
            <RunList studyArea={studyArea} />
            {canEdit(context.role) ? <StartRunPanel studyAreaId={studyArea.id} /> : null}
          </>
        )}
      </StudyAreaGate>
    </Screen>
  );
}
