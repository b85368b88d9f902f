import { Link, type Href } from 'expo-router';
import type { ReactElement, ReactNode } from 'react';
import { Pressable, StyleSheet } from 'react-native';

import { cardSurface } from './Card';
import { space } from './theme';

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
  card: { ...cardSurface, gap: space.sm },
});
