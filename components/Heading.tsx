import type { ReactElement, ReactNode } from 'react';
import { Text, StyleSheet } from 'react-native';

import { colors, fonts, typeScale } from './theme';

export type HeadingProps = {
  children: ReactNode;
  /** 1 = page title, 2 = section, 3 = card title. */
  level?: 1 | 2 | 3;
};

/** A real heading element (h1–h3 on web) in the type scale. */
export function Heading({ children, level = 1 }: HeadingProps): ReactElement {
  return (
    <Text role="heading" aria-level={level} style={[styles.base, styles[`h${level}`]]}>
      {children}
    </Text>
  );
}

const styles = StyleSheet.create({
  base: { color: colors.basalt, fontFamily: fonts.semibold },
  h1: typeScale.display,
  h2: typeScale.title,
  h3: typeScale.subtitle,
});
