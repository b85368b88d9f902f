import type { ReactElement } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, type StyleProp, type TextStyle, type ViewStyle } from 'react-native';

import { colors, fonts, radius, space, typeScale } from './theme';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'ghost';

export type ButtonProps = {
  label: string;
  onPress: () => void;
  variant?: ButtonVariant;
  size?: ButtonSize;
  busy?: boolean;
  disabled?: boolean;
};

const look: Record<ButtonVariant, { bg: string; fg: string; border: string }> = {
  primary: { bg: colors.sage, fg: colors.surface, border: colors.sage },
  secondary: { bg: colors.surface, fg: colors.sageDark, border: colors.line },
  danger: { bg: colors.surface, fg: colors.rust, border: colors.rust },
  ghost: { bg: 'transparent', fg: colors.sageDark, border: 'transparent' },
};

export type ButtonSize = 'md' | 'sm';

/** The box and label styles of a button, shared with links drawn as buttons. */
export function buttonStyle(variant: ButtonVariant, size: ButtonSize): { box: StyleProp<ViewStyle>; label: StyleProp<TextStyle> } {
  const { bg, fg, border } = look[variant];
  return {
    box: [styles.base, size === 'sm' ? styles.sm : styles.md, { backgroundColor: bg, borderColor: border }],
    label: [styles.label, size === 'sm' && styles.labelSm, { color: fg }],
  };
}

/** A labelled button; while `busy` it shows a spinner and ignores presses. */
export function Button({ label, onPress, variant = 'primary', size = 'md', busy = false, disabled = false }: ButtonProps): ReactElement {
  const { box, label: labelStyle } = buttonStyle(variant, size);
  const inactive = disabled || busy;
  return (
    <Pressable
      role="button"
      aria-disabled={inactive}
      aria-busy={busy}
      disabled={inactive}
      onPress={onPress}
      style={({ pressed }) => [box, pressed && styles.pressed, inactive && styles.inactive]}
    >
      {busy ? <ActivityIndicator size="small" color={look[variant].fg} /> : null}
      <Text style={labelStyle}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: space.sm,
    borderWidth: 1,
    borderRadius: radius.md,
    alignSelf: 'flex-start',
  },
  md: { minHeight: 44, paddingHorizontal: space.lg },
  sm: { minHeight: 32, paddingHorizontal: space.md },
  pressed: { opacity: 0.8 },
  inactive: { opacity: 0.55 },
  label: { fontFamily: fonts.medium, ...typeScale.body },
  labelSm: typeScale.small,
});
