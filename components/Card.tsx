import type { ReactElement, ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { colors, radius, space } from './theme';

export type CardProps = { children: ReactNode };

/** A surface panel with a hairline border; stacks its children with a gap. */
export function Card({ children }: CardProps): ReactElement {
  return <View style={styles.card}>{children}</View>;
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderColor: colors.line,
    borderWidth: 1,
    borderRadius: radius.lg,
    padding: space.lg,
    gap: space.md,
  },
});
