import { useMemo, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/Banner';
import { Heading } from '@/components/Heading';
import { LoadingState } from '@/components/LoadingState';
import { Screen } from '@/components/Screen';
import { Section } from '@/components/Section';
import { Text } from '@/components/Text';
import { TextLink } from '@/components/TextLink';
import { space } from '@/components/theme';
import { analyzeChain, createMatrix } from '@/shared/markov';
import type { Run, RunSummary } from '@/shared/schemas';
import { QueryErrorState } from '@/features/api/QueryErrorState';
import { RunCaution } from '@/features/runs/RunCaution';
import { useRun } from '@/features/runs/queries';
import { useNumericParam } from '@/features/scenarios/routeParams';
import { decodeCells } from '@/features/studyAreas/drawing';
import { usePatchGrid } from '@/features/studyAreas/queries';
import { useAreaUnit } from '@/features/studyAreas/useAreaUnit';

import { PrintButton, PrintStyle } from './PrintSupport';
import { ReportFacts } from './ReportFacts';
import { REPORT_CONTROLS_ID } from './reportControls';
import { reportSteps } from './reportSteps';
import { ShareChart } from './ShareChart';
import { ShareTable } from './ShareTable';
import { StateLegend } from './StateLegend';
import { StepMap } from './StepMap';
import { useRunFrames, useRunSummary } from './queries';

/** Long-run shares of the frozen last phase's matrix; null when they are not unique. */
function longRunShares(run: Run): number[] | null {
  const { states, phases } = run.inputs;
  return analyzeChain(createMatrix(states.map((s) => s.code), phases[phases.length - 1].matrix)).stationary;
}

type StepMapsProps = { run: Run };

/** Maps of the shown replicate at the start, the middle and the last step. */
function StepMaps({ run }: StepMapsProps): ReactElement {
  const steps = reportSteps(run.steps);
  const grid = usePatchGrid(run.studyAreaId);
  const frames = useRunFrames(run.id, steps, true);
  const cells = useMemo(() => (grid.data ? decodeCells(grid.data.cells) : null), [grid.data]);
  const failed = grid.error ?? frames.find((f) => f.error)?.error;
  if (failed) return <QueryErrorState what="the maps" error={failed} onRetry={() => void grid.refetch()} />;
  if (!grid.data || !cells || frames.some((f) => !f.data)) return <LoadingState label="Loading the maps…" />;
  if (cells.length !== run.inputs.patchCount) {
    return <Banner tone="warning" title="No maps">{`The study area's grid changed after this run (${cells.length} patches now, ${run.inputs.patchCount} then), so its maps cannot be drawn.`}</Banner>;
  }
  return (
    <>
      <StateLegend states={run.inputs.states} />
      <View style={styles.maps}>
        {steps.map((step, n) => (
          <StepMap key={step} label={`Step ${step}, year ${step * run.yearsPerStep}`} spec={grid.data.grid} cells={cells} frame={frames[n].data!} states={run.inputs.states} />
        ))}
      </View>
    </>
  );
}

type ReportBodyProps = { run: Run; summary: RunSummary };

function ReportBody({ run, summary }: ReportBodyProps): ReactElement {
  const unit = useAreaUnit();
  const longRun = useMemo(() => longRunShares(run), [run]);
  return (
    <>
      <Section title="Inputs" description="Frozen when the run started; the same inputs, seed and settings give the same fingerprint and the same results.">
        <ReportFacts run={run} unit={unit} />
      </Section>
      <Section title="Area shares" description="Median over replicates; expected is x_t = x_0 P(t); long-run shares are the stationary distribution of the last phase's matrix.">
        <ShareTable summary={summary} longRun={longRun} />
        <ShareChart summary={summary} />
      </Section>
      <Section title="Maps" description={`Patch states of replicate ${run.shownReplicate + 1} (of ${run.replicates}): one possible course, not the expected one.`}>
        <StepMaps run={run} />
      </Section>
      <Section title="Method">
        <Text variant="small">{summary.method}</Text>
      </Section>
    </>
  );
}

type ReportProps = { run: Run };

function Report({ run }: ReportProps): ReactElement {
  const finished = run.status === 'succeeded';
  const summary = useRunSummary(run.id, finished);
  return (
    <>
      <View nativeID={REPORT_CONTROLS_ID} style={styles.controls}>
        <TextLink href={`/study-areas/${run.studyAreaId}/runs/${run.id}`}>← Run</TextLink>
        <PrintButton />
      </View>
      <Heading level={1}>{`Run report: ${run.inputs.scenarioName}`}</Heading>
      <Text tone="muted">{`${run.inputs.studyAreaName} · run ${run.id} · ${run.steps} steps × ${run.replicates} replicates`}</Text>
      <RunCaution />
      {finished ? null : (
        <Banner tone="warning" title="No results">{`Run ${run.id} is ${run.status}: a report can be made once it has succeeded.`}</Banner>
      )}
      {summary.error ? <QueryErrorState what="the run's results" error={summary.error} onRetry={() => void summary.refetch()} /> : null}
      {finished && summary.isPending ? <LoadingState label="Loading the results…" /> : null}
      {summary.data ? <ReportBody run={run} summary={summary.data} /> : null}
    </>
  );
}

/** A printable report of one run: inputs, shares, chart, maps and the caution. */
export function RunReportScreen(): ReactElement {
  const run = useRun(useNumericParam('runId'));
  return (
    <Screen title={run.data ? `Report of run ${run.data.id}` : 'Run report'}>
      <PrintStyle />
      {run.error ? <QueryErrorState what="the run" error={run.error} onRetry={() => void run.refetch()} /> : null}
      {run.isPending ? <LoadingState label="Loading the run…" /> : null}
      {run.data ? <Report run={run.data} /> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  controls: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.md },
  maps: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
});
