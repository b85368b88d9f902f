import { useEffect, useRef, type RefObject } from 'react';
import type { View } from 'react-native';

/** Zoom factor per wheel notch (100 px of deltaY). */
const NOTCH = 1.25;

/** The mouse wheel over the map zooms it (and does not scroll the page). */
export function useWheelZoom(target: RefObject<View | null>, onZoom: (factor: number) => void): void {
  const latest = useRef(onZoom);
  latest.current = onZoom;
  useEffect(() => {
    // On web a View's ref is its DOM element.
    const element = target.current;
    if (!(element instanceof HTMLElement)) return undefined;
    const onWheel = (event: WheelEvent): void => {
      event.preventDefault();
      latest.current(NOTCH ** (-event.deltaY / 100));
    };
    element.addEventListener('wheel', onWheel, { passive: false });
    return () => element.removeEventListener('wheel', onWheel);
  }, [target]);
}
