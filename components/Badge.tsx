import type { ReactElement } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from './Text';
import { colors, radius, space } from './theme';

export type BadgeTone = 'primary' | 'accent' | 'info' | 'neutral' | 'danger';

export type BadgeProps = { label: string; tone?: BadgeTone };

const look: Record<BadgeTone, { bg: string; fg: string }> = {
  primary: { bg: colors.sageTint, fg: colors.sageDark },
  accent: { bg: colors.ochreTint, fg: '#7A4413' },
  info: { bg: colors.lakeTint, fg: colors.lake },
  neutral: { bg: colors.sand, fg: colors.basaltMuted },
  danger: { bg: colors.rustTint, fg: colors.rust },
};

/** A small pill label, e.g. a team role or an account state. */
export function Badge({ label, tone = 'neutral' }: BadgeProps): ReactElement {
  const { bg, fg } = look[tone];
  return (
    <View style={[styles.pill, { backgroundColor: bg }]}>
      <Text variant="tiny" weight="medium" style={{ color: fg }}>
        {label}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  pill: {
    alignSelf: 'flex-start',
    borderRadius: radius.pill,
    paddingHorizontal: space.sm,
    paddingVertical: space.xxs,
  },
});
