import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { space } from '@/components/theme';
import type { CoverState } from '@/shared/schemas';

import type { MatrixReading } from './matrixEditorState';

export type MatrixIssuesProps = { states: readonly CoverState[]; reading: MatrixReading };

/** What is wrong, entry by entry and row by row, in words (the marks in the grid are not enough). */
export function MatrixIssues({ states, reading }: MatrixIssuesProps): ReactElement | null {
  const lines = reading.cells.flatMap((row, from) => {
    const cells = row.flatMap((cell, to) => (cell.issue ? [`${states[from].code} → ${states[to].code}: ${cell.issue}`] : []));
    const sum = reading.rows[from];
    return sum.complete && sum.issue ? [...cells, `Row ${states[from].code} (${states[from].name}): ${sum.issue}`] : cells;
  });
  if (lines.length === 0) return null;
  return (
    <View role="alert" style={styles.box} aria-label="Entries to fix">
      <Text variant="small" tone="danger" weight="semibold">
        {lines.length === 1 ? 'One thing to fix' : `${lines.length} things to fix`}
      </Text>
      {lines.map((line) => (
        <Text key={line} variant="small" tone="danger">
          {`• ${line}`}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: space.xxs } });
