import Slider from '@react-native-community/slider';
import { useQueries } from '@tanstack/react-query';
import { router, useLocalSearchParams } from 'expo-router';
import { useMemo, useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/Button';
import { Heading } from '@/components/Heading';
import { DownloadLink } from '@/components/DownloadLink';
import { SectionNav } from '@/features/studyAreas/SectionNav';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { Section } from '@/components/Section';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import { colors, space } from '@/components/theme';
import { useBreakpoint } from '@/components/useBreakpoint';
import type { RunSummary } from '@/shared/schemas';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { summaryQuery } from '@/features/playback/queries';
import { stepLabel } from '@/features/playback/stepLabel';
import { RunCaution } from '@/features/runs/RunCaution';
import { useStudyAreaRuns } from '@/features/runs/queries';
import { useNumericParam } from '@/features/scenarios/routeParams';
import { useAreaUnit } from '@/features/studyAreas/useAreaUnit';

import { compareTable } from './compareTable';
import { CompareTableView } from './CompareTableView';
import { COMPARE_LIMITS, parseRunIds, toggleRunId } from './runIds';
import { RunPicker } from './RunPicker';
import { shareLink } from './shareLink';
import { SmallMultiples } from './SmallMultiples';

type ComparisonProps = { summaries: readonly RunSummary[] };

function Comparison({ summaries }: ComparisonProps): ReactElement {
  const { isWide } = useBreakpoint();
  const unit = useAreaUnit();
  const lastCommon = Math.min(...summaries.map((s) => s.steps));
  const [chosen, setChosen] = useState<number | null>(null);
  const step = Math.min(chosen ?? lastCommon, lastCommon);
  const rows = useMemo(() => compareTable(summaries, step), [summaries, step]);
  return (
    <>
      <Section title="By state" description="Share of the study area; the first picked run is the reference. Lines differ by dash as well as colour.">
        <SmallMultiples summaries={summaries} cursor={step} columns={isWide ? 2 : 1} />
      </Section>
      <Section title="At one step" description="Medians over replicates. Bands overlap: the runs’ 5–95 % replicate ranges of the share meet (a rough sign, not a test).">
        <Text variant="mono" testID="compare-step">{stepLabel(step, summaries[0].yearsPerStep)}</Text>
        <Slider
          accessibilityLabel="Step for the table"
          minimumValue={0}
          maximumValue={lastCommon}
          step={1}
          value={step}
          onValueChange={(value) => setChosen(Math.round(value))}
          minimumTrackTintColor={colors.sage}
          maximumTrackTintColor={colors.line}
          thumbTintColor={colors.sageDark}
        />
        <CompareTableView rows={rows} unit={unit} compact={!isWide} />
      </Section>
    </>
  );
}

/** Two to four runs of a study area side by side; the picked runs live in the address (?runs=3,5). */
export function CompareScreen(): ReactElement {
  const studyAreaId = useNumericParam('studyAreaId');
  const params = useLocalSearchParams<{ runs?: string }>();
  const ids = parseRunIds(params.runs);
  const runs = useStudyAreaRuns(studyAreaId);
  const finished = (runs.data ?? []).filter((run) => run.status === 'succeeded');
  const summaries = useQueries({ queries: ids.map((id) => summaryQuery(id)) });
  const [copied, setCopied] = useState<boolean | null>(null);
  const path = `/study-areas/${studyAreaId}/compare?runs=${ids.join(',')}`;
  const pick = (runId: number): void => {
    setCopied(null);
    router.setParams({ runs: toggleRunId(ids, runId).join(',') });
  };
  const error = runs.error ?? summaries.find((s) => s.error)?.error ?? null;
  const loaded = summaries.every((s) => s.data) ? summaries.map((s) => s.data).filter((s): s is RunSummary => s !== undefined) : null;
  return (
    <Screen title="Compare runs" width="wide">
      <TextLink href={`/study-areas/${studyAreaId}/runs`}>← Runs</TextLink>
      <Heading level={1}>Compare runs</Heading>
      <SectionNav studyAreaId={studyAreaId} current="compare" />
      <RunCaution />
      <Text variant="small" tone="muted">{`Pick ${COMPARE_LIMITS.min} to ${COMPARE_LIMITS.max} finished runs of this study area.`}</Text>
      {runs.isPending ? <LoadingState label="Loading the runs…" /> : <RunPicker runs={finished} picked={ids} onToggle={pick} />}
      <View style={styles.share}>
        <Button label="Copy link" variant="secondary" size="sm" disabled={ids.length < COMPARE_LIMITS.min} onPress={() => void shareLink(path).then(setCopied)} />
        {ids.length >= COMPARE_LIMITS.min ? <DownloadLink url={`/api/v1/study-areas/${studyAreaId}/compare.csv?runs=${ids.join(',')}`}>Download the comparison (CSV)</DownloadLink> : null}
        {copied === true ? <Text variant="small" tone="primary">Link copied: it opens this comparison for a teammate.</Text> : null}
        {copied === false ? <Text variant="small" tone="danger">{`The browser did not allow copying. The link is ${path}`}</Text> : null}
      </View>
      {error ? <QueryErrorState what="the runs to compare" error={error} onRetry={() => void runs.refetch()} /> : null}
      {ids.length < COMPARE_LIMITS.min ? <Text>Pick at least two runs to compare.</Text> : null}
      {ids.length >= COMPARE_LIMITS.min && !loaded && !error ? <LoadingState label="Loading the runs’ results…" /> : null}
      {ids.length >= COMPARE_LIMITS.min && loaded ? <Comparison summaries={loaded} /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({ share: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.sm } });
