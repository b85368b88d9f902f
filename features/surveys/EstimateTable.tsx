import { useState, type ReactElement } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import { SegmentedControl } from '@/components/SegmentedControl';
import { Text } from '@/components/Text';
import { colors, space } from '@/components/theme';
import type { CoverState, SurveyEstimate } from '@/shared/schemas';

import { StateTag } from '../scenarios/StateTag';

export type EstimateTableProps = { states: readonly CoverState[]; estimate: SurveyEstimate };

type Kind = 'wilson' | 'goodman';
const kinds = [
  { value: 'wilson', label: 'Per entry (Wilson)' },
  { value: 'goodman', label: 'Whole row at once (Goodman)' },
] as const;

const fixed = (value: number | null): string => (value === null ? '—' : value.toFixed(3));

/** The estimated matrix: p̂ = n_ij / n_i per entry with its interval and count; rows without data say so. */
export function EstimateTable({ states, estimate }: EstimateTableProps): ReactElement {
  const [kind, setKind] = useState<Kind>('wilson');
  const lower = kind === 'wilson' ? estimate.lower : estimate.simultaneous.lower;
  const upper = kind === 'wilson' ? estimate.upper : estimate.simultaneous.upper;
  const level = `${Math.round(estimate.confidenceLevel * 100)} %`;
  return (
    <View style={styles.box}>
      <SegmentedControl label={`${level} intervals`} size="md" options={kinds} value={kind} onChange={setKind} />
      <ScrollView horizontal>
        <View role="table" aria-label="Estimated transition matrix">
          <View role="row" style={styles.row}>
            <View style={styles.head}>
              <Text variant="tiny" tone="muted">
                from ↓   to →
              </Text>
            </View>
            {states.map((state) => (
              <View key={state.code} role="columnheader" style={styles.cell}>
                <StateTag state={state} />
              </View>
            ))}
          </View>
          {states.map((from, i) => {
            const n = estimate.counts[i].reduce((sum, count) => sum + count, 0);
            return (
              <View key={from.code} role="row" style={[styles.row, styles.body]}>
                <View role="rowheader" style={styles.head}>
                  <StateTag state={from} withName stacked />
                  <Text variant="tiny" tone="muted">{`${n} transitions`}</Text>
                </View>
                {states.map((to, j) => (
                  <View key={to.code} role="cell" style={styles.cell} aria-label={`From ${from.name} to ${to.name}`}>
                    {n === 0 ? (
                      <Text variant="tiny" tone="danger">
                        no data
                      </Text>
                    ) : (
                      <>
                        <Text variant="mono">{fixed(estimate.matrix[i][j])}</Text>
                        <Text variant="tiny" tone="muted" style={styles.mono}>{`${fixed(lower[i][j])}–${fixed(upper[i][j])}`}</Text>
                        <Text variant="tiny" tone="muted" style={styles.mono}>{`${estimate.counts[i][j]} of ${n}`}</Text>
                      </>
                    )}
                  </View>
                ))}
              </View>
            );
          })}
        </View>
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm },
  row: { flexDirection: 'row', alignItems: 'center' },
  body: { borderTopWidth: 1, borderTopColor: colors.line, minHeight: 56 },
  head: { width: 120, paddingVertical: space.xs, paddingRight: space.sm },
  cell: { width: 104, paddingVertical: space.xs, paddingHorizontal: space.xs, alignItems: 'flex-end' },
  mono: { fontVariant: ['tabular-nums'] },
});
