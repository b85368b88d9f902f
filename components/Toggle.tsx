import type { ReactElement } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from './Text';
import { colors, radius, space } from './theme';

export type ToggleProps = {
  label: string;
  hint?: string;
  value: boolean;
  onChange: (value: boolean) => void;
  disabled?: boolean;
};

/** An on/off switch: the whole row is the control, named by its label. */
export function Toggle({ label, hint, value, onChange, disabled = false }: ToggleProps): ReactElement {
  return (
    <Pressable
      role="switch"
      aria-checked={value}
      aria-label={label}
      aria-disabled={disabled}
      disabled={disabled}
      onPress={() => onChange(!value)}
      style={[styles.row, disabled && styles.disabled]}
    >
      <View style={styles.text}>
        <Text weight="medium">{label}</Text>
        {hint ? (
          <Text variant="small" tone="muted">
            {hint}
          </Text>
        ) : null}
      </View>
      <View style={[styles.track, value && styles.trackOn]}>
        <View style={[styles.thumb, value && styles.thumbOn]} />
      </View>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  disabled: { opacity: 0.55 },
  text: { flex: 1, gap: space.xxs },
  track: {
    width: 44,
    height: 26,
    borderRadius: radius.pill,
    backgroundColor: colors.line,
    padding: 3,
    justifyContent: 'center',
  },
  trackOn: { backgroundColor: colors.sage },
  thumb: { width: 20, height: 20, borderRadius: radius.pill, backgroundColor: colors.surface },
  thumbOn: { alignSelf: 'flex-end' },
});
