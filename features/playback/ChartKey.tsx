import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { Line, Rect } from 'react-native-svg';

import { Text } from '@/components/Text';
import { colors, space } from '@/components/theme';

import { DASH } from './BandChart';

type KeyItem = { label: string; mark: ReactElement };

const ITEMS: KeyItem[] = [
  { label: 'Replicates 5–95 %', mark: <Rect x={0} y={2} width={24} height={8} fill={colors.basaltMuted} fillOpacity={0.3} /> },
  { label: 'Median of replicates', mark: <Line x1={0} x2={24} y1={6} y2={6} stroke={colors.basalt} strokeWidth={2} /> },
  { label: 'Expected path', mark: <Line x1={0} x2={24} y1={6} y2={6} stroke={colors.basalt} strokeWidth={1.2} strokeDasharray={DASH.expected} /> },
  { label: 'Binomial 95 % band', mark: <Line x1={0} x2={24} y1={6} y2={6} stroke={colors.basalt} strokeWidth={0.8} strokeDasharray={DASH.reference} /> },
  { label: 'Long-run share', mark: <Line x1={0} x2={24} y1={6} y2={6} stroke={colors.basalt} strokeWidth={1.5} strokeDasharray={DASH.level} /> },
];

/** What each line and band of the area-share chart means. */
export function ChartKey(): ReactElement {
  return (
    <View style={styles.row}>
      {ITEMS.map((item) => (
        <View key={item.label} style={styles.item}>
          <Svg width={24} height={12}>{item.mark}</Svg>
          <Text variant="tiny">{item.label}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  item: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
});
