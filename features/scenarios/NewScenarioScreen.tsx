import { router } from 'expo-router';
import { useMemo, type ReactElement } from 'react';

import { Heading } from '@/components/Heading';
import { Screen } from '@/components/Screen';
import { TextLink } from '@/components/TextLink';
import { Banner } from '@/components/Banner';
import type { StudyAreaDetail } from '@/shared/schemas';
import { canEdit } from '@/features/studyAreas/roles';

import { newScenarioForm } from './editor/scenarioFormState';
import { ScenarioWorkspace } from './editor/ScenarioWorkspace';
import { useCreateScenario } from './queries';
import { useNumericParam } from './routeParams';
import { StudyAreaGate } from './StudyAreaGate';
import { useStudyAreaContext, type StudyAreaContext } from './useStudyAreaContext';

type NewScenarioBodyProps = { studyArea: StudyAreaDetail; context: StudyAreaContext };

function NewScenarioBody({ studyArea, context }: NewScenarioBodyProps): ReactElement {
  const create = useCreateScenario(studyArea.id);
  const initial = useMemo(() => newScenarioForm(studyArea.states), [studyArea.states]);
  if (context.role !== undefined && !canEdit(context.role)) {
    return <Banner tone="info">Viewers read scenarios; owners and editors create them.</Banner>;
  }
  return (
    <ScenarioWorkspace
      studyAreaId={studyArea.id}
      states={studyArea.states}
      initial={initial}
      studyAreaShares={context.startShares}
      totalAreaM2={studyArea.totalAreaM2}
      unit={context.unit}
      readOnly={false}
      savedId={null}
      uncertainty={undefined}
      save={{
        label: 'Create scenario',
        busy: create.isPending,
        error: create.error,
        run: (body) => create.mutate(body, { onSuccess: (scenario) => router.replace(`/study-areas/${studyArea.id}/scenarios/${scenario.id}`) }),
      }}
    />
  );
}

export function NewScenarioScreen(): ReactElement {
  const studyAreaId = useNumericParam('studyAreaId');
  const context = useStudyAreaContext(studyAreaId);
  return (
    <Screen title="New scenario" width="wide">
      <StudyAreaGate context={context}>
        {(studyArea) => (
          <>
            <TextLink href={`/study-areas/${studyArea.id}/scenarios`}>{`← Scenarios of ${studyArea.name}`}</TextLink>
            <Heading level={1}>New scenario</Heading>
            <NewScenarioBody studyArea={studyArea} context={context} />
          </>
        )}
      </StudyAreaGate>
    </Screen>
  );
}
