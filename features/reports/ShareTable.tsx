import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { colors, radius, space } from '@/components/theme';
import type { RunSummary } from '@/shared/schemas';

import { formatShare } from './formatShare';

export type ShareTableProps = { summary: RunSummary; longRun: readonly number[] | null };

const percent = (share: number): string => (share * 100).toFixed(1);

/** Per state: share at the start, median (5–95 %) share at the last step, expected and long-run share. */
export function ShareTable({ summary, longRun }: ShareTableProps): ReactElement {
  const last = summary.steps;
  const header = ['State', 'Step 0', `Step ${last}, median (5–95 %)`, 'Expected', 'Long run'];
  return (
    <View role="table" aria-label="Area shares by cover state" style={styles.table}>
      <View role="row" style={styles.row}>
        {header.map((h, c) => (
          <Text key={h} role="columnheader" variant="tiny" weight="semibold" style={c === 0 ? styles.first : styles.cell}>
            {h}
          </Text>
        ))}
      </View>
      {summary.states.map((state, j) => {
        const s = summary.share[last][j];
        return (
          <View key={state.code} role="row" style={styles.row}>
            <View style={[styles.first, styles.state]}>
              <View style={[styles.swatch, { backgroundColor: state.colour }]} />
              <Text role="rowheader" variant="small" style={styles.name}>
                {state.name}
              </Text>
            </View>
            <Text role="cell" variant="mono" style={styles.cell}>
              {formatShare(summary.share[0][j].median)}
            </Text>
            <View role="cell" style={styles.cell}>
              <Text variant="mono" style={styles.right}>
                {formatShare(s.median)}
              </Text>
              <Text variant="tiny" tone="muted" style={styles.right}>{`${percent(s.p5)}–${percent(s.p95)}`}</Text>
            </View>
            <Text role="cell" variant="mono" style={styles.cell}>
              {formatShare(summary.expectedShare[last][j])}
            </Text>
            <Text role="cell" variant="mono" style={styles.cell}>
              {longRun ? formatShare(longRun[j]) : '—'}
            </Text>
          </View>
        );
      })}
      {longRun ? null : (
        <Text variant="small" tone="muted">
          The last phase's matrix has no unique long-run shares (more than one closed class), so none are shown.
        </Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { gap: space.xxs, width: '100%', maxWidth: 620 },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.xs, borderBottomWidth: 1, borderBottomColor: colors.line, paddingVertical: space.xxs },
  first: { flex: 1.4, minWidth: 0 },
  state: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  name: { flexShrink: 1 },
  swatch: { width: 12, height: 12, borderRadius: radius.sm },
  cell: { flex: 1, minWidth: 0, textAlign: 'right' },
  right: { textAlign: 'right' },
});
