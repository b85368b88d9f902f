import type { ReactElement, ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { PatchMark } from './PatchMark';
import { Text } from './Text';
import { colors, fonts, radius, space, typeScale } from './theme';

export type EmptyStateProps = { title: string; children?: ReactNode; action?: ReactNode };

/** A friendly placeholder for a list with nothing in it yet, with a line on what comes next. */
export function EmptyState({ title, children, action }: EmptyStateProps): ReactElement {
  return (
    <View style={styles.box}>
      <PatchMark size={48} muted />
      <Text style={styles.title}>{title}</Text>
      {typeof children === 'string' ? (
        <Text tone="muted" style={styles.body}>
          {children}
        </Text>
      ) : (
        children
      )}
      {action}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    alignItems: 'center',
    gap: space.md,
    paddingVertical: space.xxl,
    paddingHorizontal: space.xl,
    borderWidth: 1,
    borderStyle: 'dashed',
    borderColor: colors.line,
    borderRadius: radius.lg,
    backgroundColor: colors.surface,
  },
  title: { fontFamily: fonts.semibold, ...typeScale.subtitle, textAlign: 'center' },
  body: { textAlign: 'center', maxWidth: 420 },
});
