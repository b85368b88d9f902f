import { useEffect } from 'react';

import { usePlaybackStore } from './store';

/** While playing, one step forward every 1/speed seconds; playback stops at the last step. */
export function usePlaybackTimer(): void {
  const playing = usePlaybackStore((s) => s.playing);
  const speed = usePlaybackStore((s) => s.speed);
  useEffect(() => {
    if (!playing) return undefined;
    const timer = setInterval(() => usePlaybackStore.getState().stepBy(1), 1000 / speed);
    return () => clearInterval(timer);
  }, [playing, speed]);
}
