import type { ReactElement } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';

import { Text } from './Text';
import { colors, space } from './theme';

export type LoadingStateProps = { label?: string };

/** A centred spinner with a short line of what is loading. */
export function LoadingState({ label = 'Loading…' }: LoadingStateProps): ReactElement {
  return (
    <View style={styles.box} role="status">
      <ActivityIndicator color={colors.sage} />
      <Text tone="muted" variant="small">
        {label}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.sm, padding: space.xl },
});
