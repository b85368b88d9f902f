import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { ButtonLink } from '@/components/ButtonLink';
import { Card } from '@/components/Card';
import { EmptyState } from '@/components/EmptyState';
import { Heading } from '@/components/Heading';
import { SectionNav } from '@/features/studyAreas/SectionNav';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import { colors, space } from '@/components/theme';
import type { StudyAreaDetail } from '@/shared/schemas';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { canEdit } from '@/features/studyAreas/roles';
import { formatDateTime } from '@/features/ui/formatDate';

import { useNumericParam } from '../scenarios/routeParams';
import { StudyAreaGate } from '../scenarios/StudyAreaGate';
import { useStudyAreaContext } from '../scenarios/useStudyAreaContext';
import { useSurveys } from './queries';

type SurveyListProps = { studyArea: StudyAreaDetail };

function SurveyList({ studyArea }: SurveyListProps): ReactElement {
  const surveys = useSurveys(studyArea.id);
  if (surveys.isPending) return <LoadingState label="Loading surveys…" />;
  if (surveys.error) return <QueryErrorState what="the surveys" error={surveys.error} onRetry={() => void surveys.refetch()} />;
  if (surveys.data.length === 0) return <EmptyState title="No surveys yet">Upload a CSV of plot resurveys to estimate a transition matrix.</EmptyState>;
  return (
    <Card>
      <View role="list" aria-label="Surveys">
        {surveys.data.map((survey) => (
          <View key={survey.id} role="listitem" style={styles.row}>
            <TextLink href={`/study-areas/${studyArea.id}/surveys/${survey.id}`}>{survey.name}</TextLink>
            <Text variant="small" tone="muted">
              {`${survey.pairsUsed} transitions${survey.rowsWithoutData.length > 0 ? `, no data from ${survey.rowsWithoutData.join(', ')}` : ''} · by ${survey.createdBy}, ${formatDateTime(survey.createdAt)}`}
            </Text>
          </View>
        ))}
      </View>
    </Card>
  );
}

export function SurveyListScreen(): ReactElement {
  const studyAreaId = useNumericParam('studyAreaId');
  const context = useStudyAreaContext(studyAreaId);
  return (
    <Screen title="Surveys">
      <StudyAreaGate context={context}>
        {(studyArea) => (
          <>
            <TextLink href={`/study-areas/${studyArea.id}/scenarios`}>{`← Scenarios of ${studyArea.name}`}</TextLink>
            <Heading level={1}>Surveys</Heading>
            <SectionNav studyAreaId={studyArea.id} current="surveys" />
            {canEdit(context.role) ? <ButtonLink href={`/study-areas/${studyArea.id}/surveys/new`} label="Upload a plot survey" /> : null}
            <SurveyList studyArea={studyArea} />
          </>
        )}
      </StudyAreaGate>
    </Screen>
  );
}

const styles = StyleSheet.create({ row: { gap: space.xxs, paddingVertical: space.md, borderTopWidth: 1, borderTopColor: colors.line } });
