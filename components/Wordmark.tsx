import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { PatchMark } from './PatchMark';
import { Text } from './Text';
import { colors, fonts } from './theme';

export type WordmarkProps = { size?: 'md' | 'lg' };

/** The product name beside its mark. */
export function Wordmark({ size = 'md' }: WordmarkProps): ReactElement {
  const large = size === 'lg';
  return (
    <View style={styles.row}>
      <PatchMark size={large ? 34 : 26} />
      <Text style={[styles.name, large && styles.nameLarge]}>Patchcast</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: 8 },
  name: { fontFamily: fonts.semibold, fontSize: 18, lineHeight: 24, color: colors.basalt, letterSpacing: 0.2 },
  nameLarge: { fontSize: 24, lineHeight: 30 },
});
