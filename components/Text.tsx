import type { ReactElement } from 'react';
import { Text as RNText, StyleSheet, type TextProps as RNTextProps } from 'react-native';

import { colors, fonts, typeScale } from './theme';

export type TextVariant = 'body' | 'small' | 'tiny' | 'mono' | 'label';
export type TextTone = 'default' | 'muted' | 'danger' | 'primary' | 'info' | 'inverse';

export type TextProps = RNTextProps & {
  variant?: TextVariant;
  tone?: TextTone;
  weight?: 'regular' | 'medium' | 'semibold';
};

const toneColor: Record<TextTone, string> = {
  default: colors.basalt,
  muted: colors.basaltMuted,
  danger: colors.rust,
  primary: colors.sageDark,
  info: colors.lake,
  inverse: colors.surface,
};

/** Body text in IBM Plex Sans; `mono` uses IBM Plex Mono with tabular figures for numbers. */
export function Text({ variant = 'body', tone = 'default', weight, style, ...rest }: TextProps): ReactElement {
  const family = variant === 'mono' ? fonts.mono : fonts[weight ?? (variant === 'label' ? 'medium' : 'regular')];
  return (
    <RNText
      {...rest}
      style={[styles[variant], { color: toneColor[tone], fontFamily: family }, style]}
    />
  );
}

const styles = StyleSheet.create({
  body: typeScale.body,
  small: typeScale.small,
  tiny: typeScale.tiny,
  mono: { ...typeScale.small, fontVariant: ['tabular-nums'] },
  label: typeScale.small,
});
