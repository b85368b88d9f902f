import type { ReactElement } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { colors, space } from '@/components/theme';
import type { AreaUnit, CoverState, PhaseAnalysis } from '@/shared/schemas';
import { formatArea, formatPercent } from '@/features/studyAreas/formatArea';

import { StateTag } from '../StateTag';
import { formatStepsAndYears } from './formatSteps';

export type ShareRange = { lower: number; upper: number };

export type LongRunTableProps = {
  states: readonly CoverState[];
  phase: PhaseAnalysis;
  yearsPerStep: number;
  unit: AreaUnit;
  /** 5–95 % of each long-run share from the survey's posterior, when the phase came from a survey. */
  ranges: readonly ShareRange[] | null;
};

const tenths = new Intl.NumberFormat('en-US', { minimumFractionDigits: 1, maximumFractionDigits: 1 });

/** "3.1–22.1 %": one unit sign, so the range stays on one line. */
const formatShareRange = ({ lower, upper }: ShareRange): string => `${tenths.format(lower * 100)}–${tenths.format(upper * 100)} %`;

const WIDTHS = { state: 120, share: 72, area: 92, range: 112, residence: 92 } as const;

type CellProps = { width: number; children: string; head?: boolean };

function Cell({ width, children, head = false }: CellProps): ReactElement {
  return (
    <View role={head ? 'columnheader' : 'cell'} style={[styles.cell, { width }]}>
      <Text variant={head ? 'tiny' : 'mono'} tone={head ? 'muted' : 'default'} weight={head ? 'medium' : undefined} style={styles.right}>
        {children}
      </Text>
    </View>
  );
}

/** Per state: long-run share and area in the person's unit, its survey range, and how long a patch stays. */
export function LongRunTable({ states, phase, yearsPerStep, unit, ranges }: LongRunTableProps): ReactElement {
  const { stationary, residenceSteps } = phase.chain;
  return (
    <ScrollView horizontal>
      <View role="table" aria-label="Long-run shares and residence times">
        <View role="row" style={styles.row}>
          <View role="columnheader" style={[styles.cell, { width: WIDTHS.state }]}>
            <Text variant="tiny" tone="muted" weight="medium">
              State
            </Text>
          </View>
          <Cell width={WIDTHS.share} head>Long-run share</Cell>
          <Cell width={WIDTHS.area} head>{`Area (${unit})`}</Cell>
          {ranges ? <Cell width={WIDTHS.range} head>5–95 % range</Cell> : null}
          <Cell width={WIDTHS.residence} head>Stays on average</Cell>
        </View>
        {states.map((state, i) => (
          <View key={state.code} role="row" style={[styles.row, styles.body]}>
            <View role="rowheader" style={[styles.cell, { width: WIDTHS.state }]}>
              <StateTag state={state} withName stacked />
            </View>
            <Cell width={WIDTHS.share}>{stationary ? formatPercent(stationary[i]) : '—'}</Cell>
            <Cell width={WIDTHS.area}>{phase.longRunAreaM2 ? formatArea(phase.longRunAreaM2[i], unit) : '—'}</Cell>
            {ranges ? <Cell width={WIDTHS.range}>{formatShareRange(ranges[i])}</Cell> : null}
            <Cell width={WIDTHS.residence}>{formatStepsAndYears(residenceSteps[i], yearsPerStep, '\n')}</Cell>
          </View>
        ))}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center' },
  body: { borderTopWidth: 1, borderTopColor: colors.line, minHeight: 44 },
  cell: { paddingVertical: space.xs, paddingHorizontal: space.xs },
  right: { textAlign: 'right' },
});
