import { useLocalSearchParams } from 'expo-router';
import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/Banner';
import { Card } from '@/components/Card';
import { Heading } from '@/components/Heading';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { Section } from '@/components/Section';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import { space } from '@/components/theme';
import { useBreakpoint } from '@/components/useBreakpoint';
import type { StudyAreaDetail } from '@/shared/schemas';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { DemoNotice } from '@/features/teams/DemoNotice';
import { RoleBadge } from '@/features/teams/RoleBadge';
import { useCurrentTeam } from '@/features/teams/useCurrentTeam';

import { CoverStatesEditor } from './CoverStatesEditor';
import { DeleteStudyArea } from './DeleteStudyArea';
import { PatchGridDrawing } from './PatchGridDrawing';
import { RenameStudyAreaForm } from './RenameStudyAreaForm';
import { SectionNav } from './SectionNav';
import { StartCoverPanel } from './StartCoverPanel';
import { StudyAreaFacts } from './StudyAreaFacts';
import { useStartCover, useStudyArea } from './queries';
import { canDelete, canEdit } from './roles';
import { useAreaUnit } from './useAreaUnit';

type StudyAreaOverviewProps = { studyArea: StudyAreaDetail };

function StudyAreaOverview({ studyArea }: StudyAreaOverviewProps): ReactElement {
  const { teams } = useCurrentTeam();
  const team = teams.find((t) => t.id === studyArea.teamId) ?? null;
  const unit = useAreaUnit();
  const startCover = useStartCover(studyArea.id);
  const editable = canEdit(team?.role);
  const { isWide } = useBreakpoint();
  return (
    <>
      <View style={styles.titleLine}>
        <Heading level={1}>{studyArea.name}</Heading>
        {team ? <RoleBadge role={team.role} /> : null}
      </View>
      {studyArea.description ? <Text tone="muted">{studyArea.description}</Text> : null}
      <SectionNav studyAreaId={studyArea.id} current="overview" />
      <DemoNotice team={team} />
      <Card>
        <View style={isWide ? styles.overviewWide : styles.overview}>
          <View style={isWide ? styles.pane : styles.stack}>
            <PatchGridDrawing studyArea={studyArea} />
          </View>
          <View style={isWide ? styles.pane : styles.stack}>
            <StudyAreaFacts studyArea={studyArea} unit={unit} />
          </View>
        </View>
      </Card>
      <Section title="Start cover" description="The cover state of every patch at step 0.">
        <StartCoverPanel studyArea={studyArea} editable={editable} unit={unit} />
      </Section>
      {editable ? (
        <Section title="Cover states" description="2 to 12, in the order of tables and legends.">
          <CoverStatesEditor key={studyArea.states.map((s) => s.code).join()} studyArea={studyArea} hasStartCover={Boolean(startCover.data)} />
        </Section>
      ) : null}
      {editable ? (
        <Section title="Name and description">
          <RenameStudyAreaForm key={`${studyArea.name}-${studyArea.description}`} studyArea={studyArea} />
        </Section>
      ) : null}
      {canDelete(team?.role) ? (
        <Section title="Delete" description="Owners only. Removes the study area and everything in it.">
          <DeleteStudyArea studyArea={studyArea} />
        </Section>
      ) : null}
    </>
  );
}

type StudyAreaDetailBodyProps = { id: number };

function StudyAreaDetailBody({ id }: StudyAreaDetailBodyProps): ReactElement {
  const studyArea = useStudyArea(id);
  return (
    <Screen title={studyArea.data?.name ?? 'Study area'}>
      <TextLink href="/">← Study areas</TextLink>
      {studyArea.isPending ? <LoadingState label="Loading the study area…" /> : null}
      {studyArea.error ? <QueryErrorState what="the study area" error={studyArea.error} onRetry={() => void studyArea.refetch()} /> : null}
      {studyArea.data ? <StudyAreaOverview studyArea={studyArea.data} /> : null}
    </Screen>
  );
}

export function StudyAreaDetailScreen(): ReactElement {
  const { studyAreaId } = useLocalSearchParams<{ studyAreaId: string }>();
  const id = Number(studyAreaId);
  if (Number.isInteger(id) && id > 0) return <StudyAreaDetailBody id={id} />;
  return (
    <Screen title="Study area">
      <TextLink href="/">← Study areas</TextLink>
      <Banner tone="danger" title="No such study area">{`"${studyAreaId}" is not a study-area number.`}</Banner>
    </Screen>
  );
}

const styles = StyleSheet.create({
  titleLine: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.sm },
  overview: { gap: space.md },
  overviewWide: { flexDirection: 'row', alignItems: 'flex-start', gap: space.lg },
  pane: { flex: 1, minWidth: 0, gap: space.sm },
  stack: { gap: space.sm },
});
