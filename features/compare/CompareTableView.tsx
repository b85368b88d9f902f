import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { colors, space } from '@/components/theme';
import type { AreaUnit } from '@/shared/schemas';
import { formatArea, formatPercent } from '@/features/studyAreas/formatArea';

import type { CompareCell, CompareRow } from './compareTable';

export type CompareTableViewProps = { rows: readonly CompareRow[]; unit: AreaUnit; compact: boolean };

const signed = (value: number, text: string): string => `${value > 0 ? '+' : value < 0 ? '−' : '±'}${text}`;
const COLUMNS = [
  { header: 'State', width: 150 },
  { header: 'Run', width: 70 },
  { header: 'Area (median)', width: 110 },
  { header: 'Share (median)', width: 110 },
  { header: 'Area vs first', width: 120 },
  { header: 'Share vs first', width: 110 },
  { header: '5–95 % bands overlap first', width: 150 },
] as const;

/** The texts of one run's row after the state: run, area, share, differences, overlap. */
function cellTexts(cell: CompareCell | null, unit: AreaUnit): string[] {
  if (!cell) return ['—', 'not in this run', '—', '—', '—', '—'];
  return [
    `Run ${cell.runId}`,
    formatArea(cell.areaM2, unit),
    formatPercent(cell.share),
    cell.areaDifferenceM2 === null ? '—' : signed(cell.areaDifferenceM2, formatArea(Math.abs(cell.areaDifferenceM2), unit)),
    cell.shareDifference === null ? '—' : signed(cell.shareDifference, `${(Math.abs(cell.shareDifference) * 100).toFixed(1)} pts`),
    cell.bandsOverlap === null ? '(reference)' : cell.bandsOverlap ? 'yes' : 'no',
  ];
}

type CellProps = { text: string; column: number; header?: boolean; compact: boolean };

function Cell({ text, column, header = false, compact }: CellProps): ReactElement {
  return (
    <View role={header ? 'columnheader' : 'cell'} style={[styles.cell, compact ? styles.compactCell : { width: COLUMNS[column].width }]}>
      {compact && !header && column > 1 ? <Text variant="tiny" tone="muted">{COLUMNS[column].header}</Text> : null}
      <Text variant={header ? 'label' : column < 2 ? 'small' : 'mono'}>{text}</Text>
    </View>
  );
}

/**
 * Per state and run at the chosen step: median area and share, differences to the first run and
 * band overlap. Wide: one line per run. Compact (phones): each run's values wrap under their headers.
 */
export function CompareTableView({ rows, unit, compact }: CompareTableViewProps): ReactElement {
  return (
    <View role="table" aria-label="Comparison at the chosen step">
      <View role="row" style={[styles.row, styles.head, compact && styles.hidden]}>
        {COLUMNS.map((column, c) => (
          <Cell key={column.header} text={column.header} column={c} header compact={false} />
        ))}
      </View>
      {rows.flatMap((row) =>
        row.cells.map((cell, r) => (
          <View role="row" key={`${row.state.code}-${r}`} style={[styles.row, compact && styles.wrap, r === 0 && styles.groupStart]}>
            <Cell text={r === 0 || compact ? row.state.name : ''} column={0} compact={compact} />
            {cellTexts(cell, unit).map((text, c) => (
              <Cell key={COLUMNS[c + 1].header} text={text} column={c + 1} compact={compact} />
            ))}
          </View>
        )),
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row' },
  wrap: { flexWrap: 'wrap', paddingVertical: space.xs },
  head: { borderBottomWidth: 1, borderColor: colors.basalt },
  hidden: { display: 'none' },
  groupStart: { borderTopWidth: 1, borderColor: colors.line },
  cell: { paddingVertical: space.xs, paddingRight: space.sm },
  compactCell: { width: '50%', paddingVertical: space.xxs },
});
