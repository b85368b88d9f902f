import type { Dispatch, ReactElement } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { colors, space } from '@/components/theme';
import { useBreakpoint } from '@/components/useBreakpoint';
import type { CoverState } from '@/shared/schemas';

import { StateTag } from '../StateTag';
import { CELL_HEIGHT, CELL_WIDTH, MatrixCell } from './MatrixCell';
import { shownText, storedCell, type MatrixEditorAction, type MatrixEditorState, type MatrixReading } from './matrixEditorState';
import { RowSum } from './RowSum';

export type MatrixGridProps = {
  states: readonly CoverState[];
  editor: MatrixEditorState;
  reading: MatrixReading;
  dispatch: Dispatch<MatrixEditorAction>;
  readOnly: boolean;
};

/**
 * The entries as a grid in the chosen orientation: rows = from (sums in a last column) or
 * transposed, rows = to (sums of each from-state in a last row). Scrolls sideways on phones.
 */
export function MatrixGrid({ states, editor, reading, dispatch, readOnly }: MatrixGridProps): ReactElement {
  const { isWide } = useBreakpoint();
  const byRows = editor.orientation === 'rows';
  const labelWidth = isWide ? 200 : 108;
  const indices = states.map((_, i) => i);
  const sumOf = (from: number): ReactElement => <RowSum check={reading.rows[from]} fromName={states[from].name} />;
  return (
    <ScrollView horizontal contentContainerStyle={styles.scroll}>
      <View role="table" aria-label={byRows ? 'Transition probabilities, rows = from' : 'Transition probabilities, rows = to'}>
        <View role="row" style={styles.row}>
          <View style={[styles.corner, { width: labelWidth }]}>
            <Text variant="tiny" tone="muted">{byRows ? 'from ↓   to →' : 'to ↓   from →'}</Text>
          </View>
          {indices.map((col) => (
            <View key={col} role="columnheader" style={styles.columnHead}>
              <StateTag state={states[col]} />
            </View>
          ))}
          {byRows ? (
            <View role="columnheader" style={styles.columnHead}>
              <Text variant="tiny" tone="muted" weight="medium">
                Row sum
              </Text>
            </View>
          ) : null}
        </View>
        {indices.map((row) => (
          <View key={row} role="row" style={styles.row}>
            <View role="rowheader" style={[styles.rowHead, { width: labelWidth }]}>
              <StateTag state={states[row]} withName stacked={!isWide} />
            </View>
            {indices.map((col) => {
              const { from, to } = storedCell(editor.orientation, { row, col });
              return (
                <MatrixCell
                  key={col}
                  label={`From ${states[from].name} to ${states[to].name}`}
                  text={shownText(editor, { row, col })}
                  issue={reading.cells[from][to].issue}
                  readOnly={readOnly}
                  onChange={(text) => dispatch({ type: 'edit', from, to, text })}
                  onPasteBlock={(text) => dispatch({ type: 'paste', at: { row, col }, text })}
                />
              );
            })}
            {byRows ? sumOf(row) : null}
          </View>
        ))}
        {byRows ? null : (
          <View role="row" style={styles.row}>
            <View style={[styles.rowHead, { width: labelWidth }]}>
              <Text variant="tiny" tone="muted" weight="medium">
                Sum of each from-state
              </Text>
            </View>
            {indices.map((from) => (
              <View key={from}>{sumOf(from)}</View>
            ))}
          </View>
        )}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { paddingBottom: space.xs },
  row: { flexDirection: 'row', alignItems: 'center', gap: space.xs, marginBottom: space.xs },
  corner: { justifyContent: 'flex-end', paddingRight: space.sm },
  columnHead: { width: CELL_WIDTH, justifyContent: 'flex-end', alignItems: 'flex-end', paddingBottom: space.xxs },
  rowHead: {
    minHeight: CELL_HEIGHT,
    justifyContent: 'center',
    paddingRight: space.sm,
    borderRightWidth: 1,
    borderRightColor: colors.line,
  },
});
