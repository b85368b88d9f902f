import { Link, type Href } from 'expo-router';
import type { ReactElement } from 'react';
import { StyleSheet } from 'react-native';

import { colors, fonts } from './theme';

export type TextLinkProps = { href: Href; children: string };

/** An in-app link styled as underlined sage text. */
export function TextLink({ href, children }: TextLinkProps): ReactElement {
  return (
    <Link href={href} style={styles.link}>
      {children}
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { color: colors.sageDark, fontFamily: fonts.medium, textDecorationLine: 'underline' },
});
