import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { Wordmark } from '@/components/Wordmark';
import { colors, space } from '@/components/theme';

import { SHELL_CHROME_IDS } from './printHidden';

/** The slim brand bar above the content on phones. */
export function TopBar(): ReactElement {
  const { top } = useSafeAreaInsets();
  return (
    <View nativeID={SHELL_CHROME_IDS.topBar} style={[styles.bar, { paddingTop: top + space.sm }]}>
      <Wordmark />
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    paddingHorizontal: space.lg,
    paddingBottom: space.sm,
    backgroundColor: colors.surface,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
  },
});
