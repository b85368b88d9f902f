import type { ReactElement, ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { space } from '@/components/theme';

export type Fact = { label: string; value: ReactNode };

export type FactListProps = { facts: ReadonlyArray<Fact>; /** One fact per line instead of a wrapping row. */ stacked?: boolean };

/** Labelled figures: the label small and muted, the value in tabular figures. */
export function FactList({ facts, stacked = false }: FactListProps): ReactElement {
  return (
    <View style={stacked ? styles.stacked : styles.row}>
      {facts.map(({ label, value }) => (
        <View key={label} style={stacked ? styles.line : styles.fact}>
          <Text variant="tiny" tone="muted" style={stacked ? styles.lineLabel : undefined}>
            {label}
          </Text>
          <View style={stacked ? styles.lineValue : undefined}>{typeof value === 'string' ? <Text variant="mono">{value}</Text> : value}</View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.xl, rowGap: space.sm },
  fact: { gap: space.xxs },
  stacked: { gap: space.sm },
  line: { flexDirection: 'row', alignItems: 'flex-start', gap: space.md },
  // Tiny labels beside small values: nudged down to share the first line's baseline.
  lineLabel: { width: 128, paddingTop: 3 },
  lineValue: { flex: 1, minWidth: 0 },
});
