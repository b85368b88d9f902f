import { router } from 'expo-router';
import { useState, type ReactElement } from 'react';

import { Button } from '@/components/Button';
import { FormError } from '@/components/FormError';
import { SegmentedControl } from '@/components/SegmentedControl';
import { Text } from '@/components/Text';
import type { SurveyDetail } from '@/shared/schemas';
import { describeError } from '@/features/api/describeError';

import { useApplySurveyEstimate, useScenario, useScenarios } from '../scenarios/queries';

export type UseEstimateFormProps = { survey: SurveyDetail };

/** "Use this estimate": pick a scenario and one of its phases; its matrix becomes the estimate, linked to this survey. */
export function UseEstimateForm({ survey }: UseEstimateFormProps): ReactElement {
  const scenarios = useScenarios(survey.studyAreaId);
  const [scenarioId, setScenarioId] = useState<number | null>(null);
  const [phaseIndex, setPhaseIndex] = useState(0);
  const chosen = scenarioId ?? scenarios.data?.[0]?.id ?? null;
  const scenario = useScenario(chosen ?? 0);
  const apply = useApplySurveyEstimate();
  if (survey.estimate.rowsWithoutData.length > 0) {
    return (
      <Text variant="small" tone="muted">
        {`This estimate has rows without data (${survey.estimate.rowsWithoutData.join(', ')}), so it is not a whole matrix. Copy the rows you trust into a phase by hand.`}
      </Text>
    );
  }
  if (!scenarios.data || scenarios.data.length === 0 || chosen === null) {
    return <Text variant="small" tone="muted">Create a scenario first; its phases can then take this estimate.</Text>;
  }
  const phases = scenario.data?.phases ?? [];
  return (
    <>
      <SegmentedControl
        label="Scenario"
        size="md"
        options={scenarios.data.map((s) => ({ value: s.id, label: s.name }))}
        value={chosen}
        onChange={(id) => {
          setScenarioId(id);
          setPhaseIndex(0);
        }}
      />
      {phases.length > 1 ? (
        <SegmentedControl
          label="Phase"
          size="md"
          options={phases.map((phase, n) => ({ value: n, label: `Phase ${n + 1} (from step ${phase.fromStep})` }))}
          value={phaseIndex}
          onChange={setPhaseIndex}
        />
      ) : null}
      <Button
        label="Use this estimate"
        busy={apply.isPending}
        disabled={!scenario.data}
        onPress={() =>
          apply.mutate(
            { scenarioId: chosen, phaseIndex, surveyId: survey.id },
            { onSuccess: (updated) => router.push(`/study-areas/${updated.studyAreaId}/scenarios/${updated.id}`) },
          )
        }
      />
      <FormError message={describeError(apply.error)} title="The estimate was not used" />
    </>
  );
}
