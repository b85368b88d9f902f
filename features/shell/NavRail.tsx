import { usePathname } from 'expo-router';
import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/Text';
import { Wordmark } from '@/components/Wordmark';
import { colors, space } from '@/components/theme';
import type { User } from '@/shared/schemas';

import { NavLink } from './NavLink';
import { isActive, type NavEntry } from './navEntries';
import { SHELL_CHROME_IDS } from './printHidden';

export type NavRailProps = { entries: NavEntry[]; user: User };

/** The left rail on windows 1024 px and wider. */
export function NavRail({ entries, user }: NavRailProps): ReactElement {
  const pathname = usePathname();
  return (
    <View nativeID={SHELL_CHROME_IDS.rail} style={styles.rail}>
      <View style={styles.brand}>
        <Wordmark />
      </View>
      <View role="navigation" aria-label="Main" style={styles.links}>
        {entries.map((entry) => (
          <NavLink key={entry.href} entry={entry} layout="rail" active={isActive(entry, pathname)} />
        ))}
      </View>
      <View style={styles.person}>
        <Text variant="small" weight="medium" numberOfLines={1}>
          {user.name}
        </Text>
        <Text variant="tiny" tone="muted" numberOfLines={1}>
          {user.email}
        </Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  rail: {
    width: 232,
    backgroundColor: colors.surface,
    borderRightWidth: 1,
    borderRightColor: colors.line,
    paddingVertical: space.lg,
    paddingHorizontal: space.md,
    gap: space.xl,
  },
  brand: { paddingHorizontal: space.sm },
  links: { gap: space.xs, flex: 1 },
  person: { paddingHorizontal: space.sm, gap: space.xxs },
});
