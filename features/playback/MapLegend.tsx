import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { colors, radius, space } from '@/components/theme';
import type { AreaUnit, CoverState } from '@/shared/schemas';
import { formatArea, formatPercent } from '@/features/studyAreas/formatArea';

import type { StateTotal } from './frameTotals';

export type MapLegendProps = { coverStates: readonly CoverState[]; totals: readonly StateTotal[] | null; unit: AreaUnit };

/** Each state's swatch, name, and its area and share at the shown step. */
export function MapLegend({ coverStates, totals, unit }: MapLegendProps): ReactElement {
  return (
    <View role="list" aria-label="Legend" style={styles.list}>
      {coverStates.map((state, j) => {
        const total = totals?.[j];
        return (
          <View role="listitem" key={state.code} style={styles.row}>
            <View style={[styles.swatch, { backgroundColor: state.colour }]} />
            <Text variant="small" style={styles.name}>{`${state.name} (${state.code})`}</Text>
            <Text variant="mono">{total ? `${formatArea(total.areaM2, unit)} · ${formatPercent(total.share)}` : '—'}</Text>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  swatch: { width: 14, height: 14, borderRadius: radius.sm, borderWidth: 1, borderColor: colors.basalt },
  name: { flex: 1 },
});
