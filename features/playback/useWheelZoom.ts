import type { RefObject } from 'react';
import type { View } from 'react-native';

/** Touch screens zoom with the buttons; there is no wheel. */
export function useWheelZoom(_target: RefObject<View | null>, _onZoom: (factor: number) => void): void {}
