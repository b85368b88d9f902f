import { Link } from 'expo-router';
import type { ReactElement } from 'react';
import { Pressable, StyleSheet, Text } from 'react-native';

import { colors, fonts, radius, space, typeScale } from '@/components/theme';

import { NavIcon } from './NavIcon';
import type { NavEntry } from './navEntries';

export type NavLinkProps = { entry: NavEntry; active: boolean; layout: 'tab' | 'rail' };

/** One navigation entry: a real link with an icon and its label, marked as the current page.
 * Link's `asChild` slot needs a flat style object, not an array. */
export function NavLink({ entry, active, layout }: NavLinkProps): ReactElement {
  const tint = active ? colors.sageDark : colors.basaltMuted;
  const rail = layout === 'rail';
  return (
    <Link href={entry.href} asChild>
      <Pressable
        aria-current={active ? 'page' : undefined}
        style={StyleSheet.flatten([rail ? styles.rail : styles.tab, active && (rail ? styles.railActive : styles.tabActive)])}
      >
        <NavIcon name={entry.icon} color={tint} size={rail ? 20 : 22} />
        <Text numberOfLines={1} style={[rail ? styles.railLabel : styles.tabLabel, { color: tint }, active && styles.activeLabel]}>
          {entry.label}
        </Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  tab: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.xxs, paddingTop: space.sm, paddingBottom: space.xs, minHeight: 56 },
  tabActive: { borderTopWidth: 2, borderTopColor: colors.sage, paddingTop: space.sm - 2 },
  tabLabel: { fontFamily: fonts.medium, ...typeScale.tiny },
  rail: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.md,
    paddingHorizontal: space.md,
    minHeight: 40,
    borderRadius: radius.md,
  },
  railActive: { backgroundColor: colors.sageTint },
  railLabel: { fontFamily: fonts.medium, ...typeScale.body },
  activeLabel: { fontFamily: fonts.semibold },
});
