import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Banner } from '@/components/Banner';
import { Heading } from '@/components/Heading';
import { Text } from '@/components/Text';
import { space } from '@/components/theme';
import type { AreaUnit, CoverState, PhaseAnalysis } from '@/shared/schemas';
import { formatPercent } from '@/features/studyAreas/formatArea';

import { formatStepsAndYears } from './formatSteps';
import { LongRunTable, type ShareRange } from './LongRunTable';
import { chainReadings } from './readings';

export type PhaseAnalysisSectionProps = {
  states: readonly CoverState[];
  phase: PhaseAnalysis;
  /** Shown as a heading when the scenario has more than one phase. */
  title: string | null;
  yearsPerStep: number;
  unit: AreaUnit;
  ranges: readonly ShareRange[] | null;
};

const none = (names: readonly string[]): string => (names.length === 0 ? 'none' : names.join(', '));

/** One phase's chain: structure in words, long-run shares, mixing, residence, absorbing and transient states. */
export function PhaseAnalysisSection({ states, phase, title, yearsPerStep, unit, ranges }: PhaseAnalysisSectionProps): ReactElement {
  const { chain } = phase;
  const readings = chainReadings(chain);
  const settled = chain.stationary !== null && chain.mixingTime !== null;
  return (
    <View style={styles.box}>
      {title ? <Heading level={3}>{title}</Heading> : null}
      {readings.map((reading) => (
        <Banner key={reading} tone={chain.classes.closed.length > 1 || chain.period.some((p) => p.period > 1) ? 'warning' : 'info'}>
          {reading}
        </Banner>
      ))}
      <View style={styles.facts}>
        <Text variant="small">
          <Text variant="small" weight="semibold">
            Settles within 1 %:{' '}
          </Text>
          {settled
            ? `after ${formatStepsAndYears(phase.chain.mixingTime, yearsPerStep)}, from the expected cover at step ${phase.fromStep}`
            : 'no (no single long-run mix, or not within the step limit)'}
        </Text>
        <Text variant="small">
          <Text variant="small" weight="semibold">
            Absorbing states:{' '}
          </Text>
          {none(chain.absorbing)}
        </Text>
        <Text variant="small">
          <Text variant="small" weight="semibold">
            Transient states:{' '}
          </Text>
          {none(chain.classes.transient)}
        </Text>
      </View>
      <LongRunTable states={states} phase={phase} yearsPerStep={yearsPerStep} unit={unit} ranges={ranges} />
      {chain.stationary === null
        ? chain.stationaryByClass.map((group) => (
            <Text key={group.class.join('|')} variant="small">
              {`If the land ends up in {${group.class.join(', ')}}: ${group.class
                .map((name) => `${name} ${formatPercent(group.distribution[chain.states.indexOf(name)])}`)
                .join(', ')}`}
            </Text>
          ))
        : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  facts: { gap: space.xxs },
});
