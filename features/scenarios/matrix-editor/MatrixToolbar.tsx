import type { Dispatch, ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/Button';
import { SegmentedControl } from '@/components/SegmentedControl';
import { space } from '@/components/theme';
import type { Orientation } from '@/shared/markov/matrixCsv';

import { pickTextFile } from '../pickTextFile';
import type { MatrixEditorAction, MatrixEditorState } from './matrixEditorState';

export type MatrixToolbarProps = {
  editor: MatrixEditorState;
  dispatch: Dispatch<MatrixEditorAction>;
  readOnly: boolean;
  /** Writes the matrix as CSV; null while the matrix is not valid. */
  onExport: (() => void) | null;
};

const orientations: ReadonlyArray<{ value: Orientation; label: string }> = [
  { value: 'rows', label: 'Rows = from' },
  { value: 'columns', label: 'Rows = to (transposed)' },
];

/** Orientation, normalise, undo, CSV in and out. Viewers keep the orientation and the download. */
export function MatrixToolbar({ editor, dispatch, readOnly, onExport }: MatrixToolbarProps): ReactElement {
  const importCsv = async (): Promise<void> => {
    const file = await pickTextFile();
    if (file) dispatch({ type: 'importCsv', text: file.text });
  };
  return (
    <View style={styles.box}>
      <SegmentedControl
        label="Show and import as"
        size="md"
        options={orientations}
        value={editor.orientation}
        onChange={(orientation) => dispatch({ type: 'orient', orientation })}
      />
      <View style={styles.actions}>
        {readOnly ? null : (
          <>
            <Button label="Normalise rows" variant="secondary" onPress={() => dispatch({ type: 'normalise' })} />
            <Button label="Undo" variant="secondary" disabled={editor.past.length === 0} onPress={() => dispatch({ type: 'undo' })} />
            <Button label="Import CSV" variant="secondary" onPress={() => void importCsv()} />
          </>
        )}
        <Button label="Export CSV" variant="secondary" disabled={onExport === null} onPress={() => onExport?.()} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
