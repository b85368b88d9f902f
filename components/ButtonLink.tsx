import { Link, type Href } from 'expo-router';
import type { ReactElement } from 'react';
import { Pressable, StyleSheet, Text } from 'react-native';

import { buttonStyle, type ButtonSize, type ButtonVariant } from './Button';

export type ButtonLinkProps = { href: Href; label: string; variant?: ButtonVariant; size?: ButtonSize };

/** A link that looks like a button, for the main way forward on a page (flat style: Link's slot needs one). */
export function ButtonLink({ href, label, variant = 'primary', size = 'md' }: ButtonLinkProps): ReactElement {
  const { box, label: labelStyle } = buttonStyle(variant, size);
  return (
    <Link href={href} asChild>
      <Pressable style={StyleSheet.flatten(box)}>
        <Text style={labelStyle}>{label}</Text>
      </Pressable>
    </Link>
  );
}
