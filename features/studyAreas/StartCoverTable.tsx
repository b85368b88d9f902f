import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { colors, radius, space } from '@/components/theme';
import type { AreaUnit, CoverState, StartCoverSummary } from '@/shared/schemas';

import { formatArea, formatCount, formatPercent } from './formatArea';

export type StartCoverTableProps = { states: ReadonlyArray<CoverState>; startCover: StartCoverSummary; unit: AreaUnit };

/** Patches and area per cover state at step 0, as a table and a bar of area shares. */
export function StartCoverTable({ states, startCover, unit }: StartCoverTableProps): ReactElement {
  const total = startCover.areaM2.reduce((sum, area) => sum + area, 0);
  const share = (i: number): number => (total > 0 ? startCover.areaM2[i] / total : 0);
  return (
    <View style={styles.box}>
      <View style={styles.bar} role="img" aria-label="Area share per cover state at step 0">
        {states.map((state, i) => (share(i) > 0 ? <View key={state.code} style={{ flex: share(i), backgroundColor: state.colour }} /> : null))}
      </View>
      <View role="table" aria-label="Start cover per state">
        <View role="row" style={[styles.row, styles.header]}>
          <Text role="columnheader" variant="tiny" tone="muted" style={styles.state}>
            Cover state
          </Text>
          <Text role="columnheader" variant="tiny" tone="muted" style={styles.figure}>
            Patches
          </Text>
          <Text role="columnheader" variant="tiny" tone="muted" style={styles.figure}>
            Area
          </Text>
          <Text role="columnheader" variant="tiny" tone="muted" style={styles.share}>
            Share
          </Text>
        </View>
        {states.map((state, i) => (
          <View key={state.code} role="row" style={styles.row}>
            <View role="cell" style={[styles.state, styles.stateCell]}>
              <View style={[styles.swatch, { backgroundColor: state.colour }]} />
              <Text variant="small" style={styles.stateName}>
                {state.name}
              </Text>
            </View>
            <Text role="cell" variant="mono" style={styles.figure}>
              {formatCount(startCover.patches[i] ?? 0)}
            </Text>
            <Text role="cell" variant="mono" style={styles.figure}>
              {formatArea(startCover.areaM2[i] ?? 0, unit)}
            </Text>
            <Text role="cell" variant="mono" style={styles.share}>
              {formatPercent(share(i))}
            </Text>
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  bar: { flexDirection: 'row', height: 14, borderRadius: radius.sm, overflow: 'hidden', backgroundColor: colors.line },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.sm, paddingVertical: space.xs, borderBottomWidth: 1, borderBottomColor: colors.line },
  header: { paddingBottom: space.xxs },
  state: { flex: 2 },
  stateCell: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  stateName: { flexShrink: 1 },
  swatch: { width: 12, height: 12, borderRadius: radius.sm },
  figure: { flex: 1.2, textAlign: 'right' },
  share: { flex: 0.9, textAlign: 'right' },
});
