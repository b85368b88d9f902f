/** Design tokens from the product brief (§7). Every style in the app reads from here. */
import type { TextStyle } from 'react-native';

export const colors = {
  sand: '#F4EFE6',
  surface: '#FFFDF8',
  basalt: '#23302B',
  basaltMuted: '#5B6661',
  sage: '#3E7A5E',
  sageDark: '#2F5E48',
  sageTint: '#E3EEE7',
  ochre: '#B86B25',
  ochreTint: '#F6E7D6',
  lake: '#3C6E91',
  lakeTint: '#E1EBF2',
  rust: '#A23B2A',
  rustTint: '#F5E1DC',
  line: '#D9D2C3',
  white: '#FFFFFF',
} as const;

/** Default cover-state colours: the Okabe–Ito colour-blind-safe palette. */
export const coverPalette = [
  '#E69F00',
  '#56B4E9',
  '#009E73',
  '#F0E442',
  '#0072B2',
  '#D55E00',
  '#CC79A7',
  '#999999',
] as const;

export const space = { xxs: 2, xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32, xxxl: 48 } as const;

export const radius = { sm: 4, md: 8, lg: 12, pill: 999 } as const;

/** Font family names as registered with expo-font in the root layout. */
export const fonts = {
  regular: 'IBMPlexSans_400Regular',
  medium: 'IBMPlexSans_500Medium',
  semibold: 'IBMPlexSans_600SemiBold',
  mono: 'IBMPlexMono_400Regular',
} as const;

export const typeScale = {
  display: { fontSize: 28, lineHeight: 34 },
  title: { fontSize: 20, lineHeight: 26 },
  subtitle: { fontSize: 17, lineHeight: 24 },
  body: { fontSize: 15, lineHeight: 22 },
  small: { fontSize: 13, lineHeight: 18 },
  tiny: { fontSize: 11, lineHeight: 14 },
} as const;

/** The look of every numeric entry (shares, step ranges, matrix cells): right-aligned mono digits in a framed box. */
export const numberInput: TextStyle = {
  borderWidth: 1,
  borderColor: colors.line,
  borderRadius: radius.sm,
  backgroundColor: colors.white,
  textAlign: 'right',
  fontFamily: fonts.mono,
  fontVariant: ['tabular-nums'],
  color: colors.basalt,
};

/** Window-width breakpoints; `wide` switches the bottom tabs to a left rail. */
export const breakpoints = { wide: 1024 } as const;

/** Widest readable column for forms and lists. */
export const contentMaxWidth = 760;
