import { Link, type Href } from 'expo-router';
import type { ReactElement, ReactNode } from 'react';
import { Pressable, StyleSheet } from 'react-native';

import { colors, radius, space } from './theme';

export type CardLinkProps = { href: Href; children: ReactNode; /** The link's accessible name. */ label: string };

/** A card that opens something: the whole surface is one link (flat style: Link's slot needs one). */
export function CardLink({ href, children, label }: CardLinkProps): ReactElement {
  return (
    <Link href={href} asChild>
      <Pressable aria-label={label} style={styles.card}>
        {children}
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: colors.surface,
    borderColor: colors.line,
    borderWidth: 1,
    borderRadius: radius.lg,
    padding: space.lg,
    gap: space.sm,
  },
});
