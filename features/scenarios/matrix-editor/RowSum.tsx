import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { colors, radius, space } from '@/components/theme';

import { formatSum, type RowCheck } from './cellCheck';
import { CELL_HEIGHT, CELL_WIDTH } from './MatrixCell';

export type RowSumProps = { check: RowCheck; fromName: string };

/** The live, compensated sum of one from-state's probabilities, with "= 1" or "≠ 1" in words too. */
export function RowSum({ check, fromName }: RowSumProps): ReactElement {
  const ok = check.issue === null;
  return (
    <View
      accessibilityLabel={`Sum from ${fromName}: ${formatSum(check.sum)}${ok ? '' : `. ${check.issue}`}`}
      style={[styles.box, !ok && styles.bad]}
    >
      <Text variant="mono" tone={ok ? 'default' : 'danger'}>
        {check.complete ? formatSum(check.sum) : '—'}
      </Text>
      <Text variant="tiny" tone={ok ? 'muted' : 'danger'} weight="medium">
        {ok ? '= 1' : '≠ 1'}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    width: CELL_WIDTH,
    height: CELL_HEIGHT,
    alignItems: 'flex-end',
    justifyContent: 'center',
    paddingHorizontal: space.xs,
    borderRadius: radius.sm,
  },
  bad: { backgroundColor: colors.rustTint },
});
