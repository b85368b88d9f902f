import { useState, type ReactElement } from 'react';

import { Card } from '@/components/Card';
import { LoadingState } from '@/components/LoadingState';
import { Section } from '@/components/Section';
import { SegmentedControl } from '@/components/SegmentedControl';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { useScenarios } from '@/features/scenarios/queries';

import { StartRunForm } from './StartRunForm';

export type StartRunPanelProps = { studyAreaId: number };

/** Pick one of the study area's scenarios and start a run of it (editors and owners). */
export function StartRunPanel({ studyAreaId }: StartRunPanelProps): ReactElement | null {
  const scenarios = useScenarios(studyAreaId);
  const [chosen, setChosen] = useState<number | null>(null);
  if (scenarios.isPending) return <LoadingState label="Loading scenarios…" />;
  if (scenarios.error) return <QueryErrorState what="the scenarios" error={scenarios.error} onRetry={() => void scenarios.refetch()} />;
  const scenario = scenarios.data.find((s) => s.id === chosen) ?? scenarios.data[0];
  if (!scenario) return null;
  return (
    <Section title="Start a run" description="Runs go on in the background; you can leave this page.">
      <Card>
        <SegmentedControl label="Scenario" options={scenarios.data.map((s) => ({ value: s.id, label: s.name }))} value={scenario.id} onChange={setChosen} />
        <StartRunForm key={scenario.id} scenario={scenario} />
      </Card>
    </Section>
  );
}
