import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { colors, radius, space } from '@/components/theme';
import type { Run } from '@/shared/schemas';

import { progressText } from './progressText';

export type ProgressBarProps = { run: Run };

/** Percent done as a bar, with the percent and the time left in words. */
export function ProgressBar({ run }: ProgressBarProps): ReactElement {
  const percent = run.status === 'succeeded' ? 100 : run.progress.percent;
  const fill = run.status === 'failed' ? colors.rust : run.status === 'cancelled' ? colors.basaltMuted : colors.sage;
  return (
    <View style={styles.box}>
      <View style={styles.track} role="progressbar" aria-valuemin={0} aria-valuemax={100} aria-valuenow={percent} aria-label={`Run ${run.id} progress`}>
        <View style={[styles.fill, { width: `${percent}%`, backgroundColor: fill }]} />
      </View>
      <Text variant="small" tone="muted" role="status">
        {progressText(run)}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs },
  track: { height: 8, borderRadius: radius.pill, backgroundColor: colors.line, overflow: 'hidden' },
  fill: { height: '100%', borderRadius: radius.pill },
});
