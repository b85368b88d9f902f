import { useState, type ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/Button';
import { Text } from '@/components/Text';
import { space } from '@/components/theme';

import { formatBytes } from './formatArea';
import { pickFile, type PickedFile } from './pickFile';

export type FilePickFieldProps = {
  label: string;
  hint: string;
  file: PickedFile | null;
  onPicked: (file: PickedFile) => void;
  busy?: boolean;
};

/** Choose a file with the system chooser; shows the chosen file's name and size. */
export function FilePickField({ label, hint, file, onPicked, busy = false }: FilePickFieldProps): ReactElement {
  const [opening, setOpening] = useState(false);
  const choose = (): void => {
    setOpening(true);
    pickFile()
      .then((picked) => {
        if (picked) onPicked(picked);
      })
      .finally(() => setOpening(false));
  };
  return (
    <View style={styles.field}>
      <Text variant="label">{label}</Text>
      <View style={styles.row}>
        <Button label={file ? 'Choose another file' : 'Choose a file'} variant="secondary" size="sm" busy={busy || opening} onPress={choose} />
        {file ? <Text variant="mono" style={styles.name}>{`${file.name} · ${formatBytes(file.size)}`}</Text> : null}
      </View>
      <Text variant="small" tone="muted">
        {hint}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: space.xs },
  row: { flexDirection: 'row', alignItems: 'center', flexWrap: 'wrap', gap: space.sm },
  name: { flexShrink: 1 },
});
