import type { ReactElement, ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { colors, radius, space } from './theme';

export type CardProps = { children: ReactNode };

/** A surface panel with a hairline border; stacks its children with a gap. */
export function Card({ children }: CardProps): ReactElement {
  return <View style={styles.card}>{children}</View>;
}

/** The surface of every card, shared with CardLink. */
export const cardSurface = {
  backgroundColor: colors.surface,
  borderColor: colors.line,
  borderWidth: 1,
  borderRadius: radius.lg,
  padding: space.lg,
} as const;

const styles = StyleSheet.create({
  card: { ...cardSurface, gap: space.md },
});
