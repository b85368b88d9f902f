import { usePlaybackStore } from './store';

describe('playback store', () => {
  beforeEach(() => usePlaybackStore.getState().open(1, 10));

  test('the slider’s step is kept within the run and rounded', () => {
    const s = usePlaybackStore.getState();
    s.setStep(4.6);
    expect(usePlaybackStore.getState().step).toBe(5);
    s.setStep(99);
    expect(usePlaybackStore.getState().step).toBe(10);
    s.stepBy(-20);
    expect(usePlaybackStore.getState().step).toBe(0);
  });

  test('playing stops at the last step and restarts from 0 when played again', () => {
    const s = usePlaybackStore.getState();
    s.setStep(9);
    s.setPlaying(true);
    s.stepBy(1);
    expect(usePlaybackStore.getState()).toMatchObject({ step: 10, playing: false });
    s.setPlaying(true);
    expect(usePlaybackStore.getState()).toMatchObject({ step: 0, playing: true });
  });

  test('speed stays within 2–30 steps per second', () => {
    usePlaybackStore.getState().setSpeed(100);
    expect(usePlaybackStore.getState().speed).toBe(30);
    usePlaybackStore.getState().setSpeed(0);
    expect(usePlaybackStore.getState().speed).toBe(2);
  });
});
