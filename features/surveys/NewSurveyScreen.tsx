import { useState, type ReactElement } from 'react';

import { Heading } from '@/components/Heading';
import { Screen } from '@/components/Screen';
import { SegmentedControl } from '@/components/SegmentedControl';
import { TextLink } from '@/components/TextLink';

import { useNumericParam } from '../scenarios/routeParams';
import { StudyAreaGate } from '../scenarios/StudyAreaGate';
import { useStudyAreaContext } from '../scenarios/useStudyAreaContext';
import { MapPairUpload } from './MapPairUpload';
import { PlotSurveyUpload } from './PlotSurveyUpload';

type SurveyKind = 'plots' | 'map-pair';
const KINDS: ReadonlyArray<{ value: SurveyKind; label: string }> = [
  { value: 'plots', label: 'Plot resurveys (CSV)' },
  { value: 'map-pair', label: 'Two dated cover maps' },
];

export function NewSurveyScreen(): ReactElement {
  const studyAreaId = useNumericParam('studyAreaId');
  const context = useStudyAreaContext(studyAreaId);
  const [kind, setKind] = useState<SurveyKind>('plots');
  return (
    <Screen title="Upload a survey">
      <StudyAreaGate context={context}>
        {(studyArea) => (
          <>
            <TextLink href={`/study-areas/${studyArea.id}/surveys`}>{`← Surveys of ${studyArea.name}`}</TextLink>
            <Heading level={1}>Upload a survey</Heading>
            <SegmentedControl label="Kind of survey" options={KINDS} value={kind} onChange={setKind} size="md" />
            {kind === 'plots' ? <PlotSurveyUpload studyArea={studyArea} /> : <MapPairUpload studyArea={studyArea} />}
          </>
        )}
      </StudyAreaGate>
    </Screen>
  );
}
