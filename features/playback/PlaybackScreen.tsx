import { useEffect, useMemo, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Heading } from '@/components/Heading';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import { space } from '@/components/theme';
import { useBreakpoint } from '@/components/useBreakpoint';
import type { Run } from '@/shared/schemas';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { RunCaution } from '@/features/runs/RunCaution';
import { useRun } from '@/features/runs/queries';
import { useNumericParam } from '@/features/scenarios/routeParams';
import { usePatchGrid, useStudyArea } from '@/features/studyAreas/queries';
import { useAreaUnit } from '@/features/studyAreas/useAreaUnit';

import { plural } from './formatPlace';
import { frameTotals } from './frameTotals';
import { MapLegend } from './MapLegend';
import { PatchInspector } from './PatchInspector';
import { PlaybackControls } from './PlaybackControls';
import { PlaybackMap } from './PlaybackMap';
import { useAllFrames, useFrame, usePrefetchFrames, useRunSummary } from './queries';
import { RunChartPanel } from './RunChartPanel';
import { stepLabel } from './stepLabel';
import { usePlaybackStore } from './store';
import { useArrowKeys } from './useArrowKeys';
import { usePlaybackDrawing } from './usePlaybackDrawing';
import { usePlaybackTimer } from './usePlaybackTimer';

type PlaybackViewProps = { run: Run };

function PlaybackView({ run }: PlaybackViewProps): ReactElement {
  const { isWide } = useBreakpoint();
  const unit = useAreaUnit();
  const studyArea = useStudyArea(run.studyAreaId);
  const grid = usePatchGrid(run.studyAreaId);
  const summary = useRunSummary(run.id);
  const drawing = usePlaybackDrawing(studyArea.data, grid.data);
  const store = usePlaybackStore();
  const { open, selectPatch } = store;
  useEffect(() => open(run.id, run.steps), [open, run.id, run.steps]);
  // Until the store has switched to this run, show its first step (the store may hold another run's).
  const current = store.runId === run.id;
  const step = current ? store.step : 0;
  const lastStep = run.steps;
  const selectedPatch = current ? store.selectedPatch : null;
  usePlaybackTimer();
  useArrowKeys(isWide);
  usePrefetchFrames(run.id, step, run.steps, true);
  const frame = useFrame(run.id, step, true);
  const frameAt = useAllFrames(run.id, lastStep, run.inputs.patchCount, selectedPatch !== null);
  const states = run.inputs.states;
  const totals = useMemo(() => (frame.data && drawing && frame.data.length === drawing.areas.length ? frameTotals(frame.data, drawing.areas, states.length) : null), [frame.data, drawing, states.length]);

  const error = studyArea.error ?? grid.error ?? summary.error ?? frame.error;
  if (error) return <QueryErrorState what="the run’s map" error={error} onRetry={() => void frame.refetch()} />;

  const map = drawing ? (
    <PlaybackMap
      drawing={drawing}
      coverStates={states}
      states={frame.data && frame.data.length === drawing.cells.length ? frame.data : undefined}
      selectedPatch={selectedPatch}
      onSelectPatch={selectPatch}
      label={`Map of ${run.inputs.studyAreaName} at ${stepLabel(step, run.yearsPerStep)}, shown replicate ${run.shownReplicate + 1}`}
    />
  ) : (
    <LoadingState label="Loading the patches…" />
  );
  const inspector =
    selectedPatch !== null && drawing ? (
      <PatchInspector
        patch={selectedPatch}
        cell={drawing.cells[selectedPatch]}
        areaM2={drawing.areas[selectedPatch]}
        spec={drawing.spec}
        coverStates={states}
        lastStep={lastStep}
        yearsPerStep={run.yearsPerStep}
        frameAt={frameAt}
        unit={unit}
        onClose={() => selectPatch(null)}
      />
    ) : (
      <Text variant="small" tone="muted">Tap a patch on the map to see its history.</Text>
    );
  const chart = summary.data ? <RunChartPanel run={run} summary={summary.data} unit={unit} cursor={step} /> : <LoadingState label="Loading the summary…" />;

  return (
    <View style={isWide ? styles.wide : styles.phone}>
      <View style={isWide ? styles.mapColumn : undefined}>
        {map}
        <PlaybackControls yearsPerStep={run.yearsPerStep} />
        <MapLegend coverStates={states} totals={totals} unit={unit} />
      </View>
      <View style={isWide ? styles.chartColumn : undefined}>{chart}</View>
      <View style={isWide ? styles.inspector : undefined}>{inspector}</View>
    </View>
  );
}

/** A finished run's map played step by step, its area-share chart and the patch inspector. */
export function PlaybackScreen(): ReactElement {
  const studyAreaId = useNumericParam('studyAreaId');
  const runId = useNumericParam('runId');
  const run = useRun(runId);
  return (
    <Screen title={run.data ? `Watch run ${run.data.id}` : 'Watch run'} width="wide">
      <TextLink href={`/study-areas/${studyAreaId}/runs/${runId}`}>← Run</TextLink>
      {run.error ? <QueryErrorState what="the run" error={run.error} onRetry={() => void run.refetch()} /> : null}
      {run.isPending ? <LoadingState label="Loading the run…" /> : null}
      {run.data ? (
        <>
          <Heading level={1}>{`Watch run ${run.data.id}: ${run.data.inputs.scenarioName}`}</Heading>
          <Text variant="small" tone="muted">{`${run.data.inputs.studyAreaName} · ${plural(run.data.steps, 'step')} of ${plural(run.data.yearsPerStep, 'year')} · ${plural(run.data.replicates, 'replicate')} · seed “${run.data.seed}” · map shows replicate ${run.data.shownReplicate + 1}`}</Text>
          {run.data.status === 'succeeded' ? <PlaybackView run={run.data} /> : <Text>{`This run is ${run.data.status}: its map can be watched once it has succeeded.`}</Text>}
          <RunCaution />
        </>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  phone: { gap: space.lg },
  wide: { flexDirection: 'row', alignItems: 'flex-start', gap: space.xl },
  mapColumn: { flex: 5, gap: space.md, minWidth: 0 },
  chartColumn: { flex: 5, minWidth: 0 },
  inspector: { width: 300 },
});
