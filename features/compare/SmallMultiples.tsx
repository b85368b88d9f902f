import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { space } from '@/components/theme';
import type { RunSummary } from '@/shared/schemas';
import { BandChart, type BandChartItem } from '@/features/playback/BandChart';
import { formatPercent } from '@/features/studyAreas/formatArea';

import { RUN_LOOKS } from './compareStyle';

export type SmallMultiplesProps = { summaries: readonly RunSummary[]; cursor: number; columns: number };

const percent = (share: number): string => formatPercent(share).replace('.0 %', ' %');

/** One chart per state (the first run's states): per run its share's 5–95 % band and median. */
function itemsFor(summaries: readonly RunSummary[], code: string): BandChartItem[] {
  return summaries.flatMap((summary, r) => {
    const k = summary.states.findIndex((state) => state.code === code);
    if (k < 0) return [];
    const look = RUN_LOOKS[r % RUN_LOOKS.length];
    return [
      {
        key: String(summary.runId),
        label: `Run ${summary.runId}`,
        colour: look.colour,
        dash: look.dash,
        low: summary.share.map((row) => row[k].p5),
        high: summary.share.map((row) => row[k].p95),
        middle: summary.share.map((row) => row[k].median),
      },
    ];
  });
}

/** Small multiples: a share chart per state with one band and median line per run. */
export function SmallMultiples({ summaries, cursor, columns }: SmallMultiplesProps): ReactElement {
  const states = summaries[0]?.states ?? [];
  return (
    <View style={styles.grid}>
      {states.map((state) => (
        <View key={state.code} style={[styles.cell, { width: `${100 / columns - 2}%` }]}>
          <Text variant="label">{`${state.name} (${state.code}) — share, median and 5–95 % of replicates`}</Text>
          <BandChart items={itemsFor(summaries, state.code)} cursor={cursor} formatValue={percent} height={180} label={`Share of ${state.name} by run`} />
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg },
  cell: { gap: space.xs, minWidth: 0 },
});
