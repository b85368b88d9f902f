import type { ReactElement, ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { colors } from '@/components/theme';
import { useBreakpoint } from '@/components/useBreakpoint';
import type { User } from '@/shared/schemas';

import { NavRail } from './NavRail';
import { TabBar } from './TabBar';
import { TopBar } from './TopBar';
import { useNavEntries } from './navEntries';

export type AppShellProps = { user: User; children: ReactNode };

/** The signed-in frame: bottom tabs on phones, a left rail from 1024 px. */
export function AppShell({ user, children }: AppShellProps): ReactElement {
  const { isWide } = useBreakpoint();
  const entries = useNavEntries();
  if (isWide) {
    return (
      <View style={[styles.fill, styles.row]}>
        <NavRail entries={entries} user={user} />
        <View role="main" style={styles.fill}>
          {children}
        </View>
      </View>
    );
  }
  return (
    <View style={styles.fill}>
      <TopBar />
      <View role="main" style={styles.fill}>
        {children}
      </View>
      <TabBar entries={entries} />
    </View>
  );
}

const styles = StyleSheet.create({
  fill: { flex: 1, backgroundColor: colors.sand },
  row: { flexDirection: 'row' },
});
