import type { ReactElement, ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from './Text';
import { colors, radius, space } from './theme';

export type BannerTone = 'info' | 'success' | 'warning' | 'danger';

export type BannerProps = {
  tone: BannerTone;
  title?: string;
  children: ReactNode;
  /** Announce to assistive technology when it appears (errors, results of an action). */
  live?: boolean;
};

const look: Record<BannerTone, { bg: string; edge: string }> = {
  info: { bg: colors.lakeTint, edge: colors.lake },
  success: { bg: colors.sageTint, edge: colors.sage },
  warning: { bg: colors.ochreTint, edge: colors.ochre },
  danger: { bg: colors.rustTint, edge: colors.rust },
};

/** A tinted notice with a coloured edge: demo-data notes, results, errors. */
export function Banner({ tone, title, children, live = false }: BannerProps): ReactElement {
  const { bg, edge } = look[tone];
  return (
    <View
      role={live ? (tone === 'danger' ? 'alert' : 'status') : undefined}
      style={[styles.banner, { backgroundColor: bg, borderLeftColor: edge }]}
    >
      {title ? <Text weight="semibold">{title}</Text> : null}
      {typeof children === 'string' ? <Text variant="small">{children}</Text> : children}
    </View>
  );
}

const styles = StyleSheet.create({
  banner: {
    borderLeftWidth: 4,
    borderRadius: radius.md,
    paddingVertical: space.sm,
    paddingHorizontal: space.md,
    gap: space.xxs,
  },
});
