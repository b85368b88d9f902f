import { useWindowDimensions } from 'react-native';

import { breakpoints } from './theme';

export type Breakpoint = { isWide: boolean; width: number };

/** Follows the window, not the device: wide from 1024 px. */
export function useBreakpoint(): Breakpoint {
  const { width } = useWindowDimensions();
  return { isWide: width >= breakpoints.wide, width };
}
