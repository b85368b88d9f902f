import { useMemo, useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { SegmentedControl } from '@/components/SegmentedControl';
import { Text } from '@/components/Text';
import { space } from '@/components/theme';
import type { AreaUnit, Run, RunSummary } from '@/shared/schemas';
import { formatArea, formatPercent, SQUARE_METRES_PER } from '@/features/studyAreas/formatArea';

import { BandChart } from './BandChart';
import { ChartKey } from './ChartKey';
import { chartSeries, stateItems, type ChartMode } from './chartSeries';
import { longRunShares } from './longRunShares';

export type RunChartPanelProps = { run: Run; summary: RunSummary; unit: AreaUnit; cursor: number };

/** The run's area-share chart with its key, the share/area switch and the method it rests on. */
export function RunChartPanel({ run, summary, unit, cursor }: RunChartPanelProps): ReactElement {
  const [mode, setMode] = useState<ChartMode>('share');
  const longRun = useMemo(() => longRunShares(run.inputs), [run.inputs]);
  const series = useMemo(
    () => chartSeries(summary, mode, SQUARE_METRES_PER[unit], run.inputs.patchCount, longRun),
    [summary, mode, unit, run.inputs.patchCount, longRun],
  );
  const formatValue = (value: number): string => (mode === 'share' ? formatPercent(value).replace('.0 %', ' %') : formatArea(value * SQUARE_METRES_PER[unit], unit));
  return (
    <View style={styles.box}>
      <SegmentedControl
        label="Show"
        options={[
          { value: 'share', label: 'Share' },
          { value: 'area', label: `Area (${unit})` },
        ]}
        value={mode}
        onChange={setMode}
      />
      <BandChart
        items={stateItems(summary.states, series)}
        cursor={cursor}
        formatValue={formatValue}
        label={`${mode === 'share' ? 'Share' : 'Area'} of each state over ${summary.steps} steps, ${summary.replicates} replicates`}
      />
      <ChartKey />
      <Text variant="tiny" tone="muted">
        {`${summary.replicates} replicates · ${summary.method} Binomial band: N = ${run.inputs.patchCount.toLocaleString('en-US')} patches, normal approximation. ${longRun ? 'Long-run share: the last phase’s stationary distribution.' : 'No long-run share: the last phase has no unique stationary distribution.'}`}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: space.sm } });
