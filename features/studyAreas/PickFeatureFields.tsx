import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/Button';
import { TextField } from '@/components/TextField';
import { Toggle } from '@/components/Toggle';
import { space } from '@/components/theme';

export type FeaturePick = { enabled: boolean; property: string; value: string };

export type PickFeatureFieldsProps = {
  pick: FeaturePick;
  onChange: (pick: FeaturePick) => void;
  /** Reads the file again with the pick. */
  onApply: () => void;
  busy: boolean;
};

/** Advanced: keep one polygon feature, named by a property value, instead of merging them all. */
export function PickFeatureFields({ pick, onChange, onApply, busy }: PickFeatureFieldsProps): ReactElement {
  return (
    <View style={styles.box}>
      <Toggle
        label="Keep one feature only"
        hint="Files with several polygon features are merged into one boundary. Name a property and its value to keep just one."
        value={pick.enabled}
        onChange={(enabled) => onChange({ ...pick, enabled })}
      />
      {pick.enabled ? (
        <>
          <View style={styles.fields}>
            <View style={styles.field}>
              <TextField label="Property" value={pick.property} onChangeText={(property) => onChange({ ...pick, property })} placeholder="UNIT_NAME" />
            </View>
            <View style={styles.field}>
              <TextField label="Value" value={pick.value} onChangeText={(value) => onChange({ ...pick, value })} placeholder="North pasture" />
            </View>
          </View>
          <Button label="Read the file with this pick" variant="secondary" size="sm" busy={busy} onPress={onApply} />
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  fields: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  field: { flexBasis: 200, flexGrow: 1 },
});
