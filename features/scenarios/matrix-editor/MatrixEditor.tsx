import type { Dispatch, ReactElement } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { Banner } from '@/components/Banner';
import { Text } from '@/components/Text';
import { space } from '@/components/theme';
import type { CoverState } from '@/shared/schemas';

import { saveTextFile } from '../saveTextFile';
import { exportMatrixCsv } from './matrixCsvIO';
import type { MatrixEditorAction, MatrixEditorState, MatrixReading } from './matrixEditorState';
import { MatrixGrid } from './MatrixGrid';
import { MatrixIssues } from './MatrixIssues';
import { MatrixToolbar } from './MatrixToolbar';

export type MatrixEditorProps = {
  states: readonly CoverState[];
  editor: MatrixEditorState;
  reading: MatrixReading;
  dispatch: Dispatch<MatrixEditorAction>;
  readOnly?: boolean;
  /** Name of the downloaded CSV, e.g. "current-grazing-phase-1.csv". */
  fileName: string;
};

/**
 * The transition-matrix editor: a grid of probabilities with from/to labels, live row sums,
 * marked entries, spreadsheet paste, CSV in and out, orientation, normalise and undo.
 */
export function MatrixEditor({ states, editor, reading, dispatch, readOnly = false, fileName }: MatrixEditorProps): ReactElement {
  const valid = reading.matrix;
  const onExport = valid ? () => saveTextFile(fileName, exportMatrixCsv(states, valid)) : null;
  return (
    <View style={styles.box}>
      <MatrixToolbar editor={editor} dispatch={dispatch} readOnly={readOnly} onExport={onExport} />
      {readOnly ? null : (
        <Text variant="small" tone="muted">
          Each row holds the chances of moving from one state to each state in one step. Paste a block copied from a
          spreadsheet into any entry to fill from there.
        </Text>
      )}
      {editor.notice ? (
        <Banner tone={editor.notice.tone === 'danger' ? 'danger' : 'info'} live>
          <View style={styles.notice}>
            <Text variant="small" style={styles.noticeText}>
              {editor.notice.text}
            </Text>
            <Pressable role="button" aria-label="Dismiss message" onPress={() => dispatch({ type: 'dismissNotice' })} style={styles.dismiss}>
              <Text variant="small" weight="medium">
                ✕
              </Text>
            </Pressable>
          </View>
        </Banner>
      ) : null}
      <MatrixGrid states={states} editor={editor} reading={reading} dispatch={dispatch} readOnly={readOnly} />
      <MatrixIssues states={states} reading={reading} />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  notice: { flexDirection: 'row', alignItems: 'center', gap: space.sm },
  noticeText: { flex: 1 },
  dismiss: { minWidth: 44, minHeight: 44, alignItems: 'center', justifyContent: 'center' },
});
