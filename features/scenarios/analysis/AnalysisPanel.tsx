import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/Banner';
import { Card } from '@/components/Card';
import { Heading } from '@/components/Heading';
import { Text } from '@/components/Text';
import { space } from '@/components/theme';
import type { AreaUnit, CoverState, ScenarioUncertainty } from '@/shared/schemas';

import { FORECAST_CAUTION } from './caution';
import { ExpectedPathChart } from './ExpectedPathChart';
import type { AnalysisView } from './liveAnalysis';
import { PhaseAnalysisSection } from './PhaseAnalysisSection';
import type { ShareRange } from './LongRunTable';
import { UncertaintyNote } from './UncertaintyNote';

export type AnalysisPanelProps = {
  states: readonly CoverState[];
  /** null while a matrix cannot be analysed; `blockedBy` says why. */
  view: AnalysisView | null;
  blockedBy: readonly string[];
  unit: AreaUnit;
  uncertainty: ScenarioUncertainty | undefined;
};

const stepRange = (from: number, to: number | null): string => (to === null ? `from step ${from} on` : `steps ${from}–${to}`);

function rangesFor(uncertainty: ScenarioUncertainty | undefined, index: number, states: readonly CoverState[]): ShareRange[] | null {
  const longRun = uncertainty?.phases.find((phase) => phase.index === index)?.longRun;
  if (!longRun) return null;
  const ranges = states.map((state) => longRun.find((range) => range.state === state.name || range.state === state.code));
  return ranges.every((range) => range !== undefined) ? ranges : null;
}

/** Long-run shares, settling time, residence, structure in words and the expected path, with the caution. */
export function AnalysisPanel({ states, view, blockedBy, unit, uncertainty }: AnalysisPanelProps): ReactElement {
  const withRanges = view?.phases.some((phase) => rangesFor(uncertainty, phase.index, states) !== null) ?? false;
  const edited = uncertainty?.phases.some((phase) => phase.longRun && !phase.matrixMatchesSurvey) ?? false;
  return (
    <Card>
      <Heading level={2}>Analysis</Heading>
      {view ? (
        <>
          <Text variant="small" tone="muted">
            {view.source === 'server'
              ? 'For the saved scenario, computed on the server.'
              : 'Live: computed in your browser from the matrices as they are now (not yet saved).'}
          </Text>
          <View style={styles.block}>
            <Heading level={3}>Expected path</Heading>
            <Text variant="small" tone="muted">
              {`Share of the area in each state, x_t = x_0 P^t, over ${view.expectedPath.length - 1} steps (${(view.expectedPath.length - 1) * view.yearsPerStep} years).`}
            </Text>
            <ExpectedPathChart states={states} path={view.expectedPath} phaseStarts={view.phases.map((phase) => phase.fromStep)} />
          </View>
          {view.phases.map((phase) => (
            <PhaseAnalysisSection
              key={phase.index}
              states={states}
              phase={phase}
              title={view.phases.length > 1 ? `Phase ${phase.index + 1}, ${stepRange(phase.fromStep, phase.toStep)}` : null}
              yearsPerStep={view.yearsPerStep}
              unit={unit}
              ranges={rangesFor(uncertainty, phase.index, states)}
            />
          ))}
          {uncertainty && withRanges ? <UncertaintyNote uncertainty={uncertainty} /> : null}
          {edited ? (
            <Banner tone="warning">A matrix was edited after it was taken from its survey: its ranges describe the survey's estimate, not the edited matrix.</Banner>
          ) : null}
        </>
      ) : (
        <Banner tone="warning" title="Nothing to analyse yet">
          <View style={styles.block}>
            {blockedBy.map((line) => (
              <Text key={line} variant="small">
                {`• ${line}`}
              </Text>
            ))}
          </View>
        </Banner>
      )}
      <Banner tone="info" title="Read with care">
        {FORECAST_CAUTION}
      </Banner>
    </Card>
  );
}

const styles = StyleSheet.create({ block: { gap: space.xs } });
