import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { radius, space } from '@/components/theme';
import type { CoverState } from '@/shared/schemas';

export type StateLegendProps = { states: readonly CoverState[] };

/** The cover states' colours, for the maps. */
export function StateLegend({ states }: StateLegendProps): ReactElement {
  return (
    <View role="list" aria-label="Cover states" style={styles.legend}>
      {states.map((s) => (
        <View key={s.code} role="listitem" style={styles.item}>
          <View style={[styles.swatch, { backgroundColor: s.colour }]} />
          <Text variant="small">{`${s.name} (${s.code})`}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  swatch: { width: 14, height: 14, borderRadius: radius.sm },
});
