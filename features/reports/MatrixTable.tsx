import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { colors, space } from '@/components/theme';

export type MatrixTableProps = { caption: string; codes: readonly string[]; matrix: readonly (readonly number[])[] };

/** A transition matrix as a table: rows "from", columns "to", probabilities to 3 decimals. */
export function MatrixTable({ caption, codes, matrix }: MatrixTableProps): ReactElement {
  return (
    <View role="table" aria-label={caption} style={styles.table}>
      <Text variant="label">{caption}</Text>
      <View role="row" style={[styles.row, styles.head]}>
        <Text variant="mono" style={styles.cell}>
          from
        </Text>
        {codes.map((c) => (
          <Text key={c} role="columnheader" variant="mono" style={styles.cell}>
            {c}
          </Text>
        ))}
      </View>
      {matrix.map((row, i) => (
        <View key={codes[i]} role="row" style={styles.row}>
          <Text role="rowheader" variant="mono" style={styles.cell}>
            {codes[i]}
          </Text>
          {row.map((p, j) => (
            <Text key={codes[j]} role="cell" variant="mono" style={styles.cell}>
              {p.toFixed(3)}
            </Text>
          ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { gap: space.xxs, width: '100%', maxWidth: 440 },
  row: { flexDirection: 'row', borderBottomWidth: 1, borderBottomColor: colors.line },
  head: { borderBottomColor: colors.basaltMuted },
  cell: { flex: 1, minWidth: 0, paddingVertical: space.xxs, textAlign: 'right' },
});
