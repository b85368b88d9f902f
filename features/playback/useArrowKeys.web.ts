import { useEffect } from 'react';

import { usePlaybackStore } from './store';

/** ← and → step back and forward (not while typing in a field). */
export function useArrowKeys(enabled: boolean): void {
  useEffect(() => {
    if (!enabled) return undefined;
    const onKey = (event: KeyboardEvent): void => {
      const target = event.target;
      if (target instanceof HTMLElement && (target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName))) return;
      const store = usePlaybackStore.getState();
      if (event.key === 'ArrowRight') store.stepBy(1);
      else if (event.key === 'ArrowLeft') store.stepBy(-1);
      else return;
      event.preventDefault();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [enabled]);
}
