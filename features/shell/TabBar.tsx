import { usePathname } from 'expo-router';
import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';

import { colors } from '@/components/theme';

import { NavLink } from './NavLink';
import { isActive, type NavEntry } from './navEntries';
import { SHELL_CHROME_IDS } from './printHidden';

export type TabBarProps = { entries: NavEntry[] };

/** Bottom tabs for phones and narrow windows. */
export function TabBar({ entries }: TabBarProps): ReactElement {
  const pathname = usePathname();
  const { bottom } = useSafeAreaInsets();
  return (
    <View nativeID={SHELL_CHROME_IDS.tabBar} role="navigation" aria-label="Main" style={[styles.bar, { paddingBottom: bottom }]}>
      {entries.map((entry) => (
        <NavLink key={entry.href} entry={entry} layout="tab" active={isActive(entry, pathname)} />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    flexDirection: 'row',
    backgroundColor: colors.surface,
    borderTopWidth: 1,
    borderTopColor: colors.line,
  },
});
