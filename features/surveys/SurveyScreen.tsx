import type { ReactElement } from 'react';

import { Heading } from '@/components/Heading';
import { DownloadLink } from '@/components/DownloadLink';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { Section } from '@/components/Section';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import { Banner } from '@/components/Banner';
import type { StudyAreaDetail, SurveyEstimate } from '@/shared/schemas';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { canEdit } from '@/features/studyAreas/roles';

import { useNumericParam } from '../scenarios/routeParams';
import { StudyAreaGate } from '../scenarios/StudyAreaGate';
import { useStudyAreaContext } from '../scenarios/useStudyAreaContext';
import { EstimateTable } from './EstimateTable';
import { useSurvey } from './queries';
import { UseEstimateForm } from './UseEstimateForm';

type ChiSquare = SurveyEstimate['tests']['independence'];

const testLine = (name: string, test: ChiSquare): string =>
  test ? `${name}: χ² = ${test.statistic.toFixed(2)}, ${test.dof} degrees of freedom, p = ${test.pValue < 0.001 ? '< 0.001' : test.pValue.toFixed(3)}` : `${name}: not enough data to test`;

type SurveyBodyProps = { studyArea: StudyAreaDetail; surveyId: number; editable: boolean };

function SurveyBody({ studyArea, surveyId, editable }: SurveyBodyProps): ReactElement {
  const survey = useSurvey(surveyId);
  if (survey.isPending) return <LoadingState label="Loading the survey…" />;
  if (survey.error) return <QueryErrorState what="the survey" error={survey.error} onRetry={() => void survey.refetch()} />;
  const { estimate, reading } = survey.data;
  const skipped = estimate.pairsSkipped;
  return (
    <>
      <Heading level={1}>{survey.data.name}</Heading>
      <DownloadLink url={`/api/v1/surveys/${survey.data.id}/estimate.csv`}>Download the estimate (CSV)</DownloadLink>
      <Text tone="muted">
        {reading.kind === 'plots'
          ? `${reading.plots} plots, ${reading.observations} visits; ${estimate.pairsUsed} transitions counted${reading.rowsLeftOut > 0 ? `, ${reading.rowsLeftOut} rows left out by the mapping` : ''}.`
          : `Cover maps of ${reading.earlierDate} and ${reading.laterDate}; ${estimate.pairsUsed} patches paired.`}
      </Text>
      <Section title="Estimated matrix" description="Maximum-likelihood estimate: the share of each state's transitions that went to each state.">
        <EstimateTable states={studyArea.states} estimate={estimate} />
        {estimate.rowsWithoutData.length > 0 ? (
          <Banner tone="warning" title="Rows without data">
            {`No transitions were seen from ${estimate.rowsWithoutData.join(', ')}. These rows are left empty, not guessed.`}
          </Banner>
        ) : null}
      </Section>
      <Section title="Pairs skipped" description="Successive visits of a plot that were not counted as one transition.">
        <Text variant="small">{skipped.total === 0 ? 'None.' : `${skipped.total} pairs:`}</Text>
        {skipped.byReason.map((group) => (
          <Text key={group.reason} variant="small">{`• ${group.count} × ${group.reason}`}</Text>
        ))}
      </Section>
      <Section title="Tests" description="Whether a first-order Markov model with fixed rates fits these data.">
        <Text variant="small">
          {testLine('Successive states independent (order 0 against order 1)', estimate.tests.independence)}
        </Text>
        <Text variant="small">
          {testLine('Same rates in every period (time-homogeneity)', estimate.tests.homogeneity)}
        </Text>
        {estimate.readings.map((line) => (
          <Banner key={line} tone="info">
            {line}
          </Banner>
        ))}
      </Section>
      {editable ? (
        <Section title="Use this estimate" description="Fills a scenario phase's matrix with this estimate and keeps a link to this survey, so the analysis can show its estimation uncertainty.">
          <UseEstimateForm survey={survey.data} />
        </Section>
      ) : null}
    </>
  );
}

export function SurveyScreen(): ReactElement {
  const studyAreaId = useNumericParam('studyAreaId');
  const surveyId = useNumericParam('surveyId');
  const context = useStudyAreaContext(studyAreaId);
  return (
    <Screen title="Survey">
      <StudyAreaGate context={context}>
        {(studyArea) => (
          <>
            <TextLink href={`/study-areas/${studyArea.id}/surveys`}>{`← Surveys of ${studyArea.name}`}</TextLink>
            <SurveyBody studyArea={studyArea} surveyId={surveyId} editable={canEdit(context.role)} />
          </>
        )}
      </StudyAreaGate>
    </Screen>
  );
}
