import type { ReactElement } from 'react';
import { View } from 'react-native';

import { ButtonLink } from '@/components/ButtonLink';
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
import { canEdit } from '@/features/studyAreas/roles';

import { useScenarios } from './queries';
import { useNumericParam } from './routeParams';
import { ScenarioRow } from './ScenarioRow';
import { StudyAreaGate } from './StudyAreaGate';
import { useStudyAreaContext } from './useStudyAreaContext';

type ScenarioListProps = { studyArea: StudyAreaDetail; canChange: boolean };

function ScenarioList({ studyArea, canChange }: ScenarioListProps): ReactElement {
  const scenarios = useScenarios(studyArea.id);
  if (scenarios.isPending) return <LoadingState label="Loading scenarios…" />;
  if (scenarios.error) return <QueryErrorState what="the scenarios" error={scenarios.error} onRetry={() => void scenarios.refetch()} />;
  if (scenarios.data.length === 0) {
    return (
      <EmptyState title="No scenarios yet" action={canChange ? <ButtonLink href={`/study-areas/${studyArea.id}/scenarios/new`} label="New scenario" /> : undefined}>
        A scenario is a start cover and one to five phases, each with its own transition matrix.
      </EmptyState>
    );
  }
  return (
    <Card>
      <View role="list" aria-label="Scenarios">
        {scenarios.data.map((scenario) => (
          <ScenarioRow key={scenario.id} scenario={scenario} canChange={canChange} />
        ))}
      </View>
    </Card>
  );
}

/** The scenarios of one study area; editors and owners create, duplicate and delete, viewers read. */
export function ScenarioListScreen(): ReactElement {
  const studyAreaId = useNumericParam('studyAreaId');
  const context = useStudyAreaContext(studyAreaId);
  const canChange = canEdit(context.role);
  return (
    <Screen title="Scenarios">
      <StudyAreaGate context={context}>
        {(studyArea) => (
          <>
            <TextLink href={`/study-areas/${studyArea.id}`}>{`← ${studyArea.name}`}</TextLink>
            <Heading level={1}>Scenarios</Heading>
            <SectionNav studyAreaId={studyArea.id} current="scenarios" />
            <Text tone="muted">{`Management scenarios for ${studyArea.name}. Open one to edit its matrices and read its analysis.`}</Text>
            {canChange ? <ButtonLink href={`/study-areas/${studyArea.id}/scenarios/new`} label="New scenario" /> : null}
            <ScenarioList studyArea={studyArea} canChange={canChange} />
            <Text variant="small" tone="muted">
              Matrices can be estimated from repeat plot surveys:{' '}
              <TextLink href={`/study-areas/${studyArea.id}/surveys`}>Surveys</TextLink>
            </Text>
          </>
        )}
      </StudyAreaGate>
    </Screen>
  );
}
