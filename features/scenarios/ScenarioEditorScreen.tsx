import { useMemo, type ReactElement } from 'react';

import { Banner } from '@/components/Banner';
import { Heading } from '@/components/Heading';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { Section } from '@/components/Section';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import type { ScenarioDetail, StudyAreaDetail } from '@/shared/schemas';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { canEdit } from '@/features/studyAreas/roles';
import { StartRunForm } from '@/features/runs/StartRunForm';
import { formatDateTime } from '@/features/ui/formatDate';

import { formFromScenario } from './editor/scenarioFormState';
import { ScenarioWorkspace } from './editor/ScenarioWorkspace';
import { useSaveScenario, useScenario, useScenarioUncertainty } from './queries';
import { useNumericParam } from './routeParams';
import { StudyAreaGate } from './StudyAreaGate';
import { useStudyAreaContext, type StudyAreaContext } from './useStudyAreaContext';

type ScenarioEditorBodyProps = { studyArea: StudyAreaDetail; scenario: ScenarioDetail; context: StudyAreaContext };

function ScenarioEditorBody({ studyArea, scenario, context }: ScenarioEditorBodyProps): ReactElement {
  const save = useSaveScenario(scenario.id);
  const uncertainty = useScenarioUncertainty(scenario.id, scenario.surveyIds.length > 0);
  const initial = useMemo(() => formFromScenario(scenario, studyArea.states), [scenario, studyArea.states]);
  const readOnly = !canEdit(context.role);
  return (
    <>
      <Text variant="small" tone="muted">{`Updated by ${scenario.updatedBy}, ${formatDateTime(scenario.updatedAt)}`}</Text>
      {readOnly ? (
        <Banner tone="info" title="Read only">
          You are a viewer in this team: you can read this scenario and download its matrices; owners and editors change it.
        </Banner>
      ) : null}
      {scenario.fitsStudyArea ? null : (
        <Banner tone="warning" title="The study area's states changed">
          {`This scenario was saved for the states ${scenario.stateCodes.join(', ')}. Its matrices are shown reset to "every state stays"; enter them again for the current states and save.`}
        </Banner>
      )}
      <ScenarioWorkspace
        key={scenario.updatedAt}
        studyAreaId={studyArea.id}
        states={studyArea.states}
        initial={initial}
        studyAreaShares={context.startShares}
        totalAreaM2={studyArea.totalAreaM2}
        unit={context.unit}
        readOnly={readOnly}
        savedId={scenario.id}
        uncertainty={uncertainty.data}
        save={{ label: 'Save', busy: save.isPending, error: save.error, run: (body) => save.mutate(body) }}
      />
      {readOnly || !scenario.fitsStudyArea ? null : (
        <Section title="Run this scenario" description="Simulate every patch over many seeded replicates as a background job; the saved scenario is frozen into the run.">
          <StartRunForm scenario={scenario} />
        </Section>
      )}
      <TextLink href={`/study-areas/${studyArea.id}/runs`}>Runs of this study area →</TextLink>
    </>
  );
}

type ScenarioLoaderProps = { studyArea: StudyAreaDetail; scenarioId: number; context: StudyAreaContext };

function ScenarioLoader({ studyArea, scenarioId, context }: ScenarioLoaderProps): ReactElement {
  const scenario = useScenario(scenarioId);
  if (scenario.isPending) return <LoadingState label="Loading the scenario…" />;
  if (scenario.error) return <QueryErrorState what="the scenario" error={scenario.error} onRetry={() => void scenario.refetch()} />;
  return (
    <>
      <Heading level={1}>{scenario.data.name}</Heading>
      <ScenarioEditorBody studyArea={studyArea} scenario={scenario.data} context={context} />
    </>
  );
}

/** One scenario: its editor (read only for viewers) beside its analysis. */
export function ScenarioEditorScreen(): ReactElement {
  const studyAreaId = useNumericParam('studyAreaId');
  const scenarioId = useNumericParam('scenarioId');
  const context = useStudyAreaContext(studyAreaId);
  return (
    <Screen title="Scenario" width="wide">
      <StudyAreaGate context={context}>
        {(studyArea) => (
          <>
            <TextLink href={`/study-areas/${studyArea.id}/scenarios`}>{`← Scenarios of ${studyArea.name}`}</TextLink>
            <ScenarioLoader studyArea={studyArea} scenarioId={scenarioId} context={context} />
          </>
        )}
      </StudyAreaGate>
    </Screen>
  );
}
